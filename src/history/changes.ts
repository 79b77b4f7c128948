/**
 * Everything a store can be asked to change in a history, as data (HistoryChange), and the pure
 * functions that apply it. Stores take a change rather than a finished History so each can apply
 * it to what is stored at the moment of writing (under the file lock, after the branch's newest
 * head, over every artifact): a writer never overwrites what another added since it read.
 * Applying a change again to its own result changes nothing more, so a store may retry freely.
 * The maintenance commands (mark, drop, runs, rename) are built on these.
 */
import { InputError } from '../errors/input-error.js';
import { checkMetricName } from '../inputs/names.js';
import type { Run } from '../inputs/run.js';
import { mergeMarks } from './document.js';
import {
  replacementKey,
  type History,
  type LevelMark,
  type MetricColumn,
  type RunInfo,
  type Tombstone,
} from './history.js';
import { appendRun, mergeHistories, trimHistory } from './merge.js';

export type HistoryChange =
  /** Append a run (or replace the run with its id or an earlier attempt), then keep the newest `keep`. */
  | { kind: 'record'; info: RunInfo; run: Run; keep: number }
  /** Add a level mark to a run. */
  | { kind: 'mark'; id: string; mark: LevelMark }
  /** Drop a run for good: it is removed and a tombstone keeps it from coming back. */
  | { kind: 'drop'; tombstone: Tombstone }
  /** Give a metric a new name, keeping its history. */
  | { kind: 'rename'; from: string; to: string }
  /** Union with these runs (theirs win a shared id), as `bellgate import` does. */
  | { kind: 'merge'; history: History };

export interface ChangeResult {
  history: History;
  /** For a record: the id of the run it replaced (the same id, or an earlier attempt). */
  replaced?: string;
}

/**
 * Applies a change to a whole history. Pure.
 * @throws InputError when the change cannot apply (no such run or metric, a dropped id, a unit that does not fit).
 * @example applyChange(h, { kind: 'drop', tombstone: { id: '81-1', reason: 'noisy runner' } }).history.dropped?.has('81-1') // true
 */
export function applyChange(h: History, change: HistoryChange): ChangeResult {
  switch (change.kind) {
    case 'record': {
      const { history, replaced } = appendRun(h, change.info, change.run);
      const trimmed = trimHistory(history, change.keep);
      return replaced === undefined ? { history: trimmed } : { history: trimmed, replaced };
    }
    case 'mark':
      return { history: markRun(h, change.id, change.mark) };
    case 'drop':
      return { history: dropRun(h, change.tombstone) };
    case 'rename':
      return { history: renameMetric(h, change.from, change.to) };
    case 'merge':
      return { history: mergeHistories(h, change.history) };
  }
}

/**
 * Adds a level mark to the run `id` (or to the later attempt that replaced it). A mark already
 * there is not added twice.
 * @throws InputError when no such run is in the history.
 * @example markRun(h, '81-1', { reason: 'manual', metrics: ['build/*'] }).runs.find((r) => r.id === '81-1')?.marks
 */
export function markRun(h: History, id: string, mark: LevelMark): History {
  const key = replacementKey(id);
  const index = h.runs.findIndex((r) => r.id === id);
  const at = index >= 0 ? index : h.runs.findIndex((r) => replacementKey(r.id) === key);
  if (at < 0) throw unknownRun(h, id, 'mark');
  const runs = h.runs.map((r, i) => (i === at ? { ...r, marks: mergeMarks(r.marks ?? [], [mark]) } : r));
  return { ...h, runs };
}

/**
 * Drops the run `tombstone.id`: it leaves the runs and its tombstone stays, so that no merge with
 * an older copy of the history brings it back. Dropping a run already dropped changes nothing.
 * @throws InputError when the history holds no such run and has not dropped it.
 * @example dropRun(h, { id: '81-1', reason: 'noisy runner' }).runs.some((r) => r.id === '81-1') // false
 */
