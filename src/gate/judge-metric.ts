import type { MetricSettings } from '../config/types.js';
import {
  gaussianDensity,
  plugInRelativeDensity,
  predictiveRelativeDensity,
  predictiveScale,
} from '../model/density.js';
import { fitGaussian, type GaussianFit } from '../model/fit.js';
import { InputError } from '../errors/input-error.js';
import { normalTail, studentTail } from '../model/tails.js';
import { fromFitScale, toFitScale } from '../model/transform.js';
import type { BaselineSummary, MetricResult } from './report.js';
import { fitScaleFloor } from './resolution-floor.js';
import { directionOf, type Direction } from './sides.js';
import { beyondTolerance } from './tolerance.js';
import { decision, plainTest } from './decide-metric.js';

/** Newest baseline values kept in a result for sparklines. */
export const RECENT_VALUES = 30;

/** What a run's value and its baseline's origin add to a result. */
export interface JudgeExtras {
  unit?: string;
  count?: number;
  /** First run of a baseline shortened by change-point detection. */
  since?: string;
  relativeTo?: string;
}

/** A scored metric: its result plus what a later decision (family control, groups) needs. */
export interface MetricScore {
  result: MetricResult;
  settings: MetricSettings;
  /** False for new and learning results, which no later decision changes. */
  scored: boolean;
  direction: Direction;
  beyondTolerance: boolean;
  /** This run's value on the fit scale, and the fit (only when scored). */
  current?: number;
  fit?: GaussianFit;
}

/**
 * Judges one metric alone (DESIGN.md "Statistics"). Pure, so the cutoff-tuning replay reuses it.
 * - fit the baseline (fit scale) by `fit`, sigma floored at `resolution` (see fitScaleFloor);
 * - z = (x - mean) / sd; density = Gaussian p(x); relative density r = p(x) / p(mode):
 *   predictive Student-t with n - 1 dof and scale s sqrt(1 + 1/n), or plug-in exp(-z^2 / 2)
 *   (plug-in also when n < 2, where the t has no degrees of freedom);
 * - tail = two-sided tail probability of the deviation under that same distribution;
 * - regressed when r < cutoff on the worse side beyond the tolerance; improved likewise on the
 *   better side; learning below `min-runs`; new with no baseline.
 * A zero spread (constant history, resolution 0) is decided by the tolerance alone, with r = 0
 * for any move and no z. Throws InputError for a value that cannot take the transform.
 * @example judgeMetric('t', settings, [9, 10, 11, 10, 10, 9, 11, 10], 14).status // 'regressed'
 */
export function judgeMetric(
  name: string,
  settings: MetricSettings,
  baseline: readonly number[],
  value: number,
  extras: JudgeExtras = {},
): MetricResult {
  return scoreMetric(name, settings, baseline, value, extras).result;
}

/** judgeMetric, keeping the pieces that family control and groups decide on. */
export function scoreMetric(
  name: string,
  settings: MetricSettings,
  baseline: readonly number[],
  value: number,
  extras: JudgeExtras = {},
): MetricScore {
  if (!Number.isFinite(value)) {
    throw new InputError(`value ${value} of ${name} is not a finite number`, {
      where: name,
      fix: 'check the metric file',
    });
  }
  const current = toFitScale(value, settings.transform, name);
  // Built key by key (in the report's key order) rather than by spreads: this runs per metric.
  const base: MetricResult = { name, status: 'ok', value, cutoff: settings.cutoff, worse: settings.worse, reason: '' };
  if (extras.unit !== undefined) base.unit = extras.unit;
  if (extras.count !== undefined) base.count = extras.count;
  const n = baseline.length;
  if (n === 0) return unscored(settings, { ...base, status: 'new', reason: 'no history for this metric yet' });
  base.recent = recentValues(baseline, settings.transform);
  if (n < settings.minRuns) {
    const reason = `only ${n} baseline run${n === 1 ? '' : 's'}; min-runs is ${settings.minRuns}`;
    const early = fitWithFloor(baseline, settings);
    return unscored(settings, { ...base, status: 'learning', baseline: { n, mean: early.mean, sd: early.sd }, reason });
  }
  const fit = fitWithFloor(baseline, settings);
  const centre = fromFitScale(fit.mean, settings.transform);
  const summary: BaselineSummary = { n, mean: fit.mean, sd: fit.sd };
  if (settings.transform === 'log') summary.scale = 'log';
  if (extras.since !== undefined) summary.since = extras.since;
  if (extras.relativeTo !== undefined) summary.relativeTo = extras.relativeTo;
  base.baseline = summary;
  if (centre !== 0) base.change = (value - centre) / centre;
  const deviation = current - fit.mean;
  addDeviationFigures(base, current, fit, settings);
  const score: MetricScore = {
    result: base,
    settings,
    scored: true,
    direction: directionOf(deviation, settings.worse),
    beyondTolerance: beyondTolerance(value, centre, settings.tolerance),
    current,
    fit,
  };
  // `base` is this call's own object, so the decision is written into it (decideMetric would copy).
  const decided = decision(score, plainTest(base));
  base.status = decided.status;
  base.reason = decided.reason;
  return score;
}

/** A new or learning result, which no later decision changes. */
function unscored(settings: MetricSettings, result: MetricResult): MetricScore {
  return { settings, scored: false, direction: 'none', beyondTolerance: false, result };
}

/** The newest RECENT_VALUES baseline values on the metric's own scale. */
function recentValues(baseline: readonly number[], transform: MetricSettings['transform']): number[] {
  const recent = baseline.slice(-RECENT_VALUES);
  if (transform === 'none') return recent;
  for (let i = 0; i < recent.length; i++) recent[i] = fromFitScale(recent[i]!, transform);
  return recent;
}

/** fitGaussian with the resolution moved to the fit scale around the fitted centre. */
function fitWithFloor(values: readonly number[], settings: MetricSettings): GaussianFit {
  const raw = fitGaussian(values, settings.fit, 0);
  const floor = fitScaleFloor(settings.resolution, settings.transform, raw.mean);
  return floor > 0 ? fitGaussian(values, settings.fit, floor) : raw;
}

/** Sets z, density, relative density and tail on the result; a zero spread gives 0 or 1 and no z. */
function addDeviationFigures(result: MetricResult, x: number, fit: GaussianFit, settings: MetricSettings): void {
  const deviation = x - fit.mean;
  const predictive = settings.uncertainty === 'predictive' && fit.n >= 2;
  if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
    const moved = deviation !== 0;
    result.relativeDensity = moved ? 0 : 1;
    result.tail = moved ? 0 : 1;
    return;
  }
  const z = deviation / fit.sd;
  result.z = z;
  result.density = gaussianDensity(x, fit.mean, fit.sd);
  if (!predictive) {
    result.relativeDensity = plugInRelativeDensity(x, fit.mean, fit.sd);
    result.tail = normalTail(z, 'both');
    return;
  }
  const t = deviation / predictiveScale(fit.sampleSd, fit.n);
  result.relativeDensity = predictiveRelativeDensity(x, fit.mean, fit.sampleSd, fit.n);
  result.tail = studentTail(t, fit.n - 1, 'both');
}
