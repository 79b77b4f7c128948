import type { Aggregate } from '../config/types.js';
import { mean } from '../model/moments.js';
import { median } from '../model/median.js';

/**
 * Folds the samples of one metric in one run into one value: median (the default: robust to one
 * slow sample), mean (corrected two-pass, src/model/moments.ts), min (the usual choice for
 * timings, whose noise only adds) or max.
 * @throws Error for an empty list (collectRun never passes one).
 * @example aggregateSamples([3, 1, 2, 10], 'median') // 2.5
 */
export function aggregateSamples(values: readonly number[], kind: Aggregate): number {
  if (values.length === 0) throw new Error('aggregateSamples needs at least one value');
  switch (kind) {
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
