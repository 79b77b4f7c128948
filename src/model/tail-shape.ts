import { studentLogDensity } from './tails.js';

/** A half Student-t: the shape of one side of a set of deviations from their centre. */
export interface TailShape {
  /** Degrees of freedom (Infinity: the Gaussian's tail). */
  nu: number;
  /** Scale of that side, in units of the standardised deviations given. */
  scale: number;
  /** How many deviations the fit saw. */
  n: number;
}

/** The degrees of freedom tried, heaviest first; the tails of 60 runs cannot tell finer steps apart. */
export const DOF_GRID: readonly number[] = [1, 1.5, 2, 3, 4, 6, 10, 15, 30, 100, Infinity];

/** ln f_nu(0) of each nu of DOF_GRID: the likelihood's constant, asked for on every profile. */
const LOG_DENSITY_AT_0: readonly number[] = DOF_GRID.map((nu) => studentLogDensity(0, nu));

/**
 * The root u = ln scale^2 of the t likelihood's scale equation mean((nu + 1) d^2 / (nu e^u + d^2)) = 1
 * (the fixed point of the EM weights below), by Newton's method on u: the left side falls
 * monotonically in u, so from a nearby start a few steps reach 1e-9. With w = d^2 / (nu e^u + d^2)
 * the slope of each term is -(nu + 1) w (1 - w): one division per deviation.
 */
function scaleEquationRoot(squares: Float64Array, nu: number, start: number): number {
  let u = start;
  for (let it = 0; it < 40; it++) {
    const e = nu * Math.exp(u);
    let h = 0;
    let slope = 0;
    for (let i = 0; i < squares.length; i++) {
      const w = squares[i]! / (e + squares[i]!);
      h += w;
      slope -= w * (1 - w);
    }
    h = ((nu + 1) * h) / squares.length - 1;
    slope = ((nu + 1) * slope) / squares.length;
    const step = Math.max(-2, Math.min(2, -h / slope));
    u += step;
    if (Math.abs(step) < 1e-9) break;
  }
  return u;
}

/**
 * The Student-t tail of one side of some deviations, by maximum likelihood: the deviations on
 * that side (d > 0 after the caller has turned the side it wants to positive) are taken as draws
 * of a half-t |T| x scale, whose density is 2 f_nu(d / scale) / scale. For each nu of DOF_GRID the
 * scale is the likelihood's stationary point, the fixed point of the EM weights of Lange, Little &
 * Taylor (1989, "Robust statistical modeling using the t distribution", JASA 84),
 * w = (nu + 1) / (nu + d^2 / scale^2), scale^2 = mean(w d^2), solved by Newton's method
 * (scaleEquationRoot) rather than by iterating the weights, which crawl for heavy tails; the nu
 * with the highest likelihood wins (ties: the heavier).
 * A half is fitted on its own because CI timings are skewed (slow runs, never fast ones), so a
 * symmetric fit would understate the slow side. Deviations of exactly 0 carry no side and are
 * left out. Undefined with fewer than 3 such deviations or none above 0. O(n x grid x EM steps).
 * @example halfTailShape(Array.from({ length: 400 }, (_, i) => ...gaussian draws)).nu // large
 */
export function halfTailShape(deviations: ArrayLike<number>): TailShape | undefined {
  const profile = halfTailProfile(deviations);
  if (profile === undefined) return undefined;
  return bestOf(profile, () => 0);
}

/** One point of a half-t profile: a nu of DOF_GRID, its maximum-likelihood scale and log-likelihood. */
export interface TailFit {
  nu: number;
  scale: number;
  logLik: number;
  n: number;
}

/** The fit of the grid point k with the highest log-likelihood plus `prior(k)` (ties: the heavier). */
export function bestOf(profile: readonly TailFit[], prior: (k: number) => number): TailShape {
  let best = profile[0]!;
  let bestScore = -Infinity;
  profile.forEach((f, k) => {
    const score = f.logLik + prior(k);
    if (score > bestScore + 1e-9) {
      bestScore = score;
      best = f;
    }
  });
  return { nu: best.nu, scale: best.scale, n: best.n };
}

/**
 * The half-t tail of one metric's deviations, partially pooled with its class's (the metrics of
 * one noise shape): nu is the point of DOF_GRID maximising the metric's own profile log-likelihood
 * plus `weight` x (n / n_class) x the class's, so the class's evidence counts as `weight` times
 * the metric's own number of deviations (a power prior: Ibrahim & Chen 2000, "Power prior
 * distributions for regression models", Statistical Science 15); the scale is the class's at that
 * nu (the deviations are already in units of each metric's moderated sd, so a scale of the
 * metric's own would undo the moderation). A metric with a slow mode of its own (a parser that
 * sometimes runs 50% slower) gets its heavy tail, and the others are no longer made Cauchy-like by
 * it; 60 runs alone never decide. Undefined when the metric's side cannot be fitted.
 * @example pooledTailShape(ownSide, halfTailProfile(classSide), 3)?.nu // 4
 */
export function pooledTailShape(
  own: ArrayLike<number>,
  pooled: readonly TailFit[] | undefined,
  weight: number,
): TailShape | undefined {
  const profile = halfTailProfile(own);
  if (profile === undefined) return undefined;
  if (pooled === undefined) return bestOf(profile, () => 0);
  const share = (weight * profile[0]!.n) / pooled[0]!.n;
  const chosen = bestOf(profile, (k) => share * pooled[k]!.logLik);
  const k = DOF_GRID.indexOf(chosen.nu);
  return { ...chosen, scale: pooled[k]!.scale };
}

/** The profile of halfTailShape: every nu of DOF_GRID with its scale and log-likelihood. */
export function halfTailProfile(deviations: ArrayLike<number>): TailFit[] | undefined {
  let n = 0;
  for (let i = 0; i < deviations.length; i++) if (deviations[i]! > 0 && Number.isFinite(deviations[i]!)) n++;
  if (n < 3) return undefined;
  const squares = new Float64Array(n);
  let sum = 0;
  for (let i = 0, k = 0; i < deviations.length; i++) {
    const x = deviations[i]!;
    if (x > 0 && Number.isFinite(x)) sum += squares[k++] = x * x;
  }
  if (!(sum > 0)) return undefined;
  const out: TailFit[] = [];
  // Each nu's scale starts from the one before it (a heavier nu), which is close.
  let start = Math.log(sum / n);
  DOF_GRID.forEach((nu, k) => {
    const s2 = nu === Infinity ? sum / n : Math.exp((start = scaleEquationRoot(squares, nu, start)));
    // ln f(x) = ln f(0) + ln of the relative density; the constant once, the rest per deviation.
    let lik = n * (LOG_DENSITY_AT_0[k]! + Math.LN2 - 0.5 * Math.log(s2));
    if (nu === Infinity) lik -= (0.5 * sum) / s2;
    else {
      let logs = 0;
      for (let i = 0; i < n; i++) logs += Math.log1p(squares[i]! / (nu * s2));
      lik -= ((nu + 1) / 2) * logs;
    }
    out.push({ nu, scale: Math.sqrt(s2), logLik: lik, n });
  });
  return out;
}
