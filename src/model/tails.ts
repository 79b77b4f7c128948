import { logGamma } from './special/log-gamma.js';
import { normalQuantile } from './normal-quantile.js';
import { normalUpperTail } from './special/normal.js';
import { studentTwoSidedTail, studentUpperTail } from './special/student-t.js';

/** Which tail counts: the upper (higher is worse), the lower, or both. */
export type Side = 'upper' | 'lower' | 'both';

/**
 * Tail probability of a standard normal z: P(Z > z), P(Z < z) or P(|Z| > |z|).
 * Uses the upper tail erfc(z / sqrt 2) / 2 directly (no 1 - cdf cancellation in the far tail).
 * Throws RangeError on NaN.
 * @example normalTail(1.96, 'both') // ≈ 0.04999579
 */
export function normalTail(z: number, side: Side): number {
  if (Number.isNaN(z)) throw new RangeError('a tail probability needs a number, got NaN');
  if (side === 'upper') return normalUpperTail(z);
  if (side === 'lower') return normalUpperTail(-z);
  return 2 * normalUpperTail(Math.abs(z));
}

/**
 * Tail probability of a Student-t statistic with nu > 0 degrees of freedom (whole or not;
 * Infinity is the normal), sides as normalTail, from the incomplete beta I_x(nu/2, 1/2),
 * x = nu / (nu + t^2) (A&S 26.7.1), which keeps full relative precision far out in the tail.
 * The one Student-t tail of Bellgate. Throws RangeError on NaN or nu <= 0.
 * @example studentTail(2.228, 10, 'both') // ≈ 0.05 (standard t table, nu = 10)
 */
export function studentTail(t: number, nu: number, side: Side): number {
  if (Number.isNaN(t)) throw new RangeError('a tail probability needs a number, got NaN');
  if (!(nu > 0)) throw new RangeError(`a Student-t needs degrees of freedom above 0, got ${nu}`);
  if (side === 'upper') return studentUpperTail(t, nu);
  if (side === 'lower') return studentUpperTail(-t, nu);
  return studentTwoSidedTail(t, nu);
}

/**
 * The t >= 0 whose upper tail P(T > t) is p (0 < p <= 1/2): the Student-t quantile 1 - p, by
 * Newton's method on ln P(T > t) - ln p (slope -f(t) / P(T > t), f the density), kept inside a
 * bracket that halves whenever a step would leave it; to 1e-12 relative, for any nu > 0 and any p
 * down to the smallest double. It starts from the Cornish-Fisher expansion of t in the normal
 * quantile z (Abramowitz & Stegun 26.7.5, three terms), within a few percent from nu = 3 on, so a
 * few steps reach the root; the normal's own quantile for nu = Infinity. Throws RangeError otherwise.
 * @example studentUpperQuantile(0.025, 10) // ≈ 2.228 (standard t table)
 */
export function studentUpperQuantile(p: number, nu: number): number {
  if (!(p > 0 && p <= 0.5)) throw new RangeError(`an upper tail must lie in (0, 0.5], got ${p}`);
  if (!(nu > 0)) throw new RangeError(`a Student-t needs degrees of freedom above 0, got ${nu}`);
  if (p === 0.5) return 0;
  const z = -normalQuantile(p);
  if (nu === Infinity) return z;
  const target = Math.log(p);
  const z2 = z * z;
  const expansion =
    z +
    (z * (z2 + 1)) / (4 * nu) +
    (z * (5 * z2 * z2 + 16 * z2 + 3)) / (96 * nu * nu) +
    (z * (3 * z2 * z2 * z2 + 19 * z2 * z2 + 17 * z2 - 15)) / (384 * nu * nu * nu);
  // The t tail lies above the normal's, so t >= z; a start the bracket cannot use falls back to 2z.
  let t = Number.isFinite(expansion) && expansion > z ? expansion : 2 * z;
  let lo = 0;
  let hi = Infinity;
  for (let i = 0; i < 400; i++) {
    const logTail = Math.log(studentUpperTail(t, nu));
    const g = logTail - target;
    if (g === 0) return t;
    if (g > 0) lo = t;
    else hi = t;
    const slope = -Math.exp(studentLogDensity(t, nu) - logTail);
    let next = t - g / slope;
    if (!(next > lo && next < hi)) next = hi === Infinity ? 4 * t : (lo + hi) / 2;
    if (Math.abs(next - t) <= 1e-12 * next) return next;
    t = next;
  }
  return t;
}

