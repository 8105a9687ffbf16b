import { traceContours, type EngineGrid } from "@/lib/geo";
import type { SecondsGained } from "./contracts";

/**
 * The seconds-gained bands, s (B's warning − A's), with Leeway's own diverging colours: rust for
 * seconds lost, sea green for seconds gained, each side darker the larger the change (lightness
 * steps ≥ 10 L*, checked in tests). (−1, 1] counts as unchanged and is not drawn.
 */
const BANDS: { lowerS: number | null; upperS: number | null; label: string; colour: string }[] = [
  { lowerS: null, upperS: -10, label: "loses more than 10 s", colour: "#7e3f26" },
  { lowerS: -10, upperS: -5, label: "loses 5–10 s", colour: "#b46f48" },
  { lowerS: -5, upperS: -1, label: "loses 1–5 s", colour: "#e2b08a" },
  { lowerS: -1, upperS: 1, label: "about the same (within 1 s)", colour: "#f1efe6" },
  { lowerS: 1, upperS: 5, label: "gains 1–5 s", colour: "#bcdcd2" },
  { lowerS: 5, upperS: 10, label: "gains 5–10 s", colour: "#7cb5a9" },
  { lowerS: 10, upperS: 20, label: "gains 10–20 s", colour: "#418a80" },
  { lowerS: 20, upperS: null, label: "gains more than 20 s", colour: "#1c5b56" },
];
const UNCHANGED_LOWER_S = -1;
// Far below any difference, so the lowest band is closed for the contour tracer.
const FLOOR_S = -1e6;

/** The drawn bands in order, losses first, for the map layer's colours and its legend. */
export const SECONDS_GAINED_LEGEND = BANDS.filter((b) => b.lowerS !== UNCHANGED_LOWER_S).map(({ label, colour, lowerS, upperS }) => ({ label, colour, lowerS, upperS }));

/**
 * The "seconds gained" map layer: bands of (B's warning − A's warning) on the primary channel,
 * traced as RFC 7946 GeoJSON by the engine's contour tracer on the difference of two grids of the
 * same geometry. Cells where no alert reaches in either version are left out.
 */
export function secondsGainedLayer(gridA: EngineGrid, gridB: EngineGrid, precision = 4): SecondsGained {
  if (gridA.width !== gridB.width || gridA.height !== gridB.height) throw new Error("the two grids must share one geometry");
  const difference = new Float32Array(gridA.warningS.length);
  for (let i = 0; i < difference.length; i++) difference[i] = gridB.warningS[i] - gridA.warningS[i];
  const primary = gridA.channels[0];
  const breaks = [FLOOR_S, ...BANDS.slice(1).map((b) => b.lowerS as number)];
  const traced = traceContours({ ...gridA, warningS: difference, channels: [{ ...primary, offsetS: 0 }] }, { warningBreaksS: breaks, precision });
  const features = traced.warning.features.flatMap((feature) => {
    const lower = feature.properties.lowerS === FLOOR_S ? null : feature.properties.lowerS;
    const band = BANDS.find((b) => b.lowerS === lower);
    if (!band || band.lowerS === UNCHANGED_LOWER_S) return [];
    return [{ type: "Feature" as const, properties: { layer: "seconds-gained" as const, label: band.label, lowerS: band.lowerS, upperS: band.upperS, colour: band.colour }, geometry: feature.geometry }];
  });
  return { type: "FeatureCollection", features };
}
