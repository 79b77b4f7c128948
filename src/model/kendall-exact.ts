/**
 * P(S >= s) for Kendall's S under no trend and no ties, with S summed over independent blocks of
 * the given lengths (one block: the classic exact tables, Kendall 1975; Gilbert 1987, table A18).
 * Within a block of n values every order is equally likely, and S = n(n-1)/2 - 2I with I the
 * number of inversions, whose distribution has the generating function
 *   prod over k = 1..n of (1 + x + ... + x^(k-1)) / k
 * (the Mahonian numbers over n!). Each factor is a moving sum of width k over the coefficients,
 * so a block costs O(n x pairs); blocks convolve because they are independent. Probabilities are
 * kept (divided by k at each factor), never counts, so n! never overflows.
 * Throws RangeError for a length below 1 or a total of pairs over 20,000.
 * @example kendallExactUpperTail([4], 6) // 1 / 24
 */
export function kendallExactUpperTail(lengths: readonly number[], s: number): number {
  let total = 0;
  for (const n of lengths) {
    if (!Number.isInteger(n) || n < 1)
      throw new RangeError(`a block length must be a whole number, 1 or more, got ${n}`);
    total += (n * (n - 1)) / 2;
  }
  if (total > 20_000) throw new RangeError(`the exact distribution of S is limited to 20,000 pairs, got ${total}`);
  // dist[i]: P(total inversions = i) over all blocks so far.
  let dist: Float64Array = new Float64Array([1]);
  for (const n of lengths) dist = convolve(dist, inversions(n));
  // S >= s  <=>  total - 2 I >= s  <=>  I <= (total - s) / 2.
  const most = Math.floor((total - s) / 2);
  if (most < 0) return 0;
  let p = 0;
  for (let i = 0; i <= Math.min(most, dist.length - 1); i++) p += dist[i]!;
  return Math.min(1, p);
}

/** P(I = i) for the inversions I of a random order of n distinct values. */
function inversions(n: number): Float64Array {
  let dist: Float64Array = new Float64Array([1]);
  for (let k = 2; k <= n; k++) {
    const next = new Float64Array(dist.length + k - 1);
    // next[i] = (dist[i] + dist[i-1] + ... + dist[i-k+1]) / k, as a moving sum.
    let window = 0;
    for (let i = 0; i < next.length; i++) {
      if (i < dist.length) window += dist[i]!;
      if (i - k >= 0) window -= dist[i - k]!;
      next[i] = Math.max(0, window) / k;
    }
    dist = next;
  }
  return dist;
}

function convolve(a: Float64Array, b: Float64Array): Float64Array {
  if (a.length === 1) return b.map((x) => x * a[0]!);
  const out = new Float64Array(a.length + b.length - 1);
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    if (x === 0) continue;
    for (let j = 0; j < b.length; j++) out[i + j] = out[i + j]! + x * b[j]!;
  }
  return out;
}
