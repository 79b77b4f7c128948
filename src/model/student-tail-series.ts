/**
 * The two-sided tail P(|T| > |t|) of Student's t with a whole number nu of degrees of freedom, by
 * the finite series of Abramowitz & Stegun 26.7.3 (odd nu) and 26.7.4 (even nu), with
 * theta = atan(|t| / sqrt(nu)):
 *   odd:  A = (2 / pi) (theta + sin(theta) [cos + 2/3 cos^3 + (2 4)/(3 5) cos^5 + ... to cos^(nu-2)])
 *   even: A = sin(theta) [1 + 1/2 cos^2 + (1 3)/(2 4) cos^4 + ... to cos^(nu-2)]
 * and the tail is 1 - A. About nu / 2 multiply-adds instead of an incomplete beta function: the
 * gate takes one tail per metric, so on many metrics this is most of the tail's cost.
 * 1 - A cancels when the tail is small, so the series answers only down to SERIES_TAIL_FLOOR
 * (where at most ~12 of 16 digits remain); below it, and for a fractional, huge or infinite
 * input, it returns undefined and the caller uses the incomplete beta (special/student-t.ts).
 *
 * @example seriesTwoSidedTail(2.228, 10) // ≈ 0.05 (standard t table, nu = 10)
 */
export function seriesTwoSidedTail(t: number, nu: number): number | undefined {
  if (!Number.isInteger(nu) || nu < 1 || nu > SERIES_MAX_NU || !Number.isFinite(t)) return undefined;
  const a = Math.abs(t);
  if (a === 0) return 1;
  const r = Math.sqrt(nu + a * a);
  const sin = a / r;
  const cos = Math.sqrt(nu) / r;
  const cos2 = cos * cos;
  let tail: number;
  if (nu % 2 === 0) {
    let term = 1;
    let sum = 1;
    for (let k = 1; k < nu / 2; k++) {
      term *= (cos2 * (2 * k - 1)) / (2 * k);
      sum += term;
    }
    tail = 1 - sin * sum;
  } else {
    let sum = 0;
    if (nu > 1) {
      let term = cos;
      sum = cos;
      for (let k = 1; k <= (nu - 3) / 2; k++) {
        term *= (cos2 * (2 * k)) / (2 * k + 1);
        sum += term;
      }
    }
    // 1 - (2/pi) theta = (2/pi) atan(sqrt(nu) / |t|): no cancellation in the arctangent part.
    tail = (2 / Math.PI) * (Math.atan(Math.sqrt(nu) / a) - sin * sum);
  }
  return tail >= SERIES_TAIL_FLOOR ? tail : undefined;
}

/** Below this tail the series hands over to the incomplete beta (cancellation in 1 - A). */
export const SERIES_TAIL_FLOOR = 1e-4;

/** Above this many degrees of freedom the series is long; the incomplete beta is cheaper. */
export const SERIES_MAX_NU = 400;
