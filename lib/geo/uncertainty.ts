/**
 * Ground-motion scatter (METHODS.md §9): the median and log10 sigma of PGV give, per place, the
 * probability that shaking reaches a threshold. Conversion scatter is left out on both scales.
 */

/**
 * Complementary error function, Chebyshev fit with fractional error below 1.2e-7
 * (Press et al., Numerical Recipes, 2nd ed., §6.2, `erfcc`).
 */
export function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.5 * z);
  const r =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? r : 2 - r;
}

/** Standard normal cumulative distribution Φ(z). */
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

/**
 * P(Y ≥ threshold) for a lognormal Y: 1 − Φ((log Y_thr − log Ŷ)/σ), all in log10 units
 * (computed as ½·erfc(z/√2) to keep precision in the upper tail).
 */
export function probabilityOfExceedance(log10Median: number, log10Threshold: number, sigmaLog10: number): number {
  return 0.5 * erfc((log10Threshold - log10Median) / (sigmaLog10 * Math.SQRT2));
}
