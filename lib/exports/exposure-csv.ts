/**
 * Exposure tables as CSV (BRIEF item 9): people by intensity class × warning band, by district,
 * and by delivery channel. Every table adds up to the layer's population exactly (the engine
 * rounds by largest remainder), and "who can act" columns count alerted people only.
 */
import { writeCsv, type CsvValue } from "@/lib/csv/write-csv";
import type { ExposureResult } from "@/lib/geo/exposure";
import type { CsvContext } from "./site-values-csv";

/** The tables one can download. */
export const EXPOSURE_TABLES = ["intensity-band", "district", "channel"] as const;
export type ExposureTableId = (typeof EXPOSURE_TABLES)[number];

function bandLabel(result: ExposureResult, id: string): string {
  return result.warningBands.find((b) => b.id === id)?.label ?? (id === "no-alert" ? "no alert reaches" : id);
}

function intensityBandRows(result: ExposureResult): { header: string[]; rows: CsvValue[][] } {
  return {
    header: ["intensity_scale", "intensity_class", "warning_band", "warning_band_label", "people", "people_alerted", "people_not_alerted"],
    rows: result.table.map((r) => [
      result.intensityScale,
      r.intensityClass,
      r.warningBand,
      bandLabel(result, r.warningBand),
      r.population,
      r.alertedPopulation,
      r.population - r.alertedPopulation,
    ]),
  };
}

function districtRows(result: ExposureResult): { header: string[]; rows: CsvValue[][] } {
  return {
    header: ["district", "people", "people_alerted", "people_in_blind_zone", "people_alerted_with_warning"],
    rows: result.byDistrict.map((d) => [d.district ?? "no district", d.population, d.alertedPopulation, d.blindZonePopulation, d.alertedWithWarningPopulation]),
  };
}

function channelRows(result: ExposureResult): { header: string[]; rows: CsvValue[][] } {
  return {
    header: ["channel", "primary", "delivery_s", "warning_band", "warning_band_label", "people", "people_alerted"],
    rows: result.byChannel.flatMap((c) =>
      c.bands.map((b): CsvValue[] => [c.channel, c.primary, c.deliveryS, b.warningBand, bandLabel(result, b.warningBand), b.population, b.alertedPopulation]),
    ),
  };
}

/** One exposure table as CSV text, with the caution first and the totals stated in a `#` line. */
export function exposureCsv(result: ExposureResult, table: ExposureTableId, context: CsvContext): string {
  const { header, rows } = table === "intensity-band" ? intensityBandRows(result) : table === "district" ? districtRows(result) : channelRows(result);
  const totals = `total people ${result.totalPopulation}; alerted ${result.alertedPopulation}; in the blind zone (primary channel, alerted or not) ${result.blindZonePopulation}; alerted with warning > 0 s ${result.alertedWithWarningPopulation}`;
  return writeCsv({ caution: context.caution, provenance: context.howItWasMade, notes: [totals, ...context.notes], header, rows });
}
