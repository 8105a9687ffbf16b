/**
 * The scenario's source as the engine uses it: a point, or a finite rupture sized by Wells &
 * Coppersmith (1994) where the file gives no size; and how near it comes to the area.
 */
import type { ResolvedScenario } from "@/lib/scenario/resolve";
import { DEFAULT_RUPTURE_VELOCITY_FRACTION_OF_VS } from "@/lib/scenario/defaults";
import { nearestPointInBbox } from "./area-nearest";
import type { GroundMotionModel } from "./ground-motion/types";
import { localOffsetKm, pointAtOffset } from "./local-frame";
import { finiteRupture, type FiniteRupture } from "./source/finite-rupture";
import { createSourceDistances, type SourceGeometry } from "./source/types";
import { downDipWidthKm, subsurfaceRuptureLengthKm } from "./source/wells-coppersmith-1994";
import { layerAt, type VelocityModel } from "./velocity/models";

/** The rupture rectangle with lengths from Wells & Coppersmith (1994) and the default rupture velocity where the file gives none. */
export function ruptureOf(scenario: ResolvedScenario, velocityModel: VelocityModel): FiniteRupture | null {
  const { source } = scenario;
  const r = source.rupture;
  if (!r) return null;
  return finiteRupture({
    hypocentreDepthKm: source.depthKm,
    strikeDeg: r.strikeDeg,
    dipDeg: r.dipDeg,
    lengthKm: r.lengthKm ?? subsurfaceRuptureLengthKm(source.mw),
    widthKm: r.widthKm ?? downDipWidthKm(source.mw),
    mode: r.mode ?? "unilateral",
    ruptureVelocityKms: r.ruptureVelocityKms ?? DEFAULT_RUPTURE_VELOCITY_FRACTION_OF_VS.value * layerAt(velocityModel, source.depthKm).vsKms,
  });
}

/** Points of the source's surface projection (the epicentre, and a lattice over a rupture's projection). */
export function sourceSurfacePoints(scenario: ResolvedScenario, rupture: Pick<FiniteRupture, "cornersKm"> | null): [number, number][] {
  const { lon, lat } = scenario.source;
  const points: [number, number][] = [[lon, lat]];
  if (!rupture) return points;
  const [p0, p1, , p3] = rupture.cornersKm;
  for (let i = 0; i <= 20; i++) {
    for (let j = 0; j <= 4; j++) {
      const x = p0[0] + ((p1[0] - p0[0]) * i) / 20 + ((p3[0] - p0[0]) * j) / 4;
      const y = p0[1] + ((p1[1] - p0[1]) * i) / 20 + ((p3[1] - p0[1]) * j) / 4;
      points.push(pointAtOffset(lon, lat, x, y));
    }
  }
  return points;
}

/** The smallest model distance from the source to any point of the area, km. */
export function nearestModelDistanceKm(scenario: ResolvedScenario, source: SourceGeometry, model: GroundMotionModel, candidates: [number, number][]): number {
  const out = createSourceDistances();
  let best = Infinity;
  for (const [lon, lat] of candidates) {
    const [x, y] = nearestPointInBbox(lon, lat, scenario.area.bbox);
    const offset = localOffsetKm(scenario.source.lon, scenario.source.lat, x, y);
    source.measure(offset.distanceKm, offset.eastKm, offset.northKm, out);
    best = Math.min(best, model.distanceKind === "rupture" ? out.ruptureKm : out.joynerBooreKm);
  }
  return best;
}

