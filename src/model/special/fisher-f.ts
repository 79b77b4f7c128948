import { betaPointFromOdds, regularizedBeta } from './incomplete-beta.js';

/**
 * Upper tail P(F > f) of Fisher's F with d1 and d2 degrees of freedom:
 * I_x(d2/2, d1/2) with x = d2 / (d2 + d1 f) (A&S 26.6.2), from the odds d1 f / d2 so that a far
 * tail is computed directly. 1 for f <= 0; NaN for NaN input or d1, d2 not above 0.
 * @example fisherUpperTail(4.964602743730711, 1, 10) // ≈ 0.05
 */
export function fisherUpperTail(f: number, d1: number, d2: number): number {
  if (Number.isNaN(f) || !(d1 > 0 && d2 > 0)) return Number.NaN;
  if (f <= 0) return 1;
  return regularizedBeta(d2 / 2, d1 / 2, betaPointFromOdds((d1 * f) / d2), false);
}

/**
 * Lower tail (CDF) P(F <= f) = 1 - I_x(d2/2, d1/2) = I_(1-x)(d1/2, d2/2), computed directly.
 * @example fisherCdf(1, 4, 4) // 0.5
 */
export function fisherCdf(f: number, d1: number, d2: number): number {
  if (Number.isNaN(f) || !(d1 > 0 && d2 > 0)) return Number.NaN;
  if (f <= 0) return 0;
  return regularizedBeta(d2 / 2, d1 / 2, betaPointFromOdds((d1 * f) / d2), true);
}
