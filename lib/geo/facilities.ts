/**
 * Facilities (BRIEF item 9): points (schools, hospitals) are sites; lines (rail segments) are
 * sampled along their geodesics and reported by their worst sample — the shortest warning and
 * the strongest shaking — with the share of the line that is alerted.
 */
import { Geodesic } from "geographiclib-geodesic";
import type { Scenario } from "@/lib/scenario/schema";
import { prepareEngine, type EngineOptions } from "./engine";
import { CAUTION, type Provenance } from "./provenance";
import { evaluateSites, type SiteInput, type SiteResult } from "./sites";

/** A line facility: lon/lat vertices in degrees. */
export interface LineFacility {
  id: string;
  coordinates: [number, number][];
}

/** A line's figures (from its samples). */
export interface LineResult {
  id: string;
  lengthKm: number;
  samples: number;
  /** Shortest primary-channel warning along the line, s (null: no alert reaches any sample). */
  minWarningS: number | null;
  /** Where that is. */
  minWarningAt: [number, number];
  maxIntensity: number;
  maxIntensityAt: [number, number];
  /** Share of samples that are alerted, 0–1. */
  alertedShare: number;
}

/** Result of `evaluateFacilities`. */
export interface FacilitiesResult {
  points: SiteResult[];
  lines: LineResult[];
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/** Points every `stepKm` along each geodesic segment, vertices included. */
function sampleLine(coordinates: [number, number][], stepKm: number): { points: SiteInput[]; lengthKm: number } {
  const points: SiteInput[] = [];
  let lengthKm = 0;
  coordinates.forEach(([lon, lat], k) => {
    if (k === 0) {
      points.push({ id: "0", lon, lat });
      return;
    }
    const [lon0, lat0] = coordinates[k - 1];
    const line = Geodesic.WGS84.InverseLine(lat0, lon0, lat, lon, Geodesic.LATITUDE | Geodesic.LONGITUDE | Geodesic.DISTANCE_IN | Geodesic.LONG_UNROLL);
    const segmentKm = line.s13 / 1000;
    const steps = Math.max(1, Math.ceil(segmentKm / stepKm));
    for (let s = 1; s <= steps; s++) {
      const p = line.Position((line.s13 * s) / steps, Geodesic.LATITUDE | Geodesic.LONGITUDE | Geodesic.LONG_UNROLL);
      points.push({ id: String(points.length), lon: p.lon2 ?? lon, lat: p.lat2 ?? lat });
    }
    lengthKm += segmentKm;
  });
  return { points, lengthKm };
}

/** Evaluates point facilities as sites and line facilities by samples every `stepKm` (default 0.5 km). */
export function evaluateFacilities(
  scenario: Scenario,
  facilities: { points?: readonly SiteInput[]; lines?: readonly LineFacility[] },
  options: EngineOptions & { stepKm?: number } = {},
): FacilitiesResult {
  const stepKm = options.stepKm ?? 0.5;
  const sampled = (facilities.lines ?? []).map((line) => ({ line, ...sampleLine(line.coordinates, stepKm) }));
  const everyPoint: [number, number][] = [...(facilities.points ?? []), ...sampled.flatMap((s) => s.points)].map((p) => [p.lon, p.lat]);
  const engine = prepareEngine(scenario, options, everyPoint);
  const lines = sampled.map(({ line, points, lengthKm }): LineResult => {
    const results = evaluateSites(engine, points);
    let worstWarning: SiteResult | undefined;
    let strongest = results[0];
    let alerted = 0;
    for (const r of results) {
      if (r.warningS !== null && (worstWarning === undefined || r.warningS < (worstWarning.warningS ?? Infinity))) worstWarning = r;
      if (r.intensity > strongest.intensity) strongest = r;
      if (r.alerted) alerted++;
    }
    return {
      id: line.id,
      lengthKm,
      samples: results.length,
      minWarningS: worstWarning?.warningS ?? null,
      minWarningAt: worstWarning ? [worstWarning.lon, worstWarning.lat] : [results[0].lon, results[0].lat],
      maxIntensity: strongest.intensity,
      maxIntensityAt: [strongest.lon, strongest.lat],
      alertedShare: alerted / results.length,
    };
  });
  return { points: evaluateSites(engine, facilities.points ?? []), lines, notes: engine.notes, caution: CAUTION, provenance: engine.provenance };
}
