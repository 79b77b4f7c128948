import { midranks } from './ranks.js';

/**
 * The variance factor n / n* of the modified Mann-Kendall test for serially correlated values
 * (Hamed & Rao 1998, "A modified Mann-Kendall trend test for autocorrelated data", Journal of
 * Hydrology 204): with rho_k the lag-k autocorrelation of the ranks of the detrended values,
 *   n / n* = 1 + 2 / (n(n-1)(n-2)) x sum over k = 1..n-1 of (n-k)(n-k-1)(n-k-2) rho_k,
 * and Var(S) multiplied by it. Hamed & Rao add every lag significant at 5% (|rho_k| > 1.96 /
 * sqrt n); here the sum stops at the first lag that is not (as longRunFactor, which says why). CI timings come in load regimes that last a few runs; such runs are not
 * independent, and the plain test would call their drift a trend. The factor is kept at 1 or more
 * (a negative correlation does not make the test bolder). O(n^2). Throws RangeError for
 * non-finite values; 1 for fewer than 3 values.
 * @example serialCorrection([1, 1, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0]) // > 1
 */
export function serialCorrection(detrended: ArrayLike<number>): number {
  const n = detrended.length;
  if (n < 3) {
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(detrended[i]!))
        throw new RangeError(`value ${detrended[i]} at position ${i + 1} is not a finite number`);
    }
    return 1;
  }
  const { ranks } = midranks(detrended);
  const centre = (n + 1) / 2;
  let squares = 0;
  for (let i = 0; i < n; i++) squares += (ranks[i]! - centre) ** 2;
  if (!(squares > 0)) return 1;
  const bound = 1.959963984540054 / Math.sqrt(n);
  let sum = 0;
  for (let k = 1; k < n - 2; k++) {
    let cross = 0;
    for (let i = 0; i + k < n; i++) cross += (ranks[i]! - centre) * (ranks[i + k]! - centre);
    const rho = cross / squares;
    if (!(Math.abs(rho) > bound)) break;
    sum += (n - k) * (n - k - 1) * (n - k - 2) * rho;
  }
  return Math.max(1, 1 + (2 * sum) / (n * (n - 1) * (n - 2)));
}

/**
 * The variance factor of a mean of serially correlated values: 1 + 2 sum over k of (1 - k/n) rho_k
 * (the long-run variance over the variance; e.g. Box, Jenkins & Reinsel, "Time Series Analysis",
 * on the variance of a sample mean), with rho_k the lag-k autocorrelation of the ranks of the
 * residuals, summed over the lags before the first one that is not significant at 5%
 * (|rho_k| <= 1.96 / sqrt n; at most n / 4). Stopping there, rather than adding every significant
 * lag, keeps the long lags out: their sample autocorrelations sum to about -1/2 whatever the
 * process, and would cancel the short ones (the truncation of Geyer 1992, "Practical Markov chain
 * Monte Carlo", in its simplest form).
 * A rank test of two long segments of such values has its variance widened by about this factor.
 * Kept at 1 or more. O(n^2 / 4). Throws RangeError for non-finite values; 1 for fewer than 8 values.
 * @example longRunFactor([1, 1, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0]) // > 1
 */
export function longRunFactor(residuals: ArrayLike<number>): number {
  const n = residuals.length;
  const { ranks } = midranks(residuals);
  if (n < 8) return 1;
  const centre = (n + 1) / 2;
  let squares = 0;
  for (let i = 0; i < n; i++) squares += (ranks[i]! - centre) ** 2;
  if (!(squares > 0)) return 1;
  const bound = 1.959963984540054 / Math.sqrt(n);
  let sum = 0;
  for (let k = 1; k <= n / 4; k++) {
    let cross = 0;
    for (let i = 0; i + k < n; i++) cross += (ranks[i]! - centre) * (ranks[i + k]! - centre);
    const rho = cross / squares;
    if (!(Math.abs(rho) > bound)) break;
    sum += (1 - k / n) * rho;
  }
  return Math.max(1, 1 + 2 * sum);
}
