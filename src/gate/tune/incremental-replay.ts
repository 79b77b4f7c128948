import type { MetricSettings } from '../../config/types.js';
import { plugInRelativeDensity, predictiveRelativeDensity, predictiveScale } from '../../model/density.js';
import { fitGaussian, type GaussianFit } from '../../model/fit.js';
import { RunningMoments } from '../../model/running-moments.js';
import { normalTail, studentTail } from '../../model/tails.js';
import { fromFitScale, toFitScale, type Scale } from '../../model/transform.js';
import { directionOf } from '../sides.js';
import { beyondTolerance, fitScaleFloor } from './score-alone.js';
import type { MetricSequence } from './metric-sequence.js';
import { emptyReplay, type MetricReplay, type Side } from './replay-point.js';

/**
 * Whether a metric's settings let the replay slide one RunningMoments window instead of refitting:
 * `fit: mle` or `unbiased` (the median of robust has no O(1) update) and no change points (the
 * baseline's start would jump). `relative-to` is fine: the sequence already holds the ratios.
 * @example canSlide({ ...settings, fit: 'robust' }) // false
 */
export function canSlide(settings: MetricSettings): boolean {
  return !settings.changePoints;
}

/**
 * Replays a metric with a sliding window: Welford updates (RunningMoments) add the newest run and
 * drop the one leaving the window, O(1) per run, so O(runs) per metric. The fit and the figures
 * follow judgeMetric step by step (sd floored at the resolution on the fit scale; predictive
 * Student-t with n - 1 dof and scale s sqrt(1 + 1/n), else plug-in). Two guards keep it equal to
 * the refit: the moments are rebuilt from the window every `window` steps (rounding drift stays
 * bounded), and a window with (almost) no spread is refitted exactly with fitGaussian, since a
 * constant history must give sd 0, not 1e-17.
 * @example incrementalReplay(sequence).run.length // judged runs
 */
export function incrementalReplay(sequence: MetricSequence): MetricReplay {
  const { name, settings, values, own, runIndex } = sequence;
  const replay = emptyReplay(name, 'incremental');
  // Moments of (value - shift), the shift a recent value: Welford's rounding then scales with the
  // spread, not with the offset (1e6 + noise keeps its digits).
  let shift = values[0] ?? 0;
  let moments = new RunningMoments();
  let start = 0;
  let sinceRebuild = 0;
  for (let k = 0; k < values.length; k++) {
    if (k > 0) {
      moments.add(values[k - 1]! - shift);
      if (k - start > settings.window) moments.remove(values[start++]! - shift);
      if (++sinceRebuild >= settings.window) {
        shift = values[start]!;
        moments = RunningMoments.of(values.slice(start, k).map((v) => v - shift));
        sinceRebuild = 0;
      }
    }
    const n = k - start;
    if (n === 0 || n < settings.minRuns) continue;
    const fit = slidingFit(moments, shift, values, start, k, settings);
    const x = toFitScale(own[k]!, settings.transform as Scale);
    const figures = decisionFigures(x, fit, settings);
    const direction = directionOf(x - fit.mean, settings.worse);
    const beyond = beyondTolerance(own[k]!, fromFitScale(fit.mean, settings.transform as Scale), settings.tolerance);
    replay.run.push(runIndex[k]!);
    replay.relativeDensity.push(figures.relativeDensity);
    replay.tail.push(figures.tail);
    replay.side.push(sideOf(direction, beyond));
  }
  return replay;
}

function sideOf(direction: 'worse' | 'better' | 'none', beyond: boolean): Side {
  if (!beyond) return 0;
  return direction === 'worse' ? 1 : direction === 'better' ? -1 : 0;
}

/** fitGaussian's mle/unbiased result from running moments, floored like judgeMetric's fitWithFloor. */
function slidingFit(
  moments: RunningMoments,
  shift: number,
  values: number[],
  start: number,
  end: number,
  settings: MetricSettings,
): GaussianFit {
  const { n, squares } = moments;
  const mean = shift + moments.mean;
  // A spread within rounding of the offset is a constant window (or nearly): refit exactly, since
  // a constant history must give sd 0, not 1e-17.
  if (squares <= 1e-20 * n * mean * mean) return floored(values.slice(start, end), settings);
  const sampleVariance = n > 1 ? squares / (n - 1) : 0;
  const spread = Math.sqrt(squares / n);
  const floor = fitScaleFloor(settings.resolution, settings.transform as Scale, mean);
  return {
    n,
    mean,
    sd: Math.max(spread, floor),
    sampleSd: Math.max(Math.sqrt(sampleVariance), floor),
    method: 'mle',
  };
}

function floored(window: number[], settings: MetricSettings): GaussianFit {
  const raw = fitGaussian(window, 'mle', 0);
  const floor = fitScaleFloor(settings.resolution, settings.transform as Scale, raw.mean);
  return floor > 0 ? fitGaussian(window, 'mle', floor) : raw;
}

/** Relative density and two-sided tail, as judgeMetric computes them for a fit (zero spread: 0 or 1). */
export function decisionFigures(
  x: number,
  fit: GaussianFit,
  _settings: MetricSettings,
): { relativeDensity: number; tail: number } {
  const deviation = x - fit.mean;
  const predictive = fit.n >= 2;
  if (fit.sd === 0 || (predictive && fit.sampleSd === 0)) {
    const moved = deviation !== 0;
    return { relativeDensity: moved ? 0 : 1, tail: moved ? 0 : 1 };
  }
  if (!predictive) {
    return {
      relativeDensity: plugInRelativeDensity(x, fit.mean, fit.sd),
      tail: normalTail(deviation / fit.sd, 'both'),
    };
  }
  return {
    relativeDensity: predictiveRelativeDensity(x, fit.mean, fit.sampleSd, fit.n),
    tail: studentTail(deviation / predictiveScale(fit.sampleSd, fit.n), fit.n - 1, 'both'),
  };
}
