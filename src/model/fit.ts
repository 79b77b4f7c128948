import { meanAndSquares } from './moments.js';
import { median, medianAbsoluteDeviation } from './median.js';

/** 1 / Phi^-1(3/4): makes the MAD a consistent estimate of a Gaussian's sigma. */
export const MAD_TO_SIGMA = 1.4826;

/** sqrt(pi / 2): makes the mean absolute deviation a consistent estimate of a Gaussian's sigma. */
export const MEAN_AD_TO_SIGMA = Math.sqrt(Math.PI / 2);

/** How a Gaussian's centre and spread are estimated: divide by n, by n - 1, or median and MAD. */
export type FitMethod = 'mle' | 'unbiased' | 'robust';

/** A fitted Gaussian and what the predictive form needs. */
export interface GaussianFit {
  n: number;
  mean: number;
  /** The spread of the chosen fit method, never below the resolution floor. */
  sd: number;
  /**
   * The spread on which the predictive Student-t is built: the n-1 standard deviation for
   * mle/unbiased, the robust spread for robust; also floored.
   */
  sampleSd: number;
  method: FitMethod;
}

/**
 * Fits a Gaussian to the values.
 * - mle: mean and sqrt((1/n) sum (x - mean)^2), the maximum-likelihood estimate.
 * - unbiased: the same mean, dividing by n - 1.
 * - robust: median and 1.4826 x MAD, which a past outlier inside the baseline barely moves.
 *   When more than half the values are equal the MAD is 0 although the values vary; then the
 *   mean absolute deviation from the median x sqrt(pi/2) is used instead (common practice), so a
 *   quantised metric does not get a zero spread.
 * The spread is never below `resolution` (the smallest meaningful step). It is 0 only for a
 * constant history (or a single run) with resolution 0; the relative densities treat a zero
 * spread as "any other value is infinitely unlikely" instead of returning NaN.
 * O(n) (robust: O(n) expected, the medians by selection). Throws RangeError on an empty input,
 * a non-finite value or a negative or non-finite resolution.
 *
 * @example fitGaussian([9, 10, 11], 'mle') // { n: 3, mean: 10, sd: 0.8165, sampleSd: 1, ... }
 */
export function fitGaussian(values: ArrayLike<number>, method: FitMethod = 'mle', resolution = 0): GaussianFit {
  const { n, mean, squares } = meanAndSquares(values);
  if (!(resolution >= 0) || !Number.isFinite(resolution)) {
    throw new RangeError(`resolution must be a finite number, 0 or more, got ${resolution}`);
  }
  const sampleVariance = n > 1 ? squares / (n - 1) : 0;
  let centre: number;
  let spread: number;
  let sampleSpread: number;
  if (method === 'robust') {
    centre = median(values);
    spread = MAD_TO_SIGMA * medianAbsoluteDeviation(values);
    if (spread === 0) spread = MEAN_AD_TO_SIGMA * meanAbsoluteDeviation(values, centre);
    sampleSpread = spread;
  } else {
    centre = mean;
    spread = Math.sqrt(method === 'mle' ? squares / n : sampleVariance);
    sampleSpread = Math.sqrt(sampleVariance);
  }
  return {
    n,
    mean: centre,
    sd: Math.max(spread, resolution),
    sampleSd: Math.max(sampleSpread, resolution),
    method,
  };
}

/** Mean of |x - centre| (values already checked finite by meanAndSquares). */
function meanAbsoluteDeviation(values: ArrayLike<number>, centre: number): number {
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += Math.abs(values[i]! - centre);
  return sum / values.length;
}
