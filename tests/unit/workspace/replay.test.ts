import { Geodesic } from "geographiclib-geodesic";
import { describe, expect, it } from "vitest";
import { parseScenario } from "@/lib/scenario/schema";
import { buildReplayModel, frontDistanceKm, frontRing, triggeredStations } from "@/lib/workspace/replay";

const VP = 6.0;
const VS = 3.5;
const DEPTH_KM = 12;

const parsed = parseScenario({
  version: 1,
  source: { lon: -126.2, lat: -46.9, depthKm: DEPTH_KM, mw: 6.8, faultType: "crustal" },
  stations: [
    { id: "NEAR", lon: -126.25, lat: -46.88 },
    { id: "MID", lon: -126.0, lat: -46.95 },
    { id: "OFF", lon: -126.21, lat: -46.9, operating: false },
    { id: "FAR", lon: -125.6, lat: -47.2 },
  ],
  velocityModel: { kind: "homogeneous", vpKms: VP, vsKms: VS },
  timing: { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 },
  channels: [
    { id: "cell-broadcast", deliveryS: 5 },
    { id: "sirens", deliveryS: 10 },
  ],
  vs30: 400,
  area: { bbox: [-127, -47.5, -125.4, -46.3], cellKm: 2 },
});
if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
const model = buildReplayModel(parsed.scenario, true);

const geodesicKm = (a: { lon: number; lat: number }, b: { lon: number; lat: number }) => (Geodesic.WGS84.Inverse(a.lat, a.lon, b.lat, b.lon).s12 ?? NaN) / 1000;
const source = parsed.scenario.source;

describe("replay in a homogeneous model (closed forms: t = √(Δ² + h²)/V)", () => {
  it("puts the P and S fronts at Δ = √((V·t)² − h²)", () => {
    for (const t of [2.5, 10, 20]) expect(frontDistanceKm(model, "P", t)).toBeCloseTo(Math.sqrt((VP * t) ** 2 - DEPTH_KM ** 2), 1);
    for (const t of [5, 10, 20]) expect(frontDistanceKm(model, "S", t)).toBeCloseTo(Math.sqrt((VS * t) ** 2 - DEPTH_KM ** 2), 1);
    // Before the P wave reaches the surface above the hypocentre (h / Vp = 2 s) there is no front.
    expect(frontDistanceKm(model, "P", 1.9)).toBeNull();
  });

  it("marks an operating station triggered exactly from its P time, √(Δ² + h²)/Vp with Δ by GeographicLib", () => {
    const near = parsed.scenario.stations[0];
    const pNearS = Math.hypot(geodesicKm(source, near), DEPTH_KM) / VP;
    expect(triggeredStations(model, pNearS - 0.01).map((s) => s.id)).not.toContain("NEAR");
    expect(triggeredStations(model, pNearS + 0.01).map((s) => s.id)).toContain("NEAR");
    // A station out of service never triggers, however close.
    expect(triggeredStations(model, 100).map((s) => s.id)).not.toContain("OFF");
  });

  it("issues the alert at the second operating station's P time plus 1 + 0.5 + 1.5 s (METHODS §2)", () => {
    const operating = parsed.scenario.stations.filter((s) => s.operating !== false);
    const pTimes = operating.map((s) => Math.hypot(geodesicKm(source, s), DEPTH_KM) / VP).sort((a, b) => a - b);
    expect(model.alertIssuedS).toBeCloseTo(pTimes[1] + 3, 2);
    expect(model.channels.map((c) => c.alertS)).toEqual([model.alertIssuedS + 5, model.alertIssuedS + 10]);
  });

  it("draws a front as a closed ring at the front's distance (GeographicLib)", () => {
    const ring = frontRing(model, 30, 24);
    expect(ring[0]).toEqual(ring[ring.length - 1]);
    for (const [lon, lat] of ring) expect(geodesicKm(source, { lon, lat })).toBeCloseTo(30, 6);
  });
});
