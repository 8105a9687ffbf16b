/**
 * Scenarios the benchmark computes: an invented coast (no real place), sized so grids have
 * exact cell counts.
 */
import { radiiOfCurvatureKm } from "@/lib/geo/wgs84";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";

const CENTRE = { lon: -130, lat: -40 };
const DEG = Math.PI / 180;

/** A bounding box of `widthKm` × `heightKm` centred on the benchmark coast. */
function boxKm(widthKm: number, heightKm: number): [number, number, number, number] {
  const { meridianKm, primeVerticalKm } = radiiOfCurvatureKm(CENTRE.lat);
  const halfLon = widthKm / 2 / (primeVerticalKm * Math.cos(CENTRE.lat * DEG) * DEG);
  const halfLat = heightKm / 2 / (meridianKm * DEG);
  return [CENTRE.lon - halfLon, CENTRE.lat - halfLat, CENTRE.lon + halfLon, CENTRE.lat + halfLat];
}

/** A grid of `side` × `side` cells of `cellKm`. */
export function squareArea(side: number, cellKm: number) {
  return { bbox: boxKm(side * cellKm, side * cellKm), cellKm };
}

/** Thirty stations on a ring and a line, denser near the centre. */
function stations() {
  return Array.from({ length: 30 }, (_, i) => {
    const radiusDeg = 0.15 + 0.05 * i;
    const angle = i * 2.4;
    return { id: `BN${String(i + 1).padStart(2, "0")}`, lon: CENTRE.lon + radiusDeg * Math.cos(angle) * 1.3, lat: CENTRE.lat + radiusDeg * Math.sin(angle) };
  });
}

/** A crustal point-source scenario over `side` × `side` cells. */
export function benchScenario(options: { side: number; cellKm: number; velocity?: "iasp91" | "homogeneous"; extra?: Record<string, unknown> }): Scenario {
  const result = parseScenario({
    version: 1,
    name: "Benchmark coast, crustal Mw 6.9",
    source: { lon: CENTRE.lon + 0.1, lat: CENTRE.lat - 0.05, depthKm: 12, mw: 6.9, faultType: "crustal" },
    stations: stations(),
    velocityModel: options.velocity === "homogeneous" ? { kind: "homogeneous", vpKms: 6.1, vsKms: 3.5 } : { kind: "layered", name: "iasp91" },
    timing: { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 },
    channels: [
      { id: "cell-broadcast", deliveryS: 5 },
      { id: "sirens", deliveryS: 10 },
    ],
    vs30: 400,
    area: squareArea(options.side, options.cellKm),
    ...options.extra,
  });
  if (!result.ok) throw new Error(`benchmark scenario refused: ${JSON.stringify(result.issues)}`);
  return result.scenario;
}
