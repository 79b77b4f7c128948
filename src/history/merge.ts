import { InputError } from '../errors/input-error.js';
import type { Run } from '../inputs/run.js';
import { appendNewest } from './append-newest.js';
import type { History, MetricColumn, RunInfo } from './history.js';
import { compareRuns, timeKey } from './run-order.js';

/**
 * The union of two histories of the same series, by run id: a run id held by both sides takes
 * b's copy whole (b is the later copy: a store merges older documents first). The result is
 * ordered by time, then id (see compareRuns); a metric one side never had is NaN for that side's
 * runs. Units: b's where it has one. Pure; O(runs x metrics). This is what heals a store that saw
 * two concurrent writers: each kept its own run, the next merge keeps both, no run twice.
 * Throws InputError when the series differ.
 *
 * @example mergeHistories(h1, h2).runs.map((r) => r.id) // union of both, oldest first
 */
export function mergeHistories(a: History, b: History): History {
  if (a.series !== b.series) {
    throw new InputError(
      `cannot merge the history of series ${JSON.stringify(b.series)} into ${JSON.stringify(a.series)}`,
      {
        where: `series ${a.series}`,
        fix: 'keep one history per series (the `series` option)',
      },
    );
  }
  const chosen = new Map<string, { side: History; index: number }>();
  for (const side of [a, b]) side.runs.forEach((run, index) => chosen.set(run.id, { side, index }));
  const picks = [...chosen.values()].sort((x, y) =>
    compareRuns(x.side.runs[x.index] as RunInfo, y.side.runs[y.index] as RunInfo),
  );
  const columns = new Map<string, MetricColumn>();
  for (const name of new Set([...a.columns.keys(), ...b.columns.keys()])) {
    const fromA = a.columns.get(name);
    const fromB = b.columns.get(name);
    const values = picks.map(({ side, index }) => (side === a ? fromA : fromB)?.values[index] ?? NaN);
    const unit = fromB?.unit ?? fromA?.unit;
    columns.set(name, unit === undefined ? { values } : { unit, values });
  }
  const merged: History = {
    series: a.series,
    runs: picks.map(({ side, index }) => ({ ...side.runs[index] }) as RunInfo),
    columns,
  };
  const trimmed = (a.trimmed ?? 0) + (b.trimmed ?? 0);
  if (trimmed > 0) merged.trimmed = trimmed;
  return merged;
}

/**
 * Adds one run (or replaces the run with the same id) at its place in time order. Metrics new
 * to the history get a column that is NaN for older runs; metrics the run lacks are NaN for it.
 * Units the run carries are recorded. Pure: returns a new History. The usual case (a new run,
 * newest of all) takes appendNewest's fast path; anything else merges; the result is the same.
 * Throws InputError on an empty id or a non-finite value (never stored as a silent gap).
 * `options.extendInPlace`: the caller gives h up (it reads at most h.runs and h.series again), so
 * on the fast path h's value arrays become the result's, each extended by one entry — no copy of
 * every column (at 1,000 x 1,000 that copy was 8 MB and ~10 ms with its garbage collection).
 * The entries h had are never changed, only added to; h.columns then no longer matches h.runs.
 *
 * @example appendRun(h, { id: '83-1', time: '2026-03-02T10:00:00Z' }, run).runs.at(-1)?.id // '83-1'
 */
export function appendRun(h: History, info: RunInfo, run: Run, options: { extendInPlace?: boolean } = {}): History {
  if (typeof info.id !== 'string' || info.id.trim() === '') {
    throw new InputError('a run needs an id to be recorded', {
      where: `series ${h.series}`,
      fix: 'pass --id (the CI run id and attempt, e.g. 1234-1)',
    });
  }
  const columns = new Map<string, MetricColumn>();
  for (const [name, m] of run.metrics) {
    if (!Number.isFinite(m.value)) {
      throw new InputError(`metric value ${m.value} is not a finite number and cannot be recorded`, {
        where: name,
        fix: 'check the metric file that produced it',
      });
    }
    columns.set(name, m.unit === undefined ? { values: [m.value] } : { unit: m.unit, values: [m.value] });
  }
  return (
    appendNewest(h, info, columns, options.extendInPlace === true) ??
    mergeHistories(h, { series: h.series, runs: [{ ...info }], columns })
  );
}

/**
 * Keeps the `keep` newest runs (the end of the list) — the only way runs are deleted. Columns that
 * hold no value any more are dropped. Records the number deleted in `trimmed`, which a store's
 * save uses to tell an intended shrink from a lost history. Pure.
 * When no run is dropped the value arrays are shared with `h`, not copied (a History is never
 * changed in place; a copy of every column would only cost time and memory at record).
 * Throws InputError unless keep is a whole number of at least 1 (or Infinity: keep all).
 *
 * @example trimHistory(h, 60).runs.length // min(60, h.runs.length)
 */
export function trimHistory(h: History, keep: number): History {
  if (!(keep === Infinity || (Number.isInteger(keep) && keep >= 1))) {
    throw new InputError(`keep must be a whole number of runs, at least 1, got ${keep}`, {
      fix: 'set `keep` to the number of newest runs to keep, e.g. 500',
    });
  }
  const drop = Math.max(0, h.runs.length - keep);
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of h.columns) {
    const values = drop === 0 ? column.values : column.values.slice(drop);
    if (!values.some((v) => !Number.isNaN(v))) continue;
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  const trimmed: History = { series: h.series, runs: h.runs.slice(drop).map((r) => ({ ...r })), columns };
  const total = (h.trimmed ?? 0) + drop;
  if (total > 0) trimmed.trimmed = total;
  return trimmed;
}

/**
 * What a store writes when the stored document changed after it was loaded: `h`, plus the runs of
 * `stored` that another writer added meanwhile — ids `h` lacks that are not older than h's oldest
 * run (older ones are what h trimmed on purpose, and stay deleted). `h` wins every shared id.
 * A run without a time counts as the oldest. Pure.
 *
 * @example healConcurrent(mine, onDisk).runs // my runs and the other writer's new ones
 */
export function healConcurrent(h: History, stored: History): History {
  const keep = concurrentRuns(h, stored.runs);
  if (keep.length === 0) return h;
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of stored.columns) {
    const values = keep.map((i) => column.values[i] ?? NaN);
    columns.set(name, column.unit === undefined ? { values } : { unit: column.unit, values });
  }
  const added: History = { series: h.series, runs: keep.map((i) => ({ ...stored.runs[i] }) as RunInfo), columns };
  const healed = mergeHistories(added, h);
  if (h.trimmed !== undefined) healed.trimmed = h.trimmed;
  return healed;
}

/**
 * The indexes of the runs in `storedRuns` that healConcurrent would add to `h`: ids `h` lacks, not
 * older than h's oldest run. Empty means healing changes nothing, which a store can decide from
 * the run list alone (no columns needed). Pure.
 *
 * @example concurrentRuns(mine, onDisk.runs) // [] when nobody else wrote
 */
export function concurrentRuns(h: History, storedRuns: readonly RunInfo[]): number[] {
  const mine = new Set(h.runs.map((r) => r.id));
  // Reading every time is the costly part, and needed only when some stored id is not in h.
  let oldest: number | undefined;
  const keep: number[] = [];
  storedRuns.forEach((r, i) => {
    if (mine.has(r.id)) return;
    oldest ??= h.runs.reduce((min, run) => Math.min(min, timeKey(run)), Infinity);
    if (timeKey(r) >= oldest) keep.push(i);
  });
  return keep;
}
