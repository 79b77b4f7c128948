/**
 * For each value, the median of all the other values (leave-one-out medians): the shared move a
 * metric is compared with is taken from the other metrics of its run only, so a metric's own
 * slowdown can never move the shared move it is judged against, however few metrics there are.
 * From one sort: removing the value at sorted position i leaves a sorted list whose k-th element
 * is sorted[k] for k < i and sorted[k + 1] from i on, so the answer is one of three neighbours of
 * the middle, chosen by comparing the value with them (equal values give the same list). NaN
 * entries (missing metrics) are skipped and get NaN; a value with no other finite value gets NaN.
 * O(p log p).
 * @example medianOfOthers([1, 2, 3, 10]) // [3, 3, 2, 2]
 */
export function medianOfOthers(values: ArrayLike<number>): number[] {
  let finite = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) finite++;
  const sorted = new Float64Array(finite);
  let f = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) sorted[f++] = values[i]!;
  sorted.sort();
  const rest = finite - 1;
  const half = rest >> 1;
  const out = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) {
    const x = values[i]!;
    if (!Number.isFinite(x) || rest < 1) out[i] = Number.NaN;
    // An odd count of others: their middle is sorted[half] once x is past it, else sorted[half + 1].
    else if (rest % 2 === 1) out[i] = x > sorted[half]! ? sorted[half]! : sorted[half + 1]!;
    // An even count: the two middle ones, skipping x where it sits among them.
    else if (x <= sorted[half - 1]!) out[i] = (sorted[half]! + sorted[half + 1]!) / 2;
    else if (x <= sorted[half]!) out[i] = (sorted[half - 1]! + sorted[half + 1]!) / 2;
    else out[i] = (sorted[half - 1]! + sorted[half]!) / 2;
  }
  return out;
}
