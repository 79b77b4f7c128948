import type { MetricSettings } from '../../config/types.js';
import type { History } from '../../history/history.js';
import { selectBaseline } from './baseline.js';

/**
 * Every value of one metric the gate could have judged, oldest first: the runs that hold the
 * metric (and, with `relative-to`, a non-zero reference), as the gate's own selectBaseline pairs
 * them. A run's baseline in the replay is the values before it in this list.
 */
export interface MetricSequence {
  name: string;
  settings: MetricSettings;
  /** Fit-scale values (after relative-to and the transform), as selectBaseline gives them. */
  values: number[];
  /** The same values on the metric's own scale (after relative-to): what the gate scores as "this run". */
  own: number[];
  /** Run ids and indexes into history.runs, aligned with `values`. */
  runIds: string[];
  runIndex: number[];
}

/**
 * Builds a metric's sequence with selectBaseline over an unbounded window and no change points,
 * so the pairing and transform are exactly the gate's; `own` is recomputed from the column with
 * the same division the gate applies to a run (value / reference), not by undoing the log, so
 * the replayed "this run" is bit-identical to what `bellgate check` would see. O(runs).
 * Throws InputError when a history value cannot take the transform (as the gate would).
 * @example metricSequence(history, 'build/time', settings).values.length // runs holding build/time
 */
export function metricSequence(
  history: History,
  name: string,
  settings: MetricSettings,
  indexOf: ReadonlyMap<string, number>,
): MetricSequence {
  const all = selectBaseline(history, name, { ...settings, window: Number.MAX_SAFE_INTEGER, changePoints: false });
  const column = history.columns.get(name)?.values ?? [];
  const reference = settings.relativeTo === undefined ? undefined : history.columns.get(settings.relativeTo)?.values;
  const runIndex = all.runIds.map((id) => indexOf.get(id)!);
  const own = runIndex.map((i) => {
    const x = column[i]!;
    return reference === undefined ? x : x / reference[i]!;
  });
  return { name, settings, values: all.values, own, runIds: all.runIds, runIndex };
}
