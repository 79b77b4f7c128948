import type { MetricSettings, Tolerance } from '../../config/types.js';
import { unitScale } from '../../inputs/units.js';
import { fitGaussian, type GaussianFit } from '../../model/fit.js';
import { fromFitScale, toFitScale, type Scale } from '../../model/transform.js';
import { directionOf, type Direction } from '../sides.js';
import { decisionFigures } from './incremental-replay.js';

/**
 * Tune's per-metric judge: one metric alone against a Gaussian fit of its baseline (mle, sd
 * floored at the resolution) with the predictive Student-t on n - 1 degrees of freedom. Tune
 * replays metrics one by one with it until it replays the whole gate (issue 13 item 7); the gate
 * itself judges own moves beside the shared move (src/gate/judge.ts).
 */
export interface AloneScore {
  scored: boolean;
  relativeDensity: number;
  tail: number;
  direction: Direction;
  beyondTolerance: boolean;
}

/**
 * The settings tune replays a metric with: `transform: auto` resolved by the metric's unit (the
 * log scale for a time unit), as the gate resolves it.
 * @example replaySettings({ ...defaults, transform: 'auto' }, 'ms').transform // 'log'
 */
export function replaySettings(settings: MetricSettings, unit: string | undefined): MetricSettings {
  if (settings.transform !== 'auto') return settings;
  const timing = unit !== undefined && unitScale(unit)?.[0]?.dimension === 'time';
  return { ...settings, transform: timing ? 'log' : 'none' };
}

/** Scores `value` against `baseline` (fit-scale values) alone; unscored below min-runs. */
export function scoreMetric(
  _name: string,
  settings: MetricSettings,
  baseline: readonly number[],
  value: number,
): AloneScore {
  const scale = settings.transform as Scale;
  const n = baseline.length;
  if (n === 0 || n < settings.minRuns) {
    return { scored: false, relativeDensity: 1, tail: 1, direction: 'none', beyondTolerance: false };
  }
  const current = toFitScale(value, scale);
  const fit = floored(baseline, settings);
  const figures = decisionFigures(current, fit, settings);
  return {
    scored: true,
    ...figures,
    direction: directionOf(current - fit.mean, settings.worse),
    beyondTolerance: beyondTolerance(value, fromFitScale(fit.mean, scale), settings.tolerance),
  };
}

function floored(values: readonly number[], settings: MetricSettings): GaussianFit {
  const raw = fitGaussian(values, 'mle', 0);
  const floor = fitScaleFloor(settings.resolution, settings.transform as Scale, raw.mean);
  return floor > 0 ? fitGaussian(values, 'mle', floor) : raw;
}

/**
 * The sigma floor on the fit scale for a `resolution` in the metric's own unit: on the log scale a
 * step dx near a centre m is a step of about dx / m in log x.
 * @example fitScaleFloor(2, 'log', Math.log(100)) // 0.02
 */
export function fitScaleFloor(resolution: number, scale: Scale, centre: number): number {
  if (scale === 'none' || resolution === 0) return resolution;
  return resolution / Math.exp(centre);
}

/** Whether |value - centre| exceeds the tolerance (a move exactly at it is within). */
export function beyondTolerance(value: number, centre: number, tolerance: Tolerance): boolean {
  const amount = tolerance.kind === 'absolute' ? tolerance.amount : Math.abs(centre) * tolerance.amount;
  return Math.abs(value - centre) > amount;
}
