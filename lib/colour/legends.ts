/**
 * Legend rows for the result layers, built from the same scales as the map's layer styles
 * (lib/colour/scales.ts): a swatch colour, the text colour that reads on it, and a label in
 * planner's words with its unit.
 */
import { getIntensityScale, warningBands, type IntensityScaleId } from "@/lib/geo";
import { intensityColourScale, populationColourScale, POPULATION_DENSITY_BREAKS_PER_KM2, textColourOn, warningColourScale } from "./scales";

/** One row of a legend. */
export interface LegendRow {
  key: string;
  label: string;
  colour: string;
  textColour: string;
}

const row = (key: string, label: string, colour: string): LegendRow => ({ key, label, colour, textColour: textColourOn(colour) });

/** Warning-band rows for the scenario's breaks (s): blind zone first, then (0, b1], … */
export function warningLegend(breaksS: readonly number[]): LegendRow[] {
  const bands = warningBands(breaksS);
  const colour = warningColourScale(bands.map((b) => b.id));
  return bands.map((band) => {
    const label =
      band.lowerS === null ? "blind zone, 0 s or less" : band.upperS === null ? `more than ${band.lowerS} s` : `${band.lowerS}–${band.upperS} s`;
    return row(band.id, label, colour(band.id));
  });
}

/** Planner's names of the JMA classes ("5-" is "5-lower"). */
const JMA_CLASS_NAMES: Record<string, string> = { "5-": "5-lower", "5+": "5-upper", "6-": "6-lower", "6+": "6-upper" };

/** Display name of an intensity class on a scale, e.g. "JMA 5-lower", "MMI VII". */
export function intensityClassName(scale: IntensityScaleId, intensityClass: string): string {
  return scale === "jma" ? `JMA ${JMA_CLASS_NAMES[intensityClass] ?? intensityClass}` : `MMI ${intensityClass}`;
}

/** Intensity-class rows above the lowest class (which the map leaves unfilled), lowest first. */
export function intensityLegend(scaleId: IntensityScaleId): LegendRow[] {
  const scale = getIntensityScale(scaleId);
  const colour = intensityColourScale();
  return scale.classes.flatMap((name, index) => {
    const fill = colour(index);
    return fill === null ? [] : [row(name, intensityClassName(scaleId, name), fill)];
  });
}

/** Population density rows, people per km², sparse first. */
export function populationLegend(): LegendRow[] {
  const colour = populationColourScale();
  const edges = [0, ...POPULATION_DENSITY_BREAKS_PER_KM2];
  return edges.map((lower, i) => {
    const upper = edges[i + 1];
    const label = upper === undefined ? `${lower.toLocaleString("en")} or more per km²` : `${lower.toLocaleString("en")}–${upper.toLocaleString("en")} per km²`;
    return row(String(lower), label, colour(lower));
  });
}
