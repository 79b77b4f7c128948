import { detectableShift } from '../model/detectable.js';
import { cutoffT, studentLogDensity, studentRelativeDensity, studentTail, type UpperQuantile } from '../model/tails.js';
import type { TailShape } from '../model/tail-shape.js';
import type { MemberMoves } from './moves.js';
import type { MemberNoise } from './noise.js';
import type { BaselineSummary, MetricResult } from './report.js';
import { toleranceShare } from './tolerance.js';

/** Newest baseline values kept in a result for sparklines. */
export const RECENT_VALUES = 30;

/** A new level is judged once it has this many runs (its spread comes from every level). */
export const LEVEL_MIN_RUNS = 3;

/** The power `detectable` is defined at. */
export const DETECT_POWER = 0.8;

/** A side's predictive: Student-t with nu degrees of freedom and this scale (deviation units). */
export interface Side {
  nu: number;
  scale: number;
}

/** A judged member before family control: its result and what the decision needs. */
export interface Scored {
  result: MetricResult;
  /** Tail on the worse side (two-sided for worse: both), and on the better side. */
  worseTail: number;
  betterTail: number;
  /** This run's own move from its centre, worse side positive (deviation units). */
  move: number;
  worse: Side;
  better: Side;
  beyondTolerance: boolean;
  both: boolean;
}

/**
 * Degrees of freedom of the predictive: the tail's own (fitted) and the spread's estimation
 * (Smyth's d0 + d) both thicken the tails; the reciprocals add (a rule of thumb: the excess
 * kurtosis 6 / (nu - 4) of independent sources adds), so Gaussian noise gives the moderated t's
 * d0 + d and a heavy tail of 60 runs keeps nearly its fitted nu.
 */
export function combinedDof(tail: number, estimation: number): number {
  if (tail === Infinity) return estimation;
  if (estimation === Infinity) return tail;
  return 1 / (1 / tail + 1 / estimation);
}

/**
 * Scores one member (issue 13 items 1 and 6): its own move beside the shared move, against the
 * predictive distribution of a new run's own move — on each side a Student-t whose degrees of
 * freedom combine the class's fitted tail and the spread's estimation, with scale
 * (side scale) x (moderated sd) x sqrt(1 + 1/m), m the runs of the current level (the centre's
 * uncertainty). Sets z, density, relative density (on the side the move lies), the tails, the
 * shared and own moves and `detectable`; the status waits for family control (see decide).
 * Returns a learning result below min-runs (or fewer than LEVEL_MIN_RUNS runs since a level
 * start). `level` is the tail level the detectable is computed at (the Bonferroni share of the
 * budget under family control), or undefined to use the cutoff.
 */
