import { correctedScore, midranks, rankSumVariance } from './ranks.js';
import { normalUpperTail } from './special/normal.js';

/** The Wilcoxon rank-sum (Mann-Whitney) test of two samples. */
export interface RankSum {
  /** Mann-Whitney U of the second sample: pairs (a_i, b_j) with b_j > a_i, ties counting 1/2. */
  u: number;
  /** Continuity-corrected normal score of U, positive when the second sample is larger. */
  z: number;
  /** Two-sided p-value from z (normal approximation with the tie correction). */
  p: number;
}

/**
 * The two-sided Wilcoxon rank-sum test (Wilcoxon 1945; Mann & Whitney 1947, "On a test of whether
 * one of two random variables is stochastically larger than the other"): do the values of b tend
 * to lie above or below those of a? With m = |a|, n = |b| and midranks for ties,
 *   U = (rank sum of b) - n(n+1)/2,  E U = mn/2,  Var U as rankSumVariance,
 *   z = (U - E U -+ 1/2) / sqrt Var U (continuity correction towards E U),
 * and p = P(|Z| >= |z|) under the normal approximation (Hollander & Wolfe 1999, section 4.1),
 * good for m, n >= 8 and conservative in the far tail. `varianceFactor` widens Var U for
 * serially correlated values (longRunFactor). Distribution-free: heavy tails and
 * outliers change ranks, not the test. O((m + n) log(m + n)). Throws RangeError for an empty
 * sample or a non-finite value; p = 1 when every value is equal.
 * @example rankSumTest([1, 2, 3, 4, 5, 6, 7, 8], [9, 10, 11, 12, 13, 14, 15, 16]).u // 64
 */
export function rankSumTest(a: ArrayLike<number>, b: ArrayLike<number>, varianceFactor = 1): RankSum {
  const m = a.length;
  const n = b.length;
  if (m === 0 || n === 0) throw new RangeError('a rank-sum test needs values in both samples');
  const joined = new Float64Array(m + n);
  for (let i = 0; i < m; i++) joined[i] = a[i]!;
  for (let i = 0; i < n; i++) joined[m + i] = b[i]!;
  const { ranks, ties } = midranks(joined);
  let rankSum = 0;
  for (let i = m; i < m + n; i++) rankSum += ranks[i]!;
  const u = rankSum - (n * (n + 1)) / 2;
  const z = correctedScore(u - (m * n) / 2, varianceFactor * rankSumVariance(m, n, ties));
  return { u, z, p: z === 0 ? 1 : Math.min(1, 2 * normalUpperTail(Math.abs(z))) };
}
