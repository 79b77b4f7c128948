import { ERF_SMALL_LIMIT, erfSmall, erfcScaledTail, expNegSquare } from './erfc.js';

/** ln sqrt(2 pi). */
const LN_SQRT_2PI = 0.91893853320467274178;
const INV_SQRT_2PI = 0.39894228040143267794;

/**
 * Standard normal upper tail Q(z) = P(Z > z) = erfc(z / sqrt 2) / 2, computed directly (never as
 * 1 - cdf) with Cody's erfc; exp(-z^2/2) is split as in erfc so the
 * relative accuracy holds out to z = 37 and beyond, until the result underflows. NaN in, NaN out.
 * @example normalUpperTail(1.96) // ≈ 0.0249979
 */
export function normalUpperTail(z: number): number {
  const y = Math.abs(z) * Math.SQRT1_2;
  if (!(y > ERF_SMALL_LIMIT)) return 0.5 - 0.5 * erfSmall(z * Math.SQRT1_2); // also NaN
  const far = 0.5 * erfcScaledTail(y) * expNegSquare(Math.abs(z), 0.5);
  return z < 0 ? 1 - far : far;
}

/**
 * ln P(Z < z) for a standard normal, finite far below where P underflows: for z < -1 it is
 * ln(erfcx(-z / sqrt 2) / 2) - z^2 / 2 with erfcx the scaled erfc, otherwise log1p(-Q(z)).
 * -Infinity at -Infinity, 0 at +Infinity, NaN for NaN.
 * @example normalLogCdf(-40) // ≈ -804.608
 */
export function normalLogCdf(z: number): number {
  if (z < -1) {
    if (z === -Infinity) return -Infinity;
    return Math.log(0.5 * erfcScaledTail(-z * Math.SQRT1_2)) - 0.5 * z * z;
  }
  return Math.log1p(-normalUpperTail(z));
}

/**
 * Normal density exp(-(x - mean)^2 / (2 sd^2)) / (sd sqrt(2 pi)). sd = 0 is the degenerate
 * distribution (Infinity at the mean, 0 elsewhere). The caller checks sd >= 0; NaN in, NaN out.
 * @example normalDensity(1, 0, 1) // 0.24197072451914337
 */
export function normalDensity(x: number, mean: number, sd: number): number {
  if (sd === 0) return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : 0;
  const z = Math.abs((x - mean) / sd);
  return (INV_SQRT_2PI / sd) * expNegSquare(z, 0.5);
}

/**
 * ln of normalDensity: -(x - mean)^2 / (2 sd^2) - ln sd - ln sqrt(2 pi), finite where the density
 * underflows. sd = 0: Infinity at the mean, -Infinity elsewhere. NaN in, NaN out.
 * @example normalLogDensity(0, 0, 1) // -0.9189385332046727
 */
export function normalLogDensity(x: number, mean: number, sd: number): number {
  if (sd === 0) return x === mean ? Infinity : Number.isNaN(x - mean) ? Number.NaN : -Infinity;
  const z = (x - mean) / sd;
  return -0.5 * z * z - Math.log(sd) - LN_SQRT_2PI;
}
