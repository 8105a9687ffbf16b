/**
 * Site values as CSV: one row per site (a facility or a typed point) with distances, arrival
 * times, the alert and warning seconds per channel, and shaking. Units are in every column name.
 * Warning seconds are written at full precision and, beside them, as planners see them (rounded
 * down to whole seconds).
 */
import { writeCsv, type CsvValue } from "@/lib/csv/write-csv";
import type { SiteResult } from "@/lib/geo/sites";
import { displayedWarningS } from "@/lib/geo/warning";

/** A site row's label besides the engine's figures. */
export interface NamedSite {
  result: SiteResult;
  name: string;
  kind: string;
}

/** What every CSV export carries. */
export interface CsvContext {
  caution: string;
  howItWasMade: string;
  notes: readonly string[];
}

const round = (value: number | null, decimals: number): number | null => (value === null ? null : Math.round(value * 10 ** decimals) / 10 ** decimals);

/** The CSV text; channel columns follow the scenario's channel order (the first is primary). */
export function siteValuesCsv(sites: readonly NamedSite[], channels: readonly string[], context: CsvContext): string {
  const header = [
    "id",
    "name",
    "kind",
    "lon",
    "lat",
    "vs30_m_s",
    "epicentral_km",
    "hypocentral_km",
    "p_arrival_s",
    "s_arrival_s",
    "alert_issued_s",
    "alerted",
    ...channels.flatMap((c) => [`alert_${c}_s`, `warning_${c}_s`, `warning_${c}_whole_s`]),
    "pgv_cm_s",
    "pga_cm_s2",
    "intensity",
    "intensity_class",
    "p_exceed_target",
  ];
  const rows = sites.map(({ result: r, name, kind }): CsvValue[] => [
    r.id,
    name,
    kind,
    r.lon,
    r.lat,
    round(r.vs30Ms, 0),
    round(r.epicentralKm, 3),
    round(r.hypocentralKm, 3),
    round(r.pArrivalS, 3),
    round(r.sArrivalS, 3),
    round(r.alertIssuedS, 3),
    r.alerted,
    ...channels.flatMap((channel) => {
      const c = r.byChannel.find((b) => b.channel === channel);
      const warning = c?.warningS ?? null;
      return [round(c?.alertS ?? null, 3), round(warning, 3), warning === null ? null : displayedWarningS(warning)];
    }),
    round(r.pgvCms, 3),
    round(r.pgaCms2, 2),
    round(r.intensity, 2),
    r.intensityClass,
    round(r.pExceedTarget, 3),
  ]);
  return writeCsv({ caution: context.caution, provenance: context.howItWasMade, notes: context.notes, header, rows });
}
