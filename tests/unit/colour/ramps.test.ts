import { describe, expect, it } from "vitest";
import { intensityLegend, populationLegend, warningLegend, type LegendRow } from "@/lib/colour/legends";
import { lightnessLstar } from "@/lib/colour/lightness";
import { INTENSITY_RAMP, POPULATION_RAMP, WARNING_RAMP } from "@/lib/colour/ramps";
import { sampleRamp } from "@/lib/colour/scales";
import { contrastRatio } from "@/lib/design/contrast";
import { DEFAULT_WARNING_BREAKS_S } from "@/lib/scenario/defaults";

describe("lightnessLstar (CIE 1976 L* of sRGB, D65)", () => {
  it("gives 100 for white and 0 for black (CIE 15 definition)", () => {
    expect(lightnessLstar("#ffffff")).toBeCloseTo(100, 6);
    expect(lightnessLstar("#000000")).toBeCloseTo(0, 6);
  });

  it("gives the widely quoted L* of sRGB red (53.24) and of #808080 (53.59) (from memory)", () => {
    expect(lightnessLstar("#ff0000")).toBeCloseTo(53.24, 1);
    expect(lightnessLstar("#808080")).toBeCloseTo(53.59, 1);
  });
});

/** Smallest step in L* between neighbouring rows, and whether L* always moves the same way. */
function lightnessSteps(colours: readonly string[]) {
  const l = colours.map(lightnessLstar);
  const steps = l.slice(1).map((value, i) => value - l[i]);
  return { smallest: Math.min(...steps.map(Math.abs)), monotonic: steps.every((s) => s > 0) || steps.every((s) => s < 0) };
}

const legends: [string, LegendRow[]][] = [
  ["warning seconds, default breaks", warningLegend(DEFAULT_WARNING_BREAKS_S.value)],
  ["JMA intensity classes", intensityLegend("jma")],
  ["MMI classes", intensityLegend("mmi")],
  ["population density", populationLegend()],
];

describe("legend colours are lightness-monotonic: neighbours ≥ 10 apart in CIELAB L* (common practice, no source)", () => {
  it.each(legends)("%s", (_name, rows) => {
    const { smallest, monotonic } = lightnessSteps(rows.map((r) => r.colour));
    console.info(`${_name}: smallest L* step ${smallest.toFixed(1)}`);
    expect(monotonic).toBe(true);
    expect(smallest).toBeGreaterThanOrEqual(10);
  });

  it("the ramps themselves, as written", () => {
    for (const ramp of [WARNING_RAMP, INTENSITY_RAMP, POPULATION_RAMP]) {
      expect(lightnessSteps(ramp).monotonic).toBe(true);
      expect(lightnessSteps(ramp).smallest).toBeGreaterThanOrEqual(10);
    }
  });

  it("a ramp sampled for fewer bands stays monotonic (interpolated in CIELAB)", () => {
    const five = sampleRamp(WARNING_RAMP, 5);
    expect(five).toHaveLength(5);
    expect(lightnessSteps(five).monotonic).toBe(true);
    expect(five[0]).toBe(WARNING_RAMP[0]);
  });
});

describe("legend text on every swatch meets WCAG 2.2 SC 1.4.3 (≥ 4.5:1)", () => {
  it.each(legends)("%s", (_name, rows) => {
    for (const row of rows) expect(contrastRatio(row.textColour, row.colour), `${row.label} on ${row.colour}`).toBeGreaterThanOrEqual(4.5);
  });
});

describe("legend labels carry units and planner's class names", () => {
  it("names warning bands in seconds and JMA classes in full", () => {
    expect(warningLegend([0, 5, 10]).map((r) => r.label)).toEqual(["blind zone, 0 s or less", "0–5 s", "5–10 s", "more than 10 s"]);
    expect(intensityLegend("jma").map((r) => r.label)).toContain("JMA 5-lower");
    expect(intensityLegend("mmi")[0].label).toBe("MMI II");
  });
});
