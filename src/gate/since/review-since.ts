import type { Worse } from '../../config/types.js';
import { compileGlobs } from '../../config/glob-matcher.js';
import { InputError } from '../../errors/input-error.js';
import { adjustTails } from '../../model/family.js';
import { median } from '../../model/median.js';
import { rankSumTest } from '../../model/rank-sum.js';
import { shiftEstimate } from '../../model/shift-estimate.js';
import { directionOf } from '../sides.js';
import { resolveReference, runRef, type SinceReference } from './reference.js';
import type { History, RunInfo } from '../../history/history.js';
import {
  SINCE_SCHEMA,
  type LevelWindow,
  type SinceCreep,
  type SinceMark,
  type SinceMetric,
  type SinceReport,
  type SinceSettings,
  type SinceStep,
} from './since-report.js';
import { stepsAndCreep, type Series, type StepsAndCreep } from './steps-and-creep.js';

/** Options of reviewSince; every one has a default. */
export interface SinceOptions {
  /** Runs each level is fitted on: the newest up to the reference, and the newest of all. Default 10. */
  window?: number;
  /** Fewest runs on each side of a step. Default 5. */
  minSegment?: number;
  /** Level of a step's split and hold tests (per metric). Default 0.001. */
  stepLevel?: number;
  /** Family level (Holm across metrics) at which creep is reported. Default 0.01. */
  creepLevel?: number;
  /** Family level (Holm across metrics) of the then-against-now test. Default 0.05. */
  level?: number;
  /** Confidence of the intervals. Default 0.95. */
  confidence?: number;
  /** The worse side of a metric (from the config). Default: higher is worse. */
  worse?: (name: string) => Worse;
}

/** Runs after the reference a review takes at most (the creep's pairwise slopes grow as n^2). */
export const MAX_RANGE = 5000;
/** A mark this close to a step (in runs) is taken as the change the step shows. */
const MARK_NEAR = 2;

/**
 * The release review: per metric, the level at the reference and now (medians of `window` runs)
 * with the ratio now / then (Hodges-Lehmann shift on the log scale for positive metrics, with its
 * distribution-free interval) and a rank-sum test, Holm-adjusted across metrics; the steps in
 * between (sustained level changes; see stepsAndCreep and levelSteps); the creep within the
 * segments between steps (Theil-Sen slope, Mann-Kendall test, Holm-adjusted across metrics); and
 * the level marks (accepted pull requests, manual marks) on runs after the reference.
 * Pure: the history and the reference are data; nothing is read or written.
 * Throws InputError for a reference the history cannot resolve, bad options, or a range over
 * MAX_RANGE runs.
 * @example reviewSince(history, { sha: '4f1c2ab' }).metrics[0].ratio // 1.083
 */
export function reviewSince(history: History, reference: SinceReference, options: SinceOptions = {}): SinceReport {
  const settings = checkSettings(options);
  const runs = history.runs;
  if (runs.length === 0) throw new InputError('the history has no runs to review', { where: 'REF' });
  const resolved = resolveReference(runs, reference);
  const range = runs.length - 1 - resolved.index;
  if (range > MAX_RANGE) {
    throw new InputError(`${range} runs were recorded since the reference; a review takes at most ${MAX_RANGE}`, {
      where: 'REF',
      fix: 'give a later reference',
    });
  }
  const worse = options.worse ?? (() => 'higher' as const);
  const metrics = [...history.columns].map(([name, column]) =>
    reviewMetric(name, column.unit, column.values, runs, resolved.index, worse(name), settings),
  );
  familyControl(metrics, settings);
  return {
    schema: SINCE_SCHEMA,
    series: history.series,
    reference: resolved,
    latest: runRef(runs[runs.length - 1]!),
    runs: range,
    settings,
    metrics,
  };
}

