/**
 * For each value, the median of all the other values (leave-one-out medians): the shared move a
 * metric is compared with is taken from the other metrics of its run only, so a metric's own
 * slowdown can never move the shared move it is judged against, however few metrics there are.
 * From one sort: removing the value at sorted position i leaves a sorted list whose k-th element
 * is sorted[k] for k < i and sorted[k + 1] from i on. NaN entries (missing metrics) are skipped and
 * get NaN; a value with no other finite value gets NaN. O(p log p).
 * @example medianOfOthers([1, 2, 3, 10]) // [3, 3, 2, 2]
 */
export function medianOfOthers(values: readonly number[]): number[] {
  const order = values
    .map((_, i) => i)
    .filter((i) => Number.isFinite(values[i]!))
    .sort((a, b) => values[a]! - values[b]!);
  const sorted = order.map((i) => values[i]!);
  const rank = new Map<number, number>();
  order.forEach((index, r) => rank.set(index, r));
  const rest = sorted.length - 1;
  const at = (removed: number, k: number): number => sorted[k < removed ? k : k + 1]!;
  return values.map((_, i) => {
    const removed = rank.get(i);
    if (removed === undefined || rest < 1) return Number.NaN;
    const half = rest >> 1;
    return rest % 2 === 1 ? at(removed, half) : (at(removed, half - 1) + at(removed, half)) / 2;
  });
}
