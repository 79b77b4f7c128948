/**
 * Mean and sum of squared deviations of a changing set of values, updated in O(1) per value by
 * Welford's method (Welford 1962; Knuth, TAOCP vol. 2, 4.2.2): with d = x - mean,
 *   add:    n += 1, mean += d / n,       squares += d * (x - new mean)
 *   remove: n -= 1, mean -= d / n,       squares -= d * (x - new mean)
 * The updates work on deviations from the running mean, never on raw sums of squares, so values
 * with a large offset (1e7 + noise) keep their precision, unlike sum(x^2) - n mean^2.
 * A sliding window (add the newest, remove the oldest) makes replaying a long history O(n).
 * Numerical care: rounding accumulates slowly over add/remove pairs (about one ulp of the offset
 * per step); squares is clamped at 0 so cancellation never makes a variance negative, and a
 * caller replaying many thousands of steps can rebuild with `RunningMoments.of(window)`.
 * Throws RangeError on a non-finite value or removing from an empty set.
 *
 * @example const m = RunningMoments.of([1, 2, 3]); m.remove(1); m.add(4); m.mean // 3
 */
export class RunningMoments {
  #n = 0;
  #mean = 0;
  #squares = 0;

  /** A RunningMoments holding the given values. */
  static of(values: Iterable<number>): RunningMoments {
    const moments = new RunningMoments();
    for (const x of values) moments.add(x);
    return moments;
  }

  get n(): number {
    return this.#n;
  }

  /** Mean of the values held (0 when empty). */
  get mean(): number {
    return this.#mean;
  }

  /** Sum of squared deviations from the mean. */
  get squares(): number {
    return this.#squares;
  }

  add(x: number): void {
    if (!Number.isFinite(x)) throw new RangeError(`value ${x} is not a finite number`);
    this.#n += 1;
    const d = x - this.#mean;
    this.#mean += d / this.#n;
    this.#squares += d * (x - this.#mean);
  }

  /** Removes a value that was added before (the caller keeps the window). */
  remove(x: number): void {
    if (!Number.isFinite(x)) throw new RangeError(`value ${x} is not a finite number`);
    if (this.#n === 0) throw new RangeError('cannot remove a value from an empty set');
    if (this.#n === 1) {
      this.#n = 0;
      this.#mean = 0;
      this.#squares = 0;
      return;
    }
    this.#n -= 1;
    const d = x - this.#mean;
    this.#mean -= d / this.#n;
    this.#squares = Math.max(0, this.#squares - d * (x - this.#mean));
  }

  /**
   * squares / n ("mle") or squares / (n - 1) ("unbiased").
   * Throws RangeError when empty, or with fewer than 2 values for "unbiased".
   */
  variance(divisor: 'mle' | 'unbiased'): number {
    if (divisor === 'unbiased') {
      if (this.#n < 2) throw new RangeError('the unbiased variance needs at least 2 values');
      return this.#squares / (this.#n - 1);
    }
    if (this.#n === 0) throw new RangeError('the variance of an empty set is undefined');
    return this.#squares / this.#n;
  }
}
