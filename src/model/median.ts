import { InputError } from '../errors/input-error.js';

/** Rejects what has no median: an empty set or a non-finite value (1-based position in the message). */
function checkFinite(values: ArrayLike<number>): void {
  if (values.length === 0) throw new InputError('cannot take the median of an empty set of values');
  for (let i = 0; i < values.length; i++) {
    const x = values[i]!;
    if (!Number.isFinite(x)) throw new InputError(`value ${x} at position ${i + 1} is not a finite number`);
  }
}

/**
 * Moves the k-th smallest of buffer[0..length) to index k, smaller-or-equal values before it and
 * larger-or-equal after (Hoare's FIND / quickselect, Hoare 1961, "Algorithm 65: Find"), with a
 * median-of-three pivot so sorted and reversed inputs stay linear. O(length) expected.
 * The values must be finite (no NaN: comparisons with NaN would not order).
 */
function selectInPlace(buffer: Float64Array, length: number, k: number): number {
  let lo = 0;
  let hi = length - 1;
  while (hi > lo) {
    const mid = (lo + hi) >> 1;
    // Median of three: order buffer[lo] <= buffer[mid] <= buffer[hi], pivot on the middle one.
    // Swaps written out: a call per swap is most of the cost before V8 optimises this.
    // (lo and mid are the same index for two values, so each swap works on the buffer.)
    if (buffer[mid]! < buffer[lo]!) {
      const t = buffer[mid]!;
      buffer[mid] = buffer[lo]!;
      buffer[lo] = t;
    }
    if (buffer[hi]! < buffer[lo]!) {
      const t = buffer[hi]!;
      buffer[hi] = buffer[lo]!;
      buffer[lo] = t;
    }
    if (buffer[hi]! < buffer[mid]!) {
      const t = buffer[hi]!;
      buffer[hi] = buffer[mid]!;
      buffer[mid] = t;
    }
    const pivot = buffer[mid]!;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (buffer[i]! < pivot) i++;
      while (buffer[j]! > pivot) j--;
      if (i <= j) {
        const t = buffer[i]!;
        buffer[i] = buffer[j]!;
        buffer[j] = t;
        i++;
        j--;
      }
    }
    // Now [lo, j] <= pivot <= [i, hi], and any index strictly between j and i holds the pivot.
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else break;
  }
  return buffer[k]!;
}

/**
 * Median of buffer[0..length), reordering that part of the buffer (no copy). For the change-point
 * detector, which reuses one scratch buffer per call. The values must be finite and length >= 1.
 * O(length) expected (selection, not a sort): the same value a sort would give.
 * @example medianInPlace(Float64Array.of(3, 1, 2, 10), 4) // 2.5
 */
export function medianInPlace(buffer: Float64Array, length: number): number {
  const half = length >> 1;
  const upper = selectInPlace(buffer, length, half);
  if (length % 2 === 1) return upper;
  // Everything before `half` is <= the upper middle value; the lower middle is their largest.
  let lower = buffer[0]!;
  for (let i = 1; i < half; i++) if (buffer[i]! > lower) lower = buffer[i]!;
  return (lower + upper) / 2;
}

/**
 * Median of the values. O(n) expected, by selection on a copy (the input is not reordered).
 * Throws InputError on an empty input or a non-finite value.
 * @example median([3, 1, 2, 10]) // 2.5
 */
export function median(values: ArrayLike<number>): number {
  checkFinite(values);
  return medianInPlace(Float64Array.from(values), values.length);
}

/**
 * Median absolute deviation from the median (unscaled). Multiply by 1.4826 for a consistent
 * estimate of sigma under a Gaussian (Rousseeuw & Croux 1993; 1.4826 = 1 / Phi^-1(3/4)).
 * Throws InputError on an empty input or a non-finite value.
 * @example medianAbsoluteDeviation([1, 2, 3, 4, 100]) // 1
 */
export function medianAbsoluteDeviation(values: ArrayLike<number>): number {
  checkFinite(values);
  const n = values.length;
  const scratch = Float64Array.from(values);
  const centre = medianInPlace(scratch, n);
  // The median of |x - centre| does not depend on the order, so the reordered copy serves.
  for (let i = 0; i < n; i++) scratch[i] = Math.abs(scratch[i]! - centre);
  return medianInPlace(scratch, n);
}
