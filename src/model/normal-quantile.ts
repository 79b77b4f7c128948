import { normalDensity, normalUpperTail } from './special/normal.js';

/**
 * The standard normal quantile: the z with P(Z <= z) = p, for 0 < p < 1.
 * Starts from Abramowitz & Stegun 26.2.23 (rational approximation, error below 4.5e-4) on the
 * smaller tail q = min(p, 1 - p), then takes Newton steps on Q(z) = q, with Q the directly
 * computed upper tail (no 1 - cdf cancellation), so the result is good to a few ulps across the
 * whole range. The steps are bounded (A&S's start is within 4.5e-4, Newton doubles the digits).
 * Throws RangeError unless 0 < p < 1.
 * @example normalQuantile(0.975) // ≈ 1.959963984540054
 */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`a normal quantile needs a probability between 0 and 1, got ${p}`);
  if (p === 0.5) return 0;
  const q = Math.min(p, 1 - p);
  const t = Math.sqrt(-2 * Math.log(q));
  let z = t - (2.515517 + 0.802853 * t + 0.010328 * t * t) / (1 + 1.432788 * t + 0.189269 * t * t + 0.001308 * t ** 3);
  for (let step = 0; step < 6; step++) {
    const density = normalDensity(z, 0, 1);
    if (!(density > 0)) break;
    // Newton on Q(z) - q, with Q' = -phi; a relative update keeps the far tail exact too.
    const next = z + (normalUpperTail(z) - q) / density;
    if (next === z) break;
    z = next;
  }
  return p < 0.5 ? -z : z;
}
