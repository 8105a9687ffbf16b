/**
 * Every exposure table as CSV (lib/csv): the same rows the pages show, full precision for seconds
 * and intensities, with the caution, the "how it was made" line and the notes as `#` lines.
 */
import type { CsvTable, CsvValue } from "@/lib/csv/write-csv";
import type { Comparison, ExposureResult, ThresholdStudy } from "./contracts";

/** The exposure tables a CSV can hold. */
export const EXPOSURE_CSV_TABLES = ["class-band", "districts", "channels", "actions", "facilities"] as const;
export type ExposureCsvTable = (typeof EXPOSURE_CSV_TABLES)[number];

/** The comparison tables a CSV can hold. */
export const COMPARISON_CSV_TABLES = ["summary", "transitions", "facilities"] as const;
export type ComparisonCsvTable = (typeof COMPARISON_CSV_TABLES)[number];

const NO_DISTRICT_LABEL = "no district";

function frame(source: { caution: string; provenance: string; notes: readonly string[] }, header: string[], rows: CsvValue[][]): CsvTable {
  return { caution: source.caution, provenance: source.provenance, notes: source.notes, header, rows };
}

/** One exposure table as CSV. */
export function exposureCsv(exposure: ExposureResult, table: ExposureCsvTable): CsvTable {
  switch (table) {
    case "class-band": {
      const { rows, bandTotals, notAlertedTotal, total } = exposure.classByBand;
      const header = [`intensity class (${exposure.intensityScale.toUpperCase()})`, ...exposure.warningBands.map((b) => `alerted, ${b.label} (people)`), "not alerted (people)", "total (people)"];
      return frame(exposure, header, [
        ...rows.map((r) => [r.intensityClass, ...r.alertedByBand, r.notAlerted, r.total]),
        ["total", ...bandTotals, notAlertedTotal, total],
      ]);
    }
    case "districts":
      return frame(
        exposure,
        ["district", "people", "alerted (people)", "in the blind zone (people)", "alerted with warning > 0 s (people)"],
        exposure.byDistrict.map((d) => [d.district ?? NO_DISTRICT_LABEL, d.population, d.alertedPopulation, d.blindZonePopulation, d.alertedWithWarningPopulation]),
      );
    case "channels":
      return frame(
        exposure,
        ["channel", "primary", "delivery (s)", "in the blind zone (people)", "alerted (people)", "alerted with warning > 0 s (people)"],
        exposure.byChannel.map((c) => [c.channel, c.primary, c.deliveryS, c.blindZonePopulation, c.alertedPopulation, c.alertedWithWarningPopulation]),
      );
    case "actions":
      return frame(
        exposure,
        ["protective action", "seconds needed (s)", "reaction time (s)", "alerted people who can complete it (people)"],
        exposure.actions.map((a) => [a.name, a.secondsNeeded, exposure.reactionTimeS, a.population]),
      );
    case "facilities":
      return frame(
        exposure,
        [
          "facility",
          "kind",
          "geometry",
          "length (km)",
          "warning (s)",
          `intensity (${exposure.intensityScale.toUpperCase()})`,
          "intensity class",
          "alerted share (0-1)",
          ...exposure.actions.map((a) => `fits: ${a.name} (${a.secondsNeeded} s)`),
        ],
        exposure.facilities.map((f) => [f.name, f.kind, f.geometry, f.lengthKm, f.warningS, f.intensity, f.intensityClass, f.alertedShare, ...f.actionFits.map((fits) => fits ?? "not for this kind")]),
      );
  }
}

/** The threshold study as CSV. */
export function thresholdStudyCsv(study: ThresholdStudy): CsvTable {
  return frame(
    study,
    [
      `alert area at (${study.intensityScale.toUpperCase()} intensity)`,
      "class",
      "alerted (people)",
      "expected needlessly alerted (people)",
      "expected alerted late (people)",
      "expected missed (people)",
    ],
    study.rows.map((r) => [r.areaAt, r.intensityClass, r.alertedPopulation, r.needless, r.late, r.missed]),
  );
}

/** One comparison table as CSV. */
export function comparisonCsv(comparison: Comparison, table: ComparisonCsvTable): CsvTable {
  const { a, b } = comparison;
  const source = { caution: comparison.caution, provenance: `A: ${a.provenance} | B: ${b.provenance}`, notes: comparison.notes };
  const name = (side: typeof a) => `${side.version.scenarioName} v${side.version.versionNumber}`;
  switch (table) {
    case "summary":
      return frame(source, ["figure", `A: ${name(a)}`, `B: ${name(b)}`], [
        ["blind-zone area (km²)", a.blindZoneAreaKm2, b.blindZoneAreaKm2],
        ["people in the blind zone (people)", a.blindZonePopulation, b.blindZonePopulation],
        ["people alerted (people)", a.alertedPopulation, b.alertedPopulation],
        ["people alerted 10 s or more before the shaking (people)", a.alertedWithTenSecondsPopulation, b.alertedWithTenSecondsPopulation],
      ]);
    case "transitions":
      return frame(source, ["band in A \\ band in B", ...comparison.bands.map((band) => `B: ${band.label} (people)`), "total in A (people)"], [
        ...comparison.matrix.map((row, i) => [`A: ${comparison.bands[i].label}`, ...row, comparison.rowTotals[i]]),
        ["total in B", ...comparison.columnTotals, comparison.totalPopulation],
      ]);
    case "facilities":
      return frame(
        source,
        ["facility", "kind", "protective action", "seconds needed (s)", "warning in A (s)", "warning in B (s)", "change"],
        comparison.facilities.map((f) => [f.name, f.kind, f.action, f.secondsNeeded, f.warningA, f.warningB, f.change === "gains" ? "fits in B, not in A" : "fits in A, not in B"]),
      );
  }
}
