/**
 * Wraps a pure function of one number so it computes again only when the argument changes: the
 * reports format every metric's cutoff, and the metrics of a run usually share one.
 * @example const text = rememberLast((x) => x.toFixed(2)); text(0.01); text(0.01) // formats once
 */
export function rememberLast<T>(compute: (x: number) => T): (x: number) => T {
  let last = NaN;
  let result: T | undefined;
  return (x) => {
    // Object.is, so NaN repeats and -0 stays apart from 0.
    if (result === undefined || !Object.is(x, last)) {
      result = compute(x);
      last = x;
    }
    return result;
  };
}
