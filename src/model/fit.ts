import type { FitMethod } from '../config/types.js';
import { InputError } from './input-error.js';
import { meanAndSquares } from './moments.js';
import { median, medianAbsoluteDeviation } from './median.js';

/** 1 / Phi^-1(3/4): makes the MAD a consistent estimate of a Gaussian's sigma. */
export const MAD_TO_SIGMA = 1.4826;

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
 * The spread is never below `resolution` (the smallest meaningful step), so a constant history
 * gives a usable fit instead of a zero sigma. O(n) (robust: O(n log n)). Throws InputError on
 * an empty input, a non-finite value, or a zero spread with resolution 0 when n >= 2 is not met.
 *
 * @example fitGaussian([9, 10, 11], 'mle') // { n: 3, mean: 10, sd: 0.8165, sampleSd: 1, ... }
 */
export function fitGaussian(values: ArrayLike<number>, method: FitMethod = 'mle', resolution = 0): GaussianFit {
  const { n, mean, squares } = meanAndSquares(values);
  if (!(resolution >= 0)) throw new InputError(`resolution must be 0 or more, got ${resolution}`);
  const sampleVariance = n > 1 ? squares / (n - 1) : 0;
  let centre: number;
  let spread: number;
  let sampleSpread: number;
  if (method === 'robust') {
    centre = median(values);
    spread = MAD_TO_SIGMA * medianAbsoluteDeviation(values);
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
