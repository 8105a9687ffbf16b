import type { SourceGeometry } from "./types";

/**
 * A point source at `depthKm`: rupture distance is the hypocentral distance, Joyner–Boore
 * distance the epicentral one, and strong shaking starts with the S wave.
 */
export function pointSource(depthKm: number): SourceGeometry {
  return {
    kind: "point",
    needsLocalFrame: false,
    depthRangeKm: [depthKm, depthKm],
    measure(epicentralKm, _eastKm, _northKm, out) {
      const hypocentralKm = Math.sqrt(epicentralKm * epicentralKm + depthKm * depthKm);
      out.hypocentralKm = hypocentralKm;
      out.ruptureKm = hypocentralKm;
      out.joynerBooreKm = epicentralKm;
      out.ruptureTimeS = 0;
      out.nearestDepthKm = depthKm;
      out.nearestHorizontalKm = epicentralKm;
    },
  };
}