/** A Student-t upper quantile (p, nu) -> t, as studentUpperQuantile. */
export type UpperQuantile = (p: number, nu: number) => number;

/**
 * studentUpperQuantile remembering its answers: one check asks for the same few (level, nu)
 * pairs for every metric (thousands of root searches otherwise). A fresh memory per call, so
 * the core keeps no state between checks.
 * @example const q = rememberedQuantile(); q(0.025, 10) === q(0.025, 10) // true, one search
 */
export function rememberedQuantile(): UpperQuantile {
  const known = new Map<number, Map<number, number>>();
  return (p, nu) => {
    let byNu = known.get(p);
    if (byNu === undefined) known.set(p, (byNu = new Map()));
    let t = byNu.get(nu);
    if (t === undefined) byNu.set(nu, (t = studentUpperQuantile(p, nu)));
    return t;
  };
}

/**
 * Relative density of a Student-t with nu degrees of freedom at t, f(t) / f(0) =
 * (1 + t^2 / nu)^(-(nu + 1) / 2) (exp(-t^2 / 2) for nu = Infinity), computed with log1p so far
 * tails do not underflow early: the quantity a cutoff is compared with.
 * @example studentRelativeDensity(3, Infinity) // 0.011108996538242306
 */
export function studentRelativeDensity(t: number, nu: number): number {
  if (nu === Infinity) return Math.exp(-0.5 * t * t);
  return Math.exp((-(nu + 1) / 2) * Math.log1p((t * t) / nu));
}

/**
 * The |t| at which studentRelativeDensity falls to `cutoff` (0 < cutoff <= 1):
 * sqrt(nu (cutoff^(-2 / (nu + 1)) - 1)), sqrt(-2 ln cutoff) for nu = Infinity.
 * @example cutoffT(0.01, Infinity) // 3.0348542587702925
 */
export function cutoffT(cutoff: number, nu: number): number {
  checkCutoff(cutoff);
  if (nu === Infinity) return Math.sqrt(Math.max(0, -2 * Math.log(cutoff)));
  return Math.sqrt(nu * Math.expm1((-2 / (nu + 1)) * Math.log(cutoff)));
}

/**
 * ln of the Student-t density with nu degrees of freedom and scale 1 at t.
 * @example studentLogDensity(0, Infinity) // -0.9189385332046727
 */
export function studentLogDensity(t: number, nu: number): number {
  if (nu === Infinity) return -0.5 * t * t - 0.9189385332046727;
  return (
    logGamma((nu + 1) / 2) - logGamma(nu / 2) - 0.5 * Math.log(nu * Math.PI) - ((nu + 1) / 2) * Math.log1p((t * t) / nu)
  );
}

/** A cutoff is a relative density: a number in (0, 1]. */
function checkCutoff(cutoff: number): void {
  if (!(cutoff > 0 && cutoff <= 1))
    throw new RangeError(`cutoff must be a number above 0 and at most 1, got ${cutoff}`);
}

/**
 * How many sigma away the relative density of a Gaussian falls to `cutoff`: sqrt(-2 ln cutoff).
 * Throws RangeError unless 0 < cutoff <= 1.
 * @example cutoffSigma(0.01) // 3.0348542587702925
 */
export function cutoffSigma(cutoff: number): number {
  return cutoffT(cutoff, Infinity);
}

/**
 * The two-sided normal tail probability at the cutoff's sigma: the false-alarm level a cutoff
 * stands for under a Gaussian (0.01 -> 3.03 sigma -> 0.0024).
 * @example cutoffLevel(0.01) // ≈ 0.002407
 */
export function cutoffLevel(cutoff: number): number {
  return normalTail(cutoffSigma(cutoff), 'both');
}
