import type { History } from '../history/history.js';
import type { Measurement, Run } from '../inputs/run.js';
import { InputError } from '../errors/input-error.js';

/**
 * For `explain` and `report` without `--metrics`: the newest recorded run becomes "this run" and
 * the runs before it the history, so a maintainer can see how the last trusted run was judged.
 * @throws InputError when the history holds no runs.
 * @example splitNewest(h).run.metrics.get('latency/p50') // the newest run's value of that metric
 */
export function splitNewest(history: History, source: string): { history: History; run: Run; id: string } {
  const last = history.runs.length - 1;
  const newest = history.runs[last];
  if (newest === undefined) {
    throw new InputError('the history holds no runs, so there is nothing to judge', {
      where: source,
      fix: "pass this run's metric files with --metrics, or record runs first (bellgate record / import)",
    });
  }
  const metrics = new Map<string, Measurement>();
  const columns = new Map<string, { unit?: string; values: number[] }>();
  for (const [name, column] of history.columns) {
    const value = column.values[last];
    if (value !== undefined && !Number.isNaN(value)) {
      metrics.set(name, column.unit === undefined ? { value, count: 1 } : { value, unit: column.unit, count: 1 });
    }
    const earlier = column.values.slice(0, last);
    if (earlier.some((v) => !Number.isNaN(v))) columns.set(name, { ...column, values: earlier });
  }
  return {
    history: { series: history.series, runs: history.runs.slice(0, last), columns },
    run: { metrics, meta: new Map() },
    id: newest.id,
  };
}
