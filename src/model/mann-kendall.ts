import { kendallExactUpperTail } from './kendall-exact.js';
import { normalUpperTail } from './special/normal.js';

/** The Mann-Kendall trend test of a series, or of several blocks taken together. */
export interface MannKendall {
  /** Values counted (all blocks). */
  n: number;
  /** Kendall's S: later-greater pairs minus later-smaller pairs, summed over blocks. */
  s: number;
  /** Var(S) under no trend, with the tie correction (and the variance factor). */
  variance: number;
  /** (S - sign S) / sqrt(Var S): the continuity-corrected normal score; 0 when S = 0. */
  z: number;
  /** Two-sided p-value: exact when there are no ties and few pairs, else from z. */
  p: number;
  exact: boolean;
  /** S over the number of pairs compared (Kendall's tau-a against time). */
  tau: number;
}

/** Pairs up to which the exact null distribution is used (no ties): about 100 values in one block. */
export const EXACT_PAIRS = 5000;

/**
 * The Mann-Kendall test for a monotonic trend (Mann 1945, "Nonparametric tests against trend";
 * Kendall 1975, "Rank Correlation Methods"). For a series x_1..x_n in time order,
 *   S = sum over i < j of sign(x_j - x_i),
 *   Var(S) = [n(n-1)(2n+5) - sum over tie groups t(t-1)(2t+5)] / 18,
 *   Z = (S - 1) / sqrt Var(S) for S > 0, (S + 1) / sqrt Var(S) for S < 0, 0 for S = 0,
 * and the two-sided p-value is P(|Z| >= |z|). Several blocks (the segments between level steps)
 * are tested together as in the seasonal Kendall test (Hirsch, Slack & Smith 1982, "Techniques
 * of trend analysis for monthly water quality data"): S and Var(S) are the sums over blocks, and
 * only pairs within one block are compared. Without ties and with at most EXACT_PAIRS pairs the
 * p-value comes from the exact null distribution of S (kendallExactUpperTail), as the tables
 * of Kendall (1975) and Gilbert (1987, table A18) give it for small n. `varianceFactor` (at
 * least 1) widens Var(S) for serially correlated values (serialCorrection); the p-value then
 * comes from z.
 * O(sum of n_k^2). Throws RangeError for a non-finite value or fewer than 2 values in all.
 * The test assumes independent values: serial correlation makes it too eager.
 * @example mannKendall([[1, 2, 3, 4, 5]]).p // 0.0166... (exact: 2 / 120)
 */
export function mannKendall(blocks: readonly ArrayLike<number>[], varianceFactor = 1): MannKendall {
  let s = 0;
  let n = 0;
  let pairs = 0;
  let varianceSum = 0;
  let tied = false;
  const lengths: number[] = [];
  blocks.forEach((block, b) => {
    const m = block.length;
    for (let i = 0; i < m; i++) {
      const x = block[i]!;
      if (!Number.isFinite(x)) {
        throw new RangeError(`value ${x} at position ${i + 1} of block ${b + 1} is not a finite number`);
      }
    }
    for (let i = 0; i < m; i++) {
      const x = block[i]!;
      for (let j = i + 1; j < m; j++) s += Math.sign(block[j]! - x);
    }
    const ties = tieCorrection(block);
    if (ties > 0) tied = true;
    varianceSum += (m * (m - 1) * (2 * m + 5) - ties) / 18;
    n += m;
    pairs += (m * (m - 1)) / 2;
    if (m > 1) lengths.push(m);
  });
  if (pairs === 0) throw new RangeError('a trend test needs at least 2 values in one block');
  if (!(varianceFactor >= 1) || !Number.isFinite(varianceFactor)) {
    throw new RangeError(`a variance factor must be a finite number, 1 or more, got ${varianceFactor}`);
  }
  varianceSum *= varianceFactor;
  const z = s === 0 || !(varianceSum > 0) ? 0 : (s - Math.sign(s)) / Math.sqrt(varianceSum);
  const exact = !tied && varianceFactor === 1 && pairs <= EXACT_PAIRS;
  let p: number;
  if (!(varianceSum > 0)) p = 1;
  else if (exact) p = Math.min(1, 2 * kendallExactUpperTail(lengths, Math.abs(s)));
  else p = s === 0 ? 1 : Math.min(1, 2 * normalUpperTail(Math.abs(z)));
  return { n, s, variance: varianceSum, z, p, exact, tau: s / pairs };
}

/** sum over tie groups of t(t-1)(2t+5), from a sorted copy. */
function tieCorrection(block: ArrayLike<number>): number {
  const sorted = Float64Array.from(block).sort();
  let total = 0;
  let run = 1;
  for (let i = 1; i <= sorted.length; i++) {
    if (i < sorted.length && sorted[i] === sorted[i - 1]) {
      run++;
      continue;
    }
    if (run > 1) total += run * (run - 1) * (2 * run + 5);
    run = 1;
  }
  return total;
}
