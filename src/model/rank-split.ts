import { correctedScore, midranks, rankSumVariance } from './ranks.js';
import { normalDensity, normalUpperTail } from './special/normal.js';

/** The best single split of a series into two levels, by ranks. */
export interface RankSplit {
  /** Where the second part starts (0-based). */
  at: number;
  /** The rank-sum score of the second part against the first at that split. */
  z: number;
  /** p-value of the largest |z| over the splits tried (maximumTail, capped at 1). */
  p: number;
}

/**
 * The most likely place of one level change: over every split t with at least `minSegment`
 * values on each side, the Wilcoxon rank-sum score z_t of x_t..x_(n-1) against x_0..x_(t-1)
 * (continuity- and tie-corrected, as rankSumTest), and the split with the largest |z_t|.
 * Standardising each split (Lombard 1987, "Rank tests for changepoint problems") keeps a change
 * near an end as findable as one in the middle, where the raw statistic of Pettitt (1979)
 * favours the middle. The p-value is that of the largest of the correlated scores (maximumTail:
 * Lausen & Schumacher 1992, or the Bonferroni bound where sharper). One ranking of the
 * whole series serves every split (rank sums by a running sum). O(n log n). Throws RangeError
 * for non-finite values; with fewer than 2 x minSegment values there is no split and p = 1.
 * @example rankSplit([1, 2, 1, 2, 1, 9, 8, 9, 8, 9], 2).at // 5
 */
export function rankSplit(values: ArrayLike<number>, minSegment = 1): RankSplit {
  if (!Number.isInteger(minSegment) || minSegment < 1) {
    throw new RangeError(`minSegment must be a whole number, 1 or more, got ${minSegment}`);
  }
  const n = values.length;
  const { ranks, ties } = midranks(values);
  if (n < 2 * minSegment) return { at: 0, z: 0, p: 1 };
  let total = 0;
  for (let i = 0; i < n; i++) total += ranks[i]!;
  let first = 0;
  let best = { at: 0, z: 0 };
  for (let t = 1; t < n; t++) {
    first += ranks[t - 1]!;
    if (t < minSegment || n - t < minSegment) continue;
    const m2 = n - t;
    const u = total - first - (m2 * (m2 + 1)) / 2;
    const z = correctedScore(u - (t * m2) / 2, rankSumVariance(t, m2, ties));
    if (Math.abs(z) > Math.abs(best.z)) best = { at: t, z };
  }
  const p = best.z === 0 ? 1 : maximumTail(Math.abs(best.z), n, minSegment);
  return { at: best.at === 0 ? minSegment : best.at, z: best.z, p };
}

/**
 * P(max |z_t| >= c) under no change, for splits t with minSegment <= t <= n - minSegment: the
 * smaller of the Bonferroni bound and the approximation for maximally selected rank statistics of
 * Lausen & Schumacher (1992, "Maximally selected rank statistics", Biometrics 48, after Miller &
 * Siegmund 1982), with e1 = minSegment / n and e2 = 1 - e1 the outermost split fractions:
 *   4 phi(c) / c + phi(c) (c - 1/c) ln(e2 (1 - e1) / ((1 - e2) e1)).
 * The splits' scores are strongly correlated, so the approximation is the sharper of the two
 * except for few splits, where Bonferroni is.
 */
function maximumTail(c: number, n: number, minSegment: number): number {
  const splits = n - 2 * minSegment + 1;
  const bonferroni = splits * 2 * normalUpperTail(c);
  const e1 = minSegment / n;
  const e2 = 1 - e1;
  const phi = normalDensity(c, 0, 1);
  const approximation = (4 * phi) / c + phi * (c - 1 / c) * Math.log((e2 * (1 - e1)) / ((1 - e2) * e1));
  return Math.min(1, bonferroni, approximation > 0 ? approximation : bonferroni);
}
