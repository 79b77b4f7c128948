import { MAD_TO_SIGMA } from './fit.js';
import { median } from './median.js';

/**
 * The Hampel identifier (Hampel 1974, "The influence curve and its role in robust estimation";
 * as a moving-window filter, Pearson 2002, "Outliers in process modeling and identification"):
 * value i is outlying when it lies more than `threshold` x 1.4826 MAD from the median of the
 * window of `half` values on each side of it (shorter at the ends). A moving median keeps level
 * steps sharp (a step is the majority on its own side within the window) while a burst shorter
 * than `half` values, such as a few runs on a busy CI machine, stands out of it. Returns one flag
 * per value. O(n x half log half). Throws RangeError for non-finite values or bad options.
 * @example hampelOutliers([1, 1.1, 0.9, 1, 9, 1, 1.1, 0.9, 1], 3) // [false, false, false, false, true, false, ...]
 */
export function hampelOutliers(values: ArrayLike<number>, half: number, threshold = 3): boolean[] {
  if (!Number.isInteger(half) || half < 1) throw new RangeError(`half must be a whole number, 1 or more, got ${half}`);
  if (!(threshold > 0)) throw new RangeError(`threshold must be above 0, got ${threshold}`);
  const n = values.length;
  const flags: boolean[] = [];
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(values[i]!))
      throw new RangeError(`value ${values[i]} at position ${i + 1} is not a finite number`);
  }
  for (let i = 0; i < n; i++) {
    const window = Array.prototype.slice.call(values, Math.max(0, i - half), Math.min(n, i + half + 1)) as number[];
    const centre = median(window);
    const spread = MAD_TO_SIGMA * median(window.map((x) => Math.abs(x - centre)));
    flags.push(Math.abs(values[i]! - centre) > threshold * spread && spread > 0);
  }
  return flags;
}
