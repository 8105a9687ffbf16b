/**
 * CIE 1976 lightness L* of an sRGB colour (CIE 15:2004 with the sRGB transfer function of
 * IEC 61966-2-1 and the D65 white). Only L* is needed: ramps are checked for monotonic lightness.
 */
import { relativeLuminance } from "@/lib/design/contrast";

const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

/** L* (0 black … 100 white) of a #rrggbb colour; Y is the WCAG relative luminance (D65, Y_white = 1). */
export function lightnessLstar(hex: string): number {
  const y = relativeLuminance(hex);
  return y > EPSILON ? 116 * Math.cbrt(y) - 16 : KAPPA * y;
}
