import { normalDensity, normalLogDensity } from './special/normal.js';

/** A spread must be a finite number >= 0; 0 is the degenerate fit of a constant history. */
function checkSpread(sd: number): void {
  if (!(sd >= 0) || !Number.isFinite(sd)) {
    throw new RangeError(`a standard deviation must be a finite number, 0 or more, got ${sd}`);
  }
}

/**
 * Gaussian density p(x) = exp(-(x - mu)^2 / (2 sigma^2)) / (sqrt(2 pi) sigma).
 * A zero sigma is the degenerate distribution: Infinity at the mean, 0 elsewhere.
 * Throws RangeError on a negative or non-finite sd.
 * @example gaussianDensity(0, 0, 1) // 0.3989422804014327
 */
export function gaussianDensity(x: number, mean: number, sd: number): number {
  checkSpread(sd);
  return normalDensity(x, mean, sd);
}

/**
 * log p(x), exact where p(x) underflows to 0 (beyond about 38 sigma).
 * @example gaussianLogDensity(0, 0, 1) // -0.9189385332046727
 */
export function gaussianLogDensity(x: number, mean: number, sd: number): number {
  checkSpread(sd);
  return normalLogDensity(x, mean, sd);
}

/**
 * Relative density under the fitted Gaussian used as is ("plug-in"): p(x) / p(mean) =
 * exp(-z^2 / 2). Unitless, in [0, 1]; 1 at the centre, about 0.0111 at 3 sigma. With a zero
 * sd it is 1 at the mean and 0 elsewhere (the limit), never NaN.
 * @example plugInRelativeDensity(3, 0, 1) // 0.011108996538242306
 */
export function plugInRelativeDensity(x: number, mean: number, sd: number): number {
  checkSpread(sd);
  if (sd === 0) return x === mean ? 1 : 0;
  const z = (x - mean) / sd;
  return Math.exp(-0.5 * z * z);
}

/**
 * Scale of the predictive distribution for one new run when mean and sigma were estimated from
 * n runs: s * sqrt(1 + 1/n), with s the n-1 standard deviation (a Student-t with n-1 degrees of
 * freedom around the mean; e.g. Gelman et al., Bayesian Data Analysis, section 3.2).
 * @example predictiveScale(1, 4) // 1.118033988749895
 */
export function predictiveScale(sampleSd: number, n: number): number {
  return sampleSd * Math.sqrt(1 + 1 / n);
}

/**
 * Relative density under the predictive Student-t with n-1 degrees of freedom:
 * f(t) / f(0) = (1 + t^2 / nu)^(-(nu + 1) / 2), t = (x - mean) / (s sqrt(1 + 1/n)).
 * Heavier tails than the Gaussian, so a short history needs a larger move to fall below a cutoff;
 * as n grows it approaches plugInRelativeDensity. Computed in log space (log1p) so far tails do
 * not underflow early. A zero sampleSd gives 1 at the mean, 0 elsewhere.
 * Throws RangeError when n < 2 (no degrees of freedom) or sampleSd is negative or not finite.
 * @example predictiveRelativeDensity(3, 0, 1, 1e9) // ≈ 0.011109 (large n: the Gaussian)
 */
export function predictiveRelativeDensity(x: number, mean: number, sampleSd: number, n: number): number {
  if (!(n >= 2)) {
    throw new RangeError(`the predictive distribution needs at least 2 runs, got ${n}`);
  }
  checkSpread(sampleSd);
  if (sampleSd === 0) return x === mean ? 1 : 0;
  const nu = n - 1;
  const t = (x - mean) / predictiveScale(sampleSd, n);
  return Math.exp((-(nu + 1) / 2) * Math.log1p((t * t) / nu));
}