function checkSettings(options: SinceOptions): SinceSettings {
  const settings: SinceSettings = {
    window: options.window ?? 10,
    minSegment: options.minSegment ?? 5,
    stepLevel: options.stepLevel ?? 0.001,
    creepLevel: options.creepLevel ?? 0.01,
    level: options.level ?? 0.05,
    confidence: options.confidence ?? 0.95,
    family: 'holm',
  };
  for (const key of ['window', 'minSegment'] as const) {
    if (!Number.isInteger(settings[key]) || settings[key] < 2) {
      throw new InputError(`${key} must be a whole number, 2 or more, got ${settings[key]}`);
    }
  }
  for (const key of ['stepLevel', 'creepLevel', 'level', 'confidence'] as const) {
    if (!(settings[key] > 0 && settings[key] < 1)) {
      throw new InputError(`${key} must be between 0 and 1, got ${settings[key]}`);
    }
  }
  return settings;
}

/** Log for a metric whose every value in the range is positive (times, sizes, rates); raw otherwise. */
function reviewMetric(
  name: string,
  unit: string | undefined,
  column: readonly number[],
  runs: readonly RunInfo[],
  reference: number,
  worse: Worse,
  settings: SinceSettings,
): SinceMetric {
  // The window up to the reference and everything after it: the runs the review looks at.
  const before: number[] = [];
  for (let i = reference; i >= 0 && before.length < settings.window; i--) {
    if (Number.isFinite(column[i])) before.unshift(i);
  }
  const after: number[] = [];
  for (let i = reference + 1; i < runs.length; i++) if (Number.isFinite(column[i])) after.push(i);
  const positions = [...before, ...after];
  const raw = positions.map((i) => column[i]!);
  const scale = raw.length > 0 && raw.every((x) => x > 0) ? 'log' : 'raw';
  const toScale = scale === 'log' ? Math.log : (x: number) => x;
  const fromScale = scale === 'log' ? Math.exp : (x: number) => x;
  const values = raw.map(toScale);
  const accepted = marksInRange(name, runs, reference);
  const base: SinceMetric = {
    name,
    ...(unit === undefined ? {} : { unit }),
    status: 'unchanged',
    worse,
    scale,
    ratio: null,
    lower: null,
    upper: null,
    p: null,
    adjusted: null,
    steps: [],
    creep: null,
    accepted,
  };
  const thenValues = values.slice(0, before.length);
  const nowStart = Math.max(before.length, values.length - settings.window);
  const nowValues = values.slice(nowStart);
  if (before.length > 0) base.then = levelWindow(thenValues, positions.slice(0, before.length), runs, fromScale);
  if (after.length > 0) base.now = levelWindow(nowValues, positions.slice(nowStart), runs, fromScale);
  if (before.length === 0) base.status = 'new';
  else if (after.length === 0) base.status = 'gone';
  if (before.length > 0 && after.length > 0) {
    const shift = shiftEstimate(thenValues, nowValues, settings.confidence);
    const ratio = toRatio(scale, base.then!.level);
    base.ratio = ratio(shift.shift);
    base.lower = finiteOrNull(ratio(shift.lower));
    base.upper = finiteOrNull(ratio(shift.upper));
    base.p = rankSumTest(thenValues, nowValues).p;
  }
  if (after.length >= 2) {
    const series: Series = { at: positions, values };
    const found = stepsAndCreep(series, reference, settings);
    const level = base.then?.level ?? median(raw.slice(before.length));
    base.steps = found.steps.map((s, k) =>
      stepOf(s, k, found, positions, runs, reference, toRatio(scale, level), accepted),
    );
    if (found.slope && found.trend) base.creep = creepOf(found, scale, level);
  }
  return base;
}

/** The ratio a shift on the review's scale stands for: exp on log; 1 + shift / level on raw. */
function toRatio(scale: 'log' | 'raw', level: number): (shift: number) => number {
  if (scale === 'log') return Math.exp;
  return (shift) => (level > 0 ? 1 + shift / level : Number.NaN);
}

