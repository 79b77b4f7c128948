import { InputError } from '../errors/input-error.js';
import type { Run } from '../inputs/run.js';
import { mergeMarks, replaces } from './document.js';
import {
  replacementKey,
  type History,
  type LevelMark,
  type MetricColumn,
  type RunInfo,
  type Tombstone,
} from './history.js';
import { compareRuns } from './run-order.js';
import { storedValue } from './units.js';

/**
 * The union of two histories of the same series, by run: a run id held by both sides takes b's
 * copy (b is the later copy), with the marks of both; a higher attempt of a CI run replaces a lower
 * one whichever side holds it; a run either side dropped is left out, and the tombstones of both
 * are kept, so a dropped run never comes back. Ordered by time, then id (compareRuns); a metric one
 * side never had is NaN for that side's runs. Units: a's, where it has one (the unit the history
 * first saw; values are never relabelled). Pure; O(runs x metrics). This is what heals a store
 * that saw two concurrent writers: each kept its own run, the next merge keeps both, none twice.
 * Throws InputError when the series differ.
 *
 * @example mergeHistories(h1, h2).runs.map((r) => r.id) // union of both, oldest first
 */
export function mergeHistories(a: History, b: History): History {
  if (a.series !== b.series) {
    throw new InputError(
      `cannot merge the history of series ${JSON.stringify(b.series)} into ${JSON.stringify(a.series)}`,
      { where: `series ${a.series}`, fix: 'keep one history per series (the `series` option)' },
    );
  }
  const dropped = new Map<string, Tombstone>([...(a.dropped ?? []), ...(b.dropped ?? [])]);
  const chosen = new Map<string, { side: History; index: number }>();
  // The marks of every copy of a run (and of attempts it replaced): a level change stays put.
  const marks = new Map<string, LevelMark[]>();
  for (const side of [a, b]) {
    side.runs.forEach((run, index) => {
      const key = replacementKey(run.id);
      if (run.marks !== undefined && run.marks.length > 0) marks.set(key, mergeMarks(marks.get(key) ?? [], run.marks));
      const previous = chosen.get(key);
      if (previous !== undefined && !replaces(run.id, (previous.side.runs[previous.index] as RunInfo).id)) return;
      chosen.set(key, { side, index });
    });
  }
  const picks = [...chosen.values()]
    .filter(({ side, index }) => !dropped.has((side.runs[index] as RunInfo).id))
    .sort((x, y) => compareRuns(x.side.runs[x.index] as RunInfo, y.side.runs[y.index] as RunInfo));
  const runs = picks.map(({ side, index }) => {
    const run = { ...(side.runs[index] as RunInfo) };
    const folded = marks.get(replacementKey(run.id));
    if (folded !== undefined) run.marks = folded;
    return run;
  });
  const columns = new Map<string, MetricColumn>();
  for (const name of new Set([...a.columns.keys(), ...b.columns.keys()])) {
    const fromA = a.columns.get(name);
    const fromB = b.columns.get(name);
    const values = picks.map(({ side, index }) => (side === a ? fromA : fromB)?.values[index] ?? NaN);
    if (!values.some((v) => !Number.isNaN(v))) continue;
    const unit = fromA?.unit ?? fromB?.unit;
    columns.set(name, unit === undefined ? { values } : { unit, values });
  }
  return { series: a.series, runs, columns, dropped };
}

/**
 * Adds one run at its place in time order, or replaces the run with the same id or an earlier
 * attempt of the same CI run ("8123-1" by "8123-2"); a later attempt already held wins instead.
 * Metrics new to the history get a column that is NaN for older runs; metrics the run lacks are
 * NaN for it. A value is stored in the unit the history first saw for its metric (storedValue).
 * Pure: returns a new History and the id of the run it replaced, if any.
 * Throws InputError on an empty id, a dropped id, a non-finite value or a unit that does not fit.
 *
 * @example appendRun(h, { id: '83-1', time: '2026-03-02T10:00:00Z' }, run).history.runs.at(-1)?.id // '83-1'
 */
export function appendRun(h: History, info: RunInfo, run: Run): { history: History; replaced?: string } {
  if (typeof info.id !== 'string' || info.id.trim() === '') {
    throw new InputError('a run needs an id to be recorded', {
      where: `series ${h.series}`,
      fix: 'pass --id (the CI run id and attempt, e.g. 1234-1)',
    });
  }
  if (h.dropped?.has(info.id)) {
    throw new InputError(`run ${JSON.stringify(info.id)} was dropped from this history, so it is not recorded again`, {
      where: `series ${h.series}`,
      fix: 'record it under another id (--id), or leave it out',
    });
  }
  const columns = new Map<string, MetricColumn>();
  for (const [name, m] of run.metrics) {
    const value = storedValue(name, m, h.columns.get(name)?.unit);
    const unit = h.columns.get(name)?.unit ?? m.unit;
    columns.set(name, unit === undefined ? { values: [value] } : { unit, values: [value] });
  }
  const key = replacementKey(info.id);
  const rival = h.runs.find((r) => replacementKey(r.id) === key);
  const merged = mergeHistories(h, { series: h.series, runs: [{ ...info }], columns, dropped: new Map() });
  const replaced = rival !== undefined && replaces(info.id, rival.id) ? rival.id : undefined;
  return replaced === undefined ? { history: merged } : { history: merged, replaced };
}

/**
 * Keeps the `keep` newest runs (the end of the list) — besides a drop, the only way runs are
 * deleted. Columns that hold no value any more are dropped; tombstones are kept. Pure; value
 * arrays are shared with `h` when no run is dropped.
 * Throws InputError unless keep is a whole number of at least 1 (or Infinity: keep all).
 *
 * @example trimHistory(h, 60).runs.length // min(60, h.runs.length)
 */
export function trimHistory(h: History, keep: number): History {
  checkKeep(keep);
  const drop = Math.max(0, h.runs.length - keep);
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of h.columns) {
    const values = drop === 0 ? column.values : column.values.slice(drop);
    if (drop > 0 && !values.some((v) => !Number.isNaN(v))) continue;
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  return {
    series: h.series,
    runs: h.runs.slice(drop).map((r) => ({ ...r })),
    columns,
    dropped: new Map(h.dropped ?? []),
  };
}

/**
 * Refuses a keep that is not a whole number of runs of at least 1 (Infinity: keep all).
 * @throws InputError
 */
export function checkKeep(keep: number): void {
  if (!(keep === Infinity || (Number.isInteger(keep) && keep >= 1))) {
    throw new InputError(`keep must be a whole number of runs, at least 1, got ${keep}`, {
      fix: 'set `keep` to the number of newest runs to keep, e.g. 4000',
    });
  }
}
