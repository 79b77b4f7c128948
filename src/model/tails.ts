import { InputError } from '../errors/input-error.js';
import { normalUpperTail } from './special/normal.js';
import { studentTwoSidedTail, studentUpperTail } from './special/student-t.js';
import { seriesTwoSidedTail } from './student-tail-series.js';

/** Which tail counts: the upper (higher is worse), the lower, or both. */
export type Side = 'upper' | 'lower' | 'both';

/**
 * Tail probability of a standard normal z: P(Z > z), P(Z < z) or P(|Z| > |z|).
 * Uses the upper tail erfc(z / sqrt 2) / 2 directly (no 1 - cdf cancellation in the far tail).
 * @example normalTail(1.96, 'both') // ≈ 0.04999579
 */
export function normalTail(z: number, side: Side): number {
  if (Number.isNaN(z)) throw new InputError('a tail probability needs a number, got NaN');
  if (side === 'upper') return normalUpperTail(z);
  if (side === 'lower') return normalUpperTail(-z);
  return 2 * normalUpperTail(Math.abs(z));
}

/**
 * Tail probability of a Student-t statistic with nu degrees of freedom, sides as normalTail.
 * Whole nu and a tail not too small take the finite series (seriesTwoSidedTail, A&S 26.7.3-4);
 * the rest the incomplete beta I_x(nu/2, 1/2), x = nu / (nu + t^2), which keeps full relative
 * precision far out in the tail.
 * @example studentTail(2.228, 10, 'both') // ≈ 0.05 (standard t table, nu = 10)
 */
export function studentTail(t: number, nu: number, side: Side): number {
  if (Number.isNaN(t)) throw new InputError('a tail probability needs a number, got NaN');
  if (!(nu > 0)) throw new InputError(`a Student-t needs degrees of freedom above 0, got ${nu}`);
  const both = seriesTwoSidedTail(t, nu);
  if (both !== undefined) {
    if (side === 'both') return both;
    // One side is half the two-sided tail on the far side of 0, and 1 minus that on the near side.
    const far = side === 'upper' ? t >= 0 : t <= 0;
    return far ? both / 2 : 1 - both / 2;
  }
  if (side === 'upper') return studentUpperTail(t, nu);
  if (side === 'lower') return studentUpperTail(-t, nu);
  return studentTwoSidedTail(t, nu);
}

/** A cutoff is a relative density: a number in (0, 1]. */
function checkCutoff(cutoff: number): void {
  if (!(cutoff > 0 && cutoff <= 1)) {
    throw new InputError(`cutoff must be a number above 0 and at most 1, got ${cutoff}`, {
      fix: 'use a relative density such as 0.01',
    });
  }
}

/**
 * How many sigma away the relative density of a Gaussian falls to `cutoff`: sqrt(-2 ln cutoff).
 * Throws InputError unless 0 < cutoff <= 1.
 * @example cutoffSigma(0.01) // 3.0348542587702925
 */
export function cutoffSigma(cutoff: number): number {
  checkCutoff(cutoff);
  return Math.sqrt(Math.max(0, -2 * Math.log(cutoff)));
}

/**
 * The two-sided normal tail probability at the cutoff's sigma: the false-alarm level a cutoff
 * stands for under a Gaussian (0.01 -> 3.03 sigma -> 0.0024). Family control uses it as alpha.
 * @example cutoffLevel(0.01) // ≈ 0.002407
 */
export function cutoffLevel(cutoff: number): number {
  return normalTail(cutoffSigma(cutoff), 'both');
}
