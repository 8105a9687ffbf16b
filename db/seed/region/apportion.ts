/**
 * Rounds non-negative weights to whole numbers that add up to `total` exactly: each gets the floor of
 * its share, and the remaining units go to the largest remainders (Hamilton's method); ties go to the
 * lower index, so the result is deterministic.
 */
export function apportion(weights: Float64Array, total: number): Float64Array {
  const sum = weights.reduce((a, b) => a + b, 0);
  if (!(sum > 0)) throw new Error("apportion: the weights add up to zero");
  const counts = new Float64Array(weights.length);
  const remainders: { index: number; remainder: number }[] = [];
  let assigned = 0;
  for (let i = 0; i < weights.length; i++) {
    const share = (weights[i] / sum) * total;
    counts[i] = Math.floor(share);
    assigned += counts[i];
    remainders.push({ index: i, remainder: share - counts[i] });
  }
  remainders.sort((a, b) => b.remainder - a.remainder || a.index - b.index);
  for (let k = 0; k < total - assigned; k++) counts[remainders[k].index] += 1;
  return counts;
}
