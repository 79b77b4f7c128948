import { regularizedGamma } from './incomplete-gamma.js';

/**
 * Upper tail P(chi^2_k > q) = Q(k/2, q/2) (chi-square is the gamma law of shape k/2 and scale 2), computed directly for far tails.
 * NaN for NaN input or k <= 0; 1 for q <= 0.
 * @example chiSquareUpperTail(3.841458820694124, 1) // ≈ 0.05
 */
export function chiSquareUpperTail(q: number, k: number): number {
  if (Number.isNaN(q)) return Number.NaN;
  return regularizedGamma(k / 2, Math.max(0, q / 2), true);
}

/**
 * Lower tail (CDF) P(chi^2_k <= q) = P(k/2, q/2).
 * @example chiSquareCdf(2, 2) // 1 - e^-1 = 0.6321205588285577
 */
export function chiSquareCdf(q: number, k: number): number {
  if (Number.isNaN(q)) return Number.NaN;
  return regularizedGamma(k / 2, Math.max(0, q / 2), false);
}
