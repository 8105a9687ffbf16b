/**
 * The d3 scales that colour scenario results. The map's layer styles and the legends are both
 * built from these, so a colour on the map always means what its legend row says.
 */
import { interpolateLab } from "d3-interpolate";
import { scaleLinear, scaleOrdinal, scaleThreshold, type ScaleOrdinal, type ScaleThreshold } from "d3-scale";
import { contrastRatio } from "@/lib/design/contrast";
import { INTENSITY_RAMP, POPULATION_RAMP, SWATCH_TEXT_COLOURS, WARNING_RAMP } from "./ramps";

/** d3-interpolate writes "rgb(r, g, b)"; legends and contrast checks want #rrggbb. */
function rgbToHex(rgb: string): string {
  const channels = /^rgb\((\d+), (\d+), (\d+)\)$/.exec(rgb);
  if (!channels) return rgb;
  return `#${channels.slice(1, 4).map((c) => Number(c).toString(16).padStart(2, "0")).join("")}`;
}

/** `count` colours along a ramp: the ramp itself when the counts match, else evenly interpolated in CIELAB. */
export function sampleRamp(ramp: readonly string[], count: number): string[] {
  if (count === ramp.length) return [...ramp];
  if (count <= 1) return [ramp[0]];
  const along = scaleLinear<string>()
    .domain(ramp.map((_, i) => i / (ramp.length - 1)))
    .range([...ramp])
    .interpolate(interpolateLab);
  return Array.from({ length: count }, (_, i) => rgbToHex(along(i / (count - 1))));
}

/**
 * Warning bands by id (as `warningBands(breaksS)` names them: "blind", "0-5", …, "60+"): the blind
 * zone darkest, longer warnings lighter.
 */
export function warningColourScale(bandIds: readonly string[]): ScaleOrdinal<string, string> {
  return scaleOrdinal<string, string>().domain(bandIds).range(sampleRamp(WARNING_RAMP, bandIds.length));
}

/** Number of intensity classes on either scale (JMA 0 … 7 with the split 5 and 6; MMI I … X). */
const INTENSITY_CLASS_COUNT = 10;

/**
 * Intensity classes by class index (0 = JMA 0 / MMI I … 9 = JMA 7 / MMI X); the lowest class is
 * left unfilled (`null`).
 */
export function intensityColourScale(): ScaleOrdinal<number, string | null> {
  const indices = Array.from({ length: INTENSITY_CLASS_COUNT }, (_, i) => i);
  return scaleOrdinal<number, string | null>().domain(indices).range([null, ...INTENSITY_RAMP]);
}

/** Lower edges of the population density classes, people per km². */
export const POPULATION_DENSITY_BREAKS_PER_KM2 = [10, 100, 500, 2000] as const;

/** People per km² → colour. */
export function populationColourScale(): ScaleThreshold<number, string> {
  return scaleThreshold<number, string>().domain([...POPULATION_DENSITY_BREAKS_PER_KM2]).range([...POPULATION_RAMP]);
}

/** The swatch text colour with the most contrast on `background` (WCAG 2.2 contrast ratio). */
export function textColourOn(background: string): string {
  const [a, b] = SWATCH_TEXT_COLOURS;
  return contrastRatio(a, background) >= contrastRatio(b, background) ? a : b;
}
