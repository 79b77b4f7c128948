import { betaPointFromOdds, regularizedBeta } from './incomplete-beta.js';
import { normalUpperTail } from './normal.js';

/**
 * Two-sided tail P(|T| > |t|) of Student's t with nu > 0 degrees of freedom:
 * I_x(nu/2, 1/2) with x = nu / (nu + t^2) (A&S 26.7.1 and 26.5.27), from the odds t^2 / nu so that
 * neither x nor 1 - x is formed by subtraction. nu = Infinity is the normal limit.
 * NaN for NaN input or nu <= 0.
 * @example studentTwoSidedTail(2.228, 10) // ≈ 0.05
 */
export function studentTwoSidedTail(t: number, nu: number): number {
  if (Number.isNaN(t) || !(nu > 0)) return Number.NaN;
  if (nu === Infinity) return 2 * normalUpperTail(Math.abs(t));
  if (t === 0) return 1;
  return regularizedBeta(nu / 2, 0.5, betaPointFromOdds((t * t) / nu), false);
}

/**
 * Upper tail P(T > t): half the two-sided tail for t >= 0, one minus half of it below 0.
 * @example studentUpperTail(1.812, 10) // ≈ 0.05
 */
export function studentUpperTail(t: number, nu: number): number {
  const half = studentTwoSidedTail(t, nu) / 2;
  return t >= 0 ? half : 1 - half;
}
