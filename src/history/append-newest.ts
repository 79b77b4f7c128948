import type { History, MetricColumn, RunInfo } from './history.js';
import { compareRuns, timeKey } from './run-order.js';

/**
 * appendRun's fast path for the usual record: a run with a new id that sorts after every run
 * (compareRuns: time, then id) of a history already in run order goes at the end. Each column is
 * copied once (a native concat of the new value), instead of mergeHistories' sort and per-value map.
 * Returns undefined when that does not hold — an id already present, a run that sorts before the
 * newest, a history not in run order, duplicate ids, a column not aligned with the runs — and
 * appendRun then merges. `inPlace`: h's value arrays are extended (push) instead of copied, for a
 * caller that gives h up (see appendRun); nothing is changed unless the fast path is taken. The result equals mergeHistories(h, the one-run history): a stable sort
 * of an ordered list is the list itself, so the merge would put the run last too.
 *
 * @example appendNewest(h, { id: '83-1', time: '2026-03-02T10:00:00Z' }, columns)?.runs.at(-1)?.id // '83-1'
 */
export function appendNewest(
  h: History,
  info: RunInfo,
  added: Map<string, MetricColumn>,
  inPlace = false,
): History | undefined {
  const n = h.runs.length;
  const ids = new Set<string>();
  // compareRuns, with each run's time read once (reading a time is the costly part).
  let previous: RunInfo | undefined;
  let previousKey = -Infinity;
  const inOrder = (run: RunInfo): boolean => {
    const key = timeKey(run);
    const ordered =
      previous === undefined || previousKey < key || (previousKey === key && compareRuns(previous, run) <= 0);
    previous = run;
    previousKey = key;
    return ordered;
  };
  for (const run of h.runs) {
    if (!inOrder(run)) return undefined;
    ids.add(run.id);
  }
  if (ids.size !== n || ids.has(info.id)) return undefined;
  if (!inOrder(info)) return undefined;
  for (const column of h.columns.values()) if (column.values.length !== n) return undefined;

  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of h.columns) {
    const fromRun = added.get(name);
    const value = fromRun?.values[0] ?? NaN;
    let values: number[];
    if (inPlace) {
      // The rows a file store reads have room for one more entry (values-scan.ts): no copy.
      values = column.values;
      values.push(value);
    } else {
      // One allocation of n + 1 (a slice and a push would allocate n, then grow to about 1.5 n).
      values = column.values.concat(value);
    }
    const unit = fromRun?.unit ?? column.unit;
    columns.set(name, unit === undefined ? { values } : { unit, values });
  }
  for (const [name, column] of added) {
    if (columns.has(name)) continue;
    const values = new Array<number>(n + 1).fill(NaN);
    values[n] = column.values[0] ?? NaN;
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  const next: History = { series: h.series, runs: [...h.runs.map((r) => ({ ...r })), { ...info }], columns };
  if ((h.trimmed ?? 0) > 0) next.trimmed = h.trimmed;
  return next;
}
