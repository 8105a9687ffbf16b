/**
 * Largest-remainder rounding (Hamilton's method): every share is rounded down, and the units
 * still missing to reach `total` go to the largest fractional parts, ties to the lower index.
 * Used so every exposure table adds up exactly to the rounded total population.
 */
export function roundLargestRemainder(values: ArrayLike<number>, total: number): Float64Array {
  const rounded = new Float64Array(values.length);
  let assigned = 0;
  for (let i = 0; i < values.length; i++) {
    rounded[i] = Math.floor(values[i]);
    assigned += rounded[i];
  }
  const missing = Math.max(0, Math.round(total - assigned));
  if (missing === 0) return rounded;
  const order = Array.from({ length: values.length }, (_, i) => i).sort((a, b) => values[b] - rounded[b] - (values[a] - rounded[a]) || a - b);
  for (let k = 0; k < missing && k < order.length; k++) rounded[order[k]] += 1;
  return rounded;
}
