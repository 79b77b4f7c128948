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
export const DOF_GRID: readonly number[] = [1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 15, 20, 30, 50, 100, Infinity];

/**
 * The Student-t tail of one side of some deviations, by maximum likelihood: the deviations on
 * that side (d > 0 after the caller has turned the side it wants to positive) are taken as draws
 * of a half-t |T| x scale, whose density is 2 f_nu(d / scale) / scale. For each nu of DOF_GRID the
 * scale is the likelihood's fixed point, found by the EM weights of Lange, Little & Taylor (1989,
 * "Robust statistical modeling using the t distribution", JASA 84): w = (nu + 1) / (nu + d^2 /
 * scale^2), scale^2 = mean(w d^2); the nu with the highest likelihood wins (ties: the heavier).
 * A half is fitted on its own because CI timings are skewed (slow runs, never fast ones), so a
 * symmetric fit would understate the slow side. Deviations of exactly 0 carry no side and are
 * left out. Undefined with fewer than 3 such deviations or none above 0. O(n x grid x 30).
 * @example halfTailShape(Array.from({ length: 400 }, (_, i) => ...gaussian draws)).nu // large
 */
export function halfTailShape(deviations: readonly number[]): TailShape | undefined {
  const d = deviations.filter((x) => x > 0 && Number.isFinite(x));
  const n = d.length;
  if (n < 3) return undefined;
  let squares = 0;
  for (const x of d) squares += x * x;
  if (!(squares > 0)) return undefined;
  let best: TailShape | undefined;
  let bestLik = -Infinity;
  for (const nu of DOF_GRID) {
    let s2 = squares / n;
    if (nu !== Infinity) {
      for (let it = 0; it < 30; it++) {
        let sum = 0;
        for (const x of d) sum += ((nu + 1) / (nu + (x * x) / s2)) * x * x;
        const next = sum / n;
        const done = Math.abs(next - s2) <= 1e-10 * s2;
        s2 = next;
        if (done) break;
      }
    }
    const scale = Math.sqrt(s2);
    let lik = 0;
    for (const x of d) lik += studentLogDensity(x / scale, nu);
    lik += n * (Math.LN2 - Math.log(scale));
    if (lik > bestLik + 1e-9) {
      bestLik = lik;
      best = { nu, scale, n };
    }
  }
  return best;
}
