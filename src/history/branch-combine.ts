import type { History, MetricColumn, RunInfo } from './history.js';
import { mergeHistories } from './merge.js';

/**
 * What the branch store writes when the branch moved after its load: every run of `stored` that
 * `h` neither holds nor deleted on purpose (`deleted`: ids that were loaded and that h no longer
 * has, i.e. trimmed away), plus all of `h`; h's copy wins a shared id. Unlike a cut by time, this
 * keeps a concurrent writer's run even when its time is older than all of h's. Pure; the
 * result's `trimmed` is h's.
 *
 * @example combineWithStored(mine, onBranch, new Set()).runs // union by run id, time order
 */
export function combineWithStored(h: History, stored: History, deleted: ReadonlySet<string>): History {
  const mine = new Set(h.runs.map((r) => r.id));
  const keep: number[] = [];
  stored.runs.forEach((r, i) => {
    if (!mine.has(r.id) && !deleted.has(r.id)) keep.push(i);
  });
  if (keep.length === 0) return h;
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of stored.columns) {
    const values = keep.map((i) => column.values[i] ?? NaN);
    if (!values.some((v) => !Number.isNaN(v))) continue;
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  const theirs: History = { series: h.series, runs: keep.map((i) => ({ ...stored.runs[i] }) as RunInfo), columns };
  const combined = mergeHistories(theirs, h);
  if (h.trimmed === undefined) delete combined.trimmed;
  else combined.trimmed = h.trimmed;
  return combined;
}