function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function levelWindow(
  values: readonly number[],
  positions: readonly number[],
  runs: readonly RunInfo[],
  fromScale: (x: number) => number,
): LevelWindow {
  return {
    n: values.length,
    level: fromScale(median(values)),
    from: runs[positions[0]!]!.id,
    to: runs[positions[positions.length - 1]!]!.id,
  };
}

function stepOf(
  step: { index: number; p: number },
  k: number,
  found: StepsAndCreep,
  positions: readonly number[],
  runs: readonly RunInfo[],
  reference: number,
  ratio: (shift: number) => number,
  marks: readonly SinceMark[],
): SinceStep {
  const { steps, detrended, kept } = found;
  const from = k === 0 ? 0 : steps[k - 1]!.index;
  const to = k + 1 < steps.length ? steps[k + 1]!.index : detrended.length;
  const part = (a: number, b: number): number[] => detrended.slice(a, b).filter((_, i) => kept[a + i]);
  const shift = shiftEstimate(part(from, step.index), part(step.index, to)).shift;
  const position = positions[step.index]!;
  const offset = position - reference;
  const mark = marks
    .filter((m) => Math.abs(m.offset - offset) <= MARK_NEAR)
    .sort((a, b) => Math.abs(a.offset - offset) - Math.abs(b.offset - offset))[0];
  return {
    ...runRef(runs[position]!),
    offset,
    ratio: ratio(shift),
    p: step.p,
    ...(mark === undefined ? {} : { mark }),
  };
}

function creepOf(found: StepsAndCreep, scale: 'log' | 'raw', level: number): SinceCreep {
  const slope = found.slope!;
  const trend = found.trend!;
  // Per run, relative: exp(b) - 1 on the log scale; b over the level then on the raw scale.
  const relative = (b: number): number | null =>
    !Number.isFinite(b) ? null : scale === 'log' ? Math.expm1(b) : level > 0 ? b / level : null;
  return {
    slope: relative(slope.slope) ?? Number.NaN,
    lower: relative(slope.lower),
    upper: relative(slope.upper),
    p: trend.p,
    adjusted: trend.p,
    s: trend.s,
    tau: trend.tau,
    runs: trend.n,
    segments: found.segments,
    reported: false,
  };
}

/** Level marks on runs after the reference that match the metric, oldest first. */
function marksInRange(name: string, runs: readonly RunInfo[], reference: number): SinceMark[] {
  const marks: SinceMark[] = [];
  for (let i = reference + 1; i < runs.length; i++) {
    for (const mark of runs[i]!.marks ?? []) {
      if (mark.metrics !== undefined && !compileGlobs(mark.metrics)(name)) continue;
      const pr = mark.pr ?? runs[i]!.pr;
      marks.push({
        ...runRef(runs[i]!),
        ...(pr === undefined ? {} : { pr }),
        offset: i - reference,
        reason: mark.reason,
        ...(mark.note === undefined ? {} : { note: mark.note }),
      });
    }
  }
  return marks;
}

/** Holm across metrics for the level test and for the creep; then each metric's status. */
function familyControl(metrics: SinceMetric[], settings: SinceSettings): void {
  const tested = metrics.filter((m) => m.p !== null);
  adjustTails(
    tested.map((m) => m.p!),
    'holm',
  ).forEach((q, i) => {
    const m = tested[i]!;
    m.adjusted = q;
    if (q < settings.level && m.ratio !== null) {
      const direction = directionOf(m.ratio - 1, m.worse);
      m.status = direction === 'none' ? 'unchanged' : direction;
    }
  });
  const creeping = metrics.filter((m) => m.creep !== null);
  adjustTails(
    creeping.map((m) => m.creep!.p),
    'holm',
  ).forEach((q, i) => {
    const creep = creeping[i]!.creep!;
    creep.adjusted = q;
    creep.reported = q < settings.creepLevel;
  });
}
