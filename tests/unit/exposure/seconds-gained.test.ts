// The seconds-gained layer: bands of B's warning minus A's, traced from two grids of one geometry.
import { area } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { SECONDS_GAINED_LEGEND, secondsGainedLayer } from "@/lib/exposure/seconds-gained";
import { lightnessLstar } from "@/lib/colour/lightness";
import { columnLonDeg, computeGrid } from "@/lib/geo";
import { homogeneousScenario } from "../../verification/scenario-fixtures";

describe("seconds-gained layer", () => {
  const { grid } = computeGrid(homogeneousScenario(), { cellKm: 5 });
  const half = Math.floor(grid.width / 2);
  // B loses 3 s in the western half of the grid and gains 7 s in the eastern half.
  const shifted = { ...grid, warningS: grid.warningS.map((w, i) => w + (i % grid.width < half ? -3 : 7)) };
  const layer = secondsGainedLayer(grid, shifted);

  it("draws the band of each side, and between them only a sliver within one cell of the step", () => {
    // Marching squares interpolate linearly between cell centres, so the step from −3 to 7 s passes
    // through the 1–5 s band in the half-cells on either side of the boundary (and through the
    // unchanged band, which is not drawn).
    expect(layer.features.map((f) => f.properties.label)).toEqual(["loses 1–5 s", "gains 1–5 s", "gains 5–10 s"]);
    // Its area (Turf's spherical area, ample for a bound) is under one column of cells.
    const sliver = layer.features.find((f) => f.properties.lowerS === 1)!;
    const columnKm2 = grid.height * grid.cellAreaKm2[Math.floor(grid.height / 2)];
    expect(area(sliver) / 1e6).toBeLessThan(columnKm2);
  });

  it("puts the gains east of the middle (to within one cell) and leaves the unchanged band out", () => {
    const gains = layer.features.find((f) => f.properties.lowerS === 5)!;
    const westmost = Math.min(...gains.geometry.coordinates.flat(2).map((p) => p[0]));
    const boundary = (columnLonDeg(grid, half - 1) + columnLonDeg(grid, half)) / 2;
    expect(Math.abs(westmost - boundary)).toBeLessThanOrEqual(grid.cellLonDeg);
    expect(secondsGainedLayer(grid, grid).features).toEqual([]);
  });

  it("colours each side darker with the size of the change, ≥ 10 L* between neighbours (common practice, no source)", () => {
    const losses = SECONDS_GAINED_LEGEND.filter((b) => (b.upperS ?? 1) <= -1).map((b) => lightnessLstar(b.colour));
    const gains = SECONDS_GAINED_LEGEND.filter((b) => (b.lowerS ?? -1) >= 1).map((b) => lightnessLstar(b.colour));
    // Losses run from the largest loss (darkest) towards no change; gains from no change to the largest gain (darkest).
    for (let k = 1; k < losses.length; k++) expect(losses[k] - losses[k - 1]).toBeGreaterThanOrEqual(10);
    for (let k = 1; k < gains.length; k++) expect(gains[k - 1] - gains[k]).toBeGreaterThanOrEqual(10);
  });
});