export function dropRun(h: History, tombstone: Tombstone): History {
  if (h.dropped?.has(tombstone.id)) return h;
  const at = h.runs.findIndex((r) => r.id === tombstone.id);
  if (at < 0) throw unknownRun(h, tombstone.id, 'drop');
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of h.columns) {
    const values = column.values.filter((_, i) => i !== at);
    if (!values.some((v) => !Number.isNaN(v))) continue;
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  return {
    series: h.series,
    runs: h.runs.filter((_, i) => i !== at),
    columns,
    dropped: new Map([...(h.dropped ?? []), [tombstone.id, { ...tombstone }]]),
  };
}

/**
 * Gives metric `from` the name `to`, keeping its values, unit and place in the column order. When
 * `to` exists already the two are joined, provided no run holds both and their units agree.
 * Renaming a metric that is already called `to` (and no longer `from`) changes nothing.
 * @throws InputError for an unknown metric, a name every reader refuses, or two columns that cannot be joined.
 * @example renameMetric(h, 'build/compile', 'build/compile-ms').columns.has('build/compile-ms') // true
 */
export function renameMetric(h: History, from: string, to: string): History {
  checkMetricName(to, 'the new name');
  const source = h.columns.get(from);
  if (source === undefined) {
    if (h.columns.has(to)) return h;
    throw new InputError(`the history holds no metric named ${JSON.stringify(from)}`, {
      where: `series ${h.series}`,
      fix: 'list the metric names with `bellgate check` or `bellgate runs`',
    });
  }
  if (from === to) return h;
  const target = h.columns.get(to);
  let joined = source;
  if (target !== undefined) {
    if (target.unit !== undefined && source.unit !== undefined && target.unit !== source.unit) {
      throw new InputError(
        `cannot join ${JSON.stringify(from)} (${source.unit}) into ${JSON.stringify(to)} (${target.unit}): their units differ`,
        { where: `series ${h.series}`, fix: 'rename to a new name instead' },
      );
    }
    const both = source.values.findIndex((v, i) => !Number.isNaN(v) && !Number.isNaN(target.values[i] ?? NaN));
    if (both >= 0) {
      throw new InputError(
        `cannot join ${JSON.stringify(from)} into ${JSON.stringify(to)}: run ${JSON.stringify(h.runs[both]?.id)} holds both`,
        { where: `series ${h.series}`, fix: 'drop that run first, or rename to a new name' },
      );
    }
    const values = target.values.map((v, i) => (Number.isNaN(v) ? (source.values[i] ?? NaN) : v));
    const unit = target.unit ?? source.unit;
    joined = unit === undefined ? { values } : { unit, values };
  }
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of h.columns) {
    if (name === from) {
      if (target === undefined) columns.set(to, joined);
    } else columns.set(name, name === to ? joined : column);
  }
  return { ...h, columns };
}

/** One line of `bellgate runs`: a run's description and how many metrics it holds. */
export interface RunSummary extends RunInfo {
  /** Metrics with a value in this run. */
  metricCount: number;
}

/**
 * The runs of a history, oldest first, each with its metric count. Pure.
 * @example listRuns(h).map((r) => `${r.id} ${r.metricCount}`)
 */
export function listRuns(h: History): RunSummary[] {
  const counts = new Array<number>(h.runs.length).fill(0);
  for (const column of h.columns.values()) {
    column.values.forEach((v, i) => {
      if (!Number.isNaN(v)) counts[i] = (counts[i] ?? 0) + 1;
    });
  }
  return h.runs.map((r, i) => ({ ...r, metricCount: counts[i] ?? 0 }));
}

function unknownRun(h: History, id: string, what: string): InputError {
  return new InputError(
    `the history of series ${JSON.stringify(h.series)} holds no run ${JSON.stringify(id)} to ${what}`,
    {
      where: `series ${h.series}`,
      fix: 'list the run ids with `bellgate runs`',
    },
  );
}
