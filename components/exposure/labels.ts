import { intensityClassName, warningLegend } from "@/lib/colour/legends";
import { warningColourScale } from "@/lib/colour/scales";
import type { ExposureBand } from "@/lib/exposure/contracts";
import type { IntensityScaleId } from "@/lib/geo";

/** The breaks (s) a list of warning bands was made from: the lower edge of each band after the blind zone. */
function breaksOf(bands: readonly ExposureBand[]): number[] {
  return bands.flatMap((band) => (band.lowerS === null ? [] : [band.lowerS]));
}

/** Legend labels and colours of warning bands, by band id, from the map's own legend (lib/colour). */
export function bandStyles(bands: readonly ExposureBand[]): Map<string, { label: string; colour: string; textColour: string }> {
  const legend = warningLegend(breaksOf(bands));
  const colour = warningColourScale(bands.map((b) => b.id));
  return new Map(bands.map((band) => {
    const row = legend.find((r) => r.key === band.id);
    return [band.id, { label: row?.label ?? band.label, colour: colour(band.id), textColour: row?.textColour ?? "#111820" }];
  }));
}

/** "JMA 5-lower", "MMI VII". */
export function classLabel(scale: IntensityScaleId, intensityClass: string): string {
  return intensityClassName(scale, intensityClass);
}

/** What a facility kind is called in tables. */
export const FACILITY_KIND_LABELS: Record<string, string> = {
  school: "School",
  hospital: "Hospital",
  "care-home": "Care home",
  utility: "Utility",
  rail: "Rail segment",
  other: "Other",
};
