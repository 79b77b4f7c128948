import { median } from 'simple-statistics';
import { moderatedVariance, variancePrior } from '../model/moderated-variance.js';
import { bestOf, halfTailProfile, pooledTailShape, type TailFit, type TailShape } from '../model/tail-shape.js';
import type { MemberMoves } from './moves.js';

/** A member's noise: the spread of its own moves and the shape of each side of them. */
export interface MemberNoise {
  /** Moderated sd of the own moves (deviation units), never below the resolution; 0 for a constant metric. */
  sd: number;
  /** Degrees of freedom behind sd (Smyth's d0 + d; Infinity when the prior alone decides). */
  dof: number;
  /** Half-t shapes of the worse and better sides, pooled over the member's noise class, in units of sd. */
  worse: TailShape;
  better: TailShape;
  /** Median own move of the current level: the centre this run's own move is measured from. */
  centre: number;
  /** Baseline runs of the current level, and of every level. */
  levelRuns: number;
  n: number;
}

/**
 * How many times its own deviations the class's tail evidence counts for a metric's tail shape
 * (pooledTailShape). Measured: 1 let a few metrics' chance light tails raise the simulated
 * project's false alarms to 1.7 per 100; 3 keeps 0.6 and, on the recorded corpus, at most 2.
 */
export const TAIL_PRIOR_WEIGHT = 3;

/** A side with too few deviations to fit is taken as the Gaussian's. */
const GAUSSIAN_SIDE: TailShape = { nu: Infinity, scale: 1, n: 0 };

/**
 * The noise model of every member (issue 13 item 1), borrowing strength across the metrics that
 * share a noise shape: the members of one move group (the timings, a configured group), and the
 * remaining timings or other metrics among themselves.
 * - Residuals: each own move minus the median own move of its level, so a level change does not
 *   count as spread and a short new level gets the spread of the whole window. A calm run takes
 *   the residuals of the calm baseline runs only (moves.ts runStates), when there are min-runs of
 *   them; a slow episode those of every run.
 * - Spread: the sample variance of the residuals on n - levels degrees of freedom, moderated by
 *   Smyth's empirical-Bayes prior over the class (variancePrior, moderatedVariance; Smyth 2004),
 *   so 60 runs need not pin each metric's spread alone (their sd is good to about +-9%).
 * - Tails: the class's residuals in units of each member's moderated sd, each side fitted with its
 *   own half Student-t (halfTailShape), so heavy and skewed "slow process" tails are measured, not
 *   assumed away; each member's degrees of freedom partially pooled with the class's
 *   (pooledTailShape), because 60 runs cannot pin one metric's tail alone but one bimodal metric
 *   must not give every other one its Cauchy-like tail.
 * The sample variance rather than a robust scale: the MAD measures only the fast floor of a
 * bimodal metric (issue 13: `fit: robust` raised false alarms); the t's scale carries the shape.
 * No rank (conformal) check: with a window of 60 runs the smallest rank p-value is 1/61 = 0.016,
 * above every level the run's budget gives a metric (0.01 / m at the worst), so it could never flag
 * anything; it would need thousands of runs per metric.
 */
export function noiseModel(members: readonly MemberMoves[]): Map<MemberMoves, MemberNoise> {
  const classes = new Map<string, MemberMoves[]>();
  for (const m of members) {
    const key = m.group.kind === 'alone' ? `alone ${m.candidate.timing ? 'time' : 'other'}` : m.group.name;
    const list = classes.get(key);
    if (list === undefined) classes.set(key, [m]);
    else list.push(m);
  }
  const out = new Map<MemberMoves, MemberNoise>();
  for (const list of classes.values()) {
    const parts = list.map(residuals);
    const prior = variancePrior(
      parts.map((p) => p.variance),
      parts.map((p) => p.dof),
    );
    const sds = list.map((m, j) => {
      const p = parts[j]!;
      const floor = resolutionFloor(m);
      if (!(p.variance > 0)) return { sd: floor, dof: p.dof };
      const moderated = moderatedVariance(p.variance, p.dof, prior);
      return { sd: Math.max(Math.sqrt(moderated.variance), floor), dof: moderated.dof };
    });
    const upper: number[] = [];
    const lower: number[] = [];
    parts.forEach((p, j) => {
      const sd = sds[j]!.sd;
      if (!(sd > 0)) return;
      for (const e of p.residuals) {
        if (e > 0) upper.push(e / sd);
        else if (e < 0) lower.push(-e / sd);
      }
    });
    const upperProfile = halfTailProfile(upper);
    const lowerProfile = halfTailProfile(lower);
    const worse = upperProfile === undefined ? GAUSSIAN_SIDE : bestOf(upperProfile, () => 0);
    const better = lowerProfile === undefined ? GAUSSIAN_SIDE : bestOf(lowerProfile, () => 0);
    list.forEach((m, j) => {
      const p = parts[j]!;
      const sd = sds[j]!.sd;
      // pooledTailShape keeps the positive deviations only: the side's, once the sign turns it positive.
      const side = (sign: 1 | -1, profile: TailFit[] | undefined, whole: TailShape): TailShape =>
        sd > 0
          ? (pooledTailShape(
              p.residuals.map((e) => (sign * e) / sd),
              profile,
              TAIL_PRIOR_WEIGHT,
            ) ?? whole)
          : whole;
      const w = side(1, upperProfile, worse);
      const b = side(-1, lowerProfile, better);
      out.set(m, { ...sds[j]!, worse: w, better: b, centre: p.centre, levelRuns: p.levelRuns, n: p.n });
    });
  }
  return out;
}

/** A member's residuals around its levels' median own moves, their variance and its degrees of freedom. */
function residuals(m: MemberMoves): {
  residuals: number[];
  variance: number;
  dof: number;
  centre: number;
  levelRuns: number;
  n: number;
} {
  // A calm run is judged against the calm runs when there are min-runs of them; an episode against all.
  const calmRuns = m.calm.filter((c, r) => c && Number.isFinite(m.own[r]!)).length;
  const useCalm = m.calmNow && calmRuns >= m.candidate.settings.minRuns;
  const byLevel = m.levels.map((start, k) => {
    const end = m.levels[k + 1] ?? Infinity;
    return m.own.filter(
      (o, r) => Number.isFinite(o) && m.rows[r]! >= start && m.rows[r]! < end && (!useCalm || m.calm[r]!),
    );
  });
  const out: number[] = [];
  let levels = 0;
  for (const moves of byLevel) {
    if (moves.length === 0) continue;
    levels++;
    const c = median(moves);
    for (const o of moves) out.push(o - c);
  }
  const current = byLevel.at(-1)!;
  const dof = out.length - levels;
  const variance = dof >= 1 ? out.reduce((s, e) => s + e * e, 0) / dof : Number.NaN;
  return {
    residuals: out,
    variance,
    dof,
    centre: current.length > 0 ? median(current) : Number.NaN,
    levelRuns: current.length,
    n: out.length,
  };
}

/** The metric's `resolution` in its deviation units around the current centre. */
function resolutionFloor(m: MemberMoves): number {
  const { resolution } = m.candidate.settings;
  if (resolution === 0) return 0;
  const c = m.candidate.log ? Math.exp(m.centre) : m.centre;
  return c === 0 ? resolution : resolution / Math.abs(c);
}