export function scoreMember(
  m: MemberMoves,
  noise: MemberNoise,
  level: number | undefined,
  quantile: UpperQuantile,
): Scored | MetricResult {
  const c = m.candidate;
  const { settings } = c;
  const centreRaw = c.log ? Math.exp(m.centre) : m.centre;
  const unitOfSd = c.log || centreRaw === 0 ? 1 : Math.abs(centreRaw);
  const baseline: BaselineSummary = { n: noise.n, mean: m.centre, sd: noise.sd * unitOfSd };
  if (c.log) baseline.scale = 'log';
  if (m.since !== undefined && noise.levelRuns > 0) {
    baseline.since = m.since.run;
    baseline.sinceReason = m.since.reason;
    if (m.since.pr !== undefined) baseline.sincePr = m.since.pr;
    baseline.levelRuns = noise.levelRuns;
  }
  if (m.group.kind === 'reference') baseline.relativeTo = m.group.reference!.name;
  if (m.runner !== undefined) baseline.runner = m.runner;
  const result: MetricResult = {
    name: c.name,
    status: 'ok',
    value: c.measurement.value,
    cutoff: settings.cutoff,
    worse: settings.worse,
  };
  const unit = c.measurement.unit;
  if (unit !== undefined) result.unit = unit;
  result.count = c.measurement.count;
  result.baseline = baseline;
  result.recent = m.rows.slice(-RECENT_VALUES).map((i) => (c.log ? Math.exp(c.values[i]!) : c.values[i]!));
  if (m.group.kind !== 'alone') result.group = m.group.name;
  if (isLearning(m, noise)) {
    const note: MetricResult['note'] = { kind: 'learning', runs: noise.n, minRuns: settings.minRuns };
    if (m.since !== undefined) note.levelRuns = noise.levelRuns;
    return { ...result, status: 'learning', note };
  }
  if (centreRaw !== 0) result.change = (c.measurement.value - centreRaw) / centreRaw;
  const move = m.ownNow - noise.centre;
  const toRelative = (d: number): number => (c.log ? Math.expm1(c.sign * d) : c.sign * d);
  if (m.group.kind !== 'alone') result.shared = toRelative(m.sharedNow);
  result.own = toRelative(move);
  const tolerance = toleranceShare(settings.tolerance, centreRaw);
  const beyond = Math.abs(result.own) > tolerance;
  const both = settings.worse === 'both';
  const centreFactor = Math.sqrt(1 + 1 / noise.levelRuns);
  const worse = side(noise.worse, noise, centreFactor);
  const better = side(noise.better, noise, centreFactor);
  if (Number.isFinite(worse.nu)) baseline.dof = worse.nu;
  if (!(noise.sd > 0)) {
    // A constant history: any move is infinitely unlikely, and the tolerance decides.
    result.relativeDensity = move === 0 ? 1 : 0;
    result.tail = move > 0 ? 0 : 1;
    result.note = { kind: 'constant' };
    result.detectable = tolerance;
    return {
      result,
      worseTail: move > 0 || (both && move !== 0) ? 0 : 1,
      betterTail: move < 0 && !both ? 0 : 1,
      move,
      worse,
      better,
      beyondTolerance: beyond,
      both,
    };
  }
  result.z = (c.sign * move) / noise.sd;
  const onSide = move >= 0 ? worse : better;
  const t = Math.abs(move) / onSide.scale;
  result.relativeDensity = studentRelativeDensity(t, onSide.nu);
  result.density = Math.exp(studentLogDensity(t, onSide.nu)) / (onSide.scale * (c.log ? 1 : unitOfSd));
  const upper = move >= 0 ? studentTail(t, worse.nu, 'upper') : 1 - studentTail(t, better.nu, 'upper');
  const lower = move <= 0 ? studentTail(t, better.nu, 'upper') : 1 - studentTail(t, worse.nu, 'upper');
  const worseTail = both ? Math.min(1, 2 * Math.min(upper, lower)) : upper;
  result.tail = worseTail;
  if (!beyond && Math.abs(move) > 0) result.note = { kind: 'within-tolerance', tolerance: settings.tolerance };
  const threshold =
    level === undefined
      ? cutoffT(settings.cutoff, worse.nu)
      : quantile(Math.min(0.5, both ? level / 2 : level), worse.nu);
  const shift = detectableShift(threshold * worse.scale, better, DETECT_POWER, quantile);
  result.detectable = Math.max(relativeShift(shift, c.log), tolerance);
  const limit = limitShift(noise, level, settings.cutoff, both, quantile);
  if (shift > 1.1 * limit) {
    const runs = runsToReach(noise, level, settings.cutoff, both, 1.1 * limit, quantile);
    result.noise = {
      betweenRuns: noise.sd,
      moreRuns: { runs, detectable: Math.max(relativeShift(limit, c.log), tolerance) },
    };
  } else {
    result.noise = { betweenRuns: noise.sd };
  }
  const spread = c.measurement.spread;
  if (spread !== undefined && c.measurement.count > 1) result.noise.insideRun = spread;
  return {
    result,
    worseTail,
    betterTail: both ? worseTail : lower,
    move,
    worse,
    better,
    beyondTolerance: beyond,
    both,
  };
}

/** Too few baseline runs to judge: below min-runs, or fewer than LEVEL_MIN_RUNS since a level start. */
export function isLearning(m: MemberMoves, noise: MemberNoise): boolean {
  return noise.n < m.candidate.settings.minRuns || noise.levelRuns < LEVEL_MIN_RUNS;
}

function side(shape: TailShape, noise: MemberNoise, centreFactor: number): Side {
  return { nu: combinedDof(shape.nu, noise.dof), scale: shape.scale * noise.sd * centreFactor };
}

/** A worse-side shift in deviation units as a relative change of the metric (log: a factor). */
function relativeShift(shift: number, log: boolean): number {
  return log ? Math.expm1(shift) : shift;
}

/** The detectable shift with unlimited runs: no centre or spread uncertainty left. */
function limitShift(
  noise: MemberNoise,
  level: number | undefined,
  cutoff: number,
  both: boolean,
  quantile: UpperQuantile,
): number {
  return shiftFor({ ...noise, dof: Infinity }, 1, level, cutoff, both, quantile);
}

function shiftFor(
  noise: MemberNoise,
  centreFactor: number,
  level: number | undefined,
  cutoff: number,
  both: boolean,
  quantile: UpperQuantile,
): number {
  const worse = side(noise.worse, noise, centreFactor);
  const better = side(noise.better, noise, centreFactor);
  const threshold =
    level === undefined ? cutoffT(cutoff, worse.nu) : quantile(Math.min(0.5, both ? level / 2 : level), worse.nu);
  return detectableShift(threshold * worse.scale, better, DETECT_POWER, quantile);
}

/**
 * How many more baseline runs bring the detectable shift to `goal`: the level's runs and the
 * spread's degrees of freedom grow with them (doubling, then halving back; at most 10,000).
 */
function runsToReach(
  noise: MemberNoise,
  level: number | undefined,
  cutoff: number,
  both: boolean,
  goal: number,
  quantile: UpperQuantile,
): number {
  const at = (extra: number): number =>
    shiftFor(
      { ...noise, dof: noise.dof + extra, levelRuns: noise.levelRuns + extra },
      Math.sqrt(1 + 1 / (noise.levelRuns + extra)),
      level,
      cutoff,
      both,
      quantile,
    );
  let hi = 1;
  while (at(hi) > goal && hi < 10_000) hi *= 2;
  let lo = hi / 2;
  while (hi - lo > 1 && hi > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (at(mid) > goal) lo = mid;
    else hi = mid;
  }
  return hi;
}
