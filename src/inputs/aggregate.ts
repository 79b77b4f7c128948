import type { Aggregate } from '../config/types.js';
import { mean } from '../model/moments.js';
import { median } from '../model/median.js';
import { unitScale } from './units.js';

/**
 * Folds the samples of one metric in one run into one value: median (robust to one slow sample),
 * mean (corrected two-pass, src/model/moments.ts), min or max; `auto` (the default) is the min for
 * a time unit and the median otherwise. Why the min for timings: the noise of a timing only adds
 * (interrupts, a busy neighbour, caches another process emptied), so the fastest sample is the
 * one least touched by it; Chen & Revels (2016, "Robust benchmarking in noisy environments",
 * arXiv:1608.04295) show the minimum is the most stable location estimate of such timings. On
 * this project's recorded corpus it cut the false alarms of the idle regime from 5 to 1 per 100
 * clean runs against the median (test/noise, 5 samples a run).
 * @throws Error for an empty list (collectRun never passes one).
 * @example aggregateSamples([3, 1, 2, 10], 'median') // 2.5
 * @example aggregateSamples([3, 1, 2, 10], 'auto', 'ms') // 1
 */
export function aggregateSamples(values: readonly number[], kind: Aggregate, unit?: string): number {
  if (values.length === 0) throw new Error('aggregateSamples needs at least one value');
  const resolved = kind === 'auto' ? autoAggregate(unit) : kind;
  switch (resolved) {
    case 'mean':
      return mean(values);
    case 'min':
      return values.reduce((a, b) => Math.min(a, b));
    case 'max':
      return values.reduce((a, b) => Math.max(a, b));
    default:
      return median(values);
  }
}

/** The aggregate `auto` stands for: the min for a time unit, the median for the rest. */
export function autoAggregate(unit: string | undefined): Exclude<Aggregate, 'auto'> {
  return unit !== undefined && unitScale(unit)?.[0]?.dimension === 'time' ? 'min' : 'median';
}
