/** Scenarios for verification tests, with points placed by GeographicLib at exact distances. */
import { Geodesic } from "geographiclib-geodesic";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";

/** The point `distanceKm` from (lon, lat) along `azimuthDeg` (GeographicLib Direct). */
export function destination(lon: number, lat: number, azimuthDeg: number, distanceKm: number): [number, number] {
  const r = Geodesic.WGS84.Direct(lat, lon, azimuthDeg, distanceKm * 1000, Geodesic.LATITUDE | Geodesic.LONGITUDE | Geodesic.LONG_UNROLL);
  return [r.lon2 ?? Number.NaN, r.lat2 ?? Number.NaN];
}

/** Parses a scenario object, failing the test with the issues when it is refused. */
export function scenarioFrom(input: unknown): Scenario {
  const result = parseScenario(input);
  if (!result.ok) throw new Error(`fixture refused: ${JSON.stringify(result.issues)}`);
  return result.scenario;
}

export const EPICENTRE: [number, number] = [-130, -40];
export const VP_KMS = 6;
export const VS_KMS = 3.5;

/**
 * A homogeneous-model scenario (Vp 6, Vs 3.5 km/s) with stations at the given epicentral
 * distances (km, due east, north-east, …) and one station that is off at 1 km.
 */
export function homogeneousScenario(options: { depthKm?: number; mw?: number; stationKm?: number[]; extra?: Record<string, unknown> } = {}): Scenario {
  const stationKm = options.stationKm ?? [8, 15, 30];
  const [lon, lat] = EPICENTRE;
  return scenarioFrom({
    version: 1,
    name: "Verification: homogeneous half-space",
    source: { lon, lat, depthKm: options.depthKm ?? 10, mw: options.mw ?? 6.5, faultType: "crustal" },
    stations: [
      ...stationKm.map((d, i) => {
        const [x, y] = destination(lon, lat, 45 * i, d);
        return { id: `ST${i + 1}`, lon: x, lat: y };
      }),
      { id: "OFF", lon: destination(lon, lat, 200, 1)[0], lat: destination(lon, lat, 200, 1)[1], operating: false },
    ],
    velocityModel: { kind: "homogeneous", vpKms: VP_KMS, vsKms: VS_KMS },
    timing: { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 },
    channels: [
      { id: "cell-broadcast", deliveryS: 4 },
      { id: "sirens", deliveryS: 9 },
    ],
    vs30: 400,
    area: { bbox: [lon - 1.2, lat - 0.9, lon + 1.2, lat + 0.9], cellKm: 1 },
    ...options.extra,
  });
}
