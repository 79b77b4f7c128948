/** Midranks of a sample and the tie term its rank tests need. */
export interface Ranks {
  /** Rank 1..n of each value in input order; tied values share their mean rank. */
  ranks: Float64Array;
  /** sum over tie groups of t^3 - t (0 without ties). */
  ties: number;
}

/**
 * Midranks of the values (ties share the mean of the ranks they span) and the tie term
 * sum (t^3 - t) of the rank-sum variance. O(n log n). Throws RangeError for a non-finite value.
 * @example midranks([10, 30, 20, 20]).ranks // Float64Array [1, 4, 2.5, 2.5]
 */
export function midranks(values: ArrayLike<number>): Ranks {
  const n = values.length;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(values[i]!))
      throw new RangeError(`value ${values[i]} at position ${i + 1} is not a finite number`);
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a]! - values[b]!);
  const ranks = new Float64Array(n);
  let ties = 0;
  for (let i = 0; i < n;) {
    let j = i + 1;
    while (j < n && values[order[j]!] === values[order[i]!]) j++;
    const mid = (i + 1 + j) / 2;
    for (let k = i; k < j; k++) ranks[order[k]!] = mid;
    const t = j - i;
    ties += t * t * t - t;
    i = j;
  }
  return { ranks, ties };
}

/**
 * Var U of the Mann-Whitney statistic for samples of m and n values with tie term `ties`:
 * mn/12 [(m + n + 1) - ties / ((m + n)(m + n - 1))] (Hollander & Wolfe 1999, section 4.1).
 */
export function rankSumVariance(m: number, n: number, ties: number): number {
  const total = m + n;
  return ((m * n) / 12) * (total + 1 - (total > 1 ? ties / (total * (total - 1)) : 0));
}

/** The continuity-corrected normal score of U - E U: moved half a unit towards 0 first. */
export function correctedScore(offset: number, variance: number): number {
  if (!(variance > 0)) return 0;
  return (Math.sign(offset) * Math.max(0, Math.abs(offset) - 0.5)) / Math.sqrt(variance);
}
