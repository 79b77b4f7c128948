/**
 * The in-memory history of one series: run descriptions oldest first, and one value column per
 * metric aligned with them (NaN where a run lacks the metric), plus the tombstones of runs dropped
 * on purpose. Columnar because the gate reads a metric's past at once. This module is pure; the
 * stored form (JSON Lines, one line per run) lives in document.ts, the stores beside it.
 * A History is never changed in place: appendRun, trimHistory, merges and the maintenance
 * functions return new ones, and may share unchanged value arrays with their input.
 * A check may hold only the newest runs of the stored history (a read from the end): everything
 * that takes a History must work on whatever tail it is given.
 */

/**
 * Who produced a run. `id` is unique within a series; a CI run is "RUN-ATTEMPT" ("1234-1"), and a
 * higher attempt of the same CI run replaces a lower one (see attemptOf).
 */
export interface RunInfo {
  id: string;
  sha?: string;
  ref?: string;
  event?: string;
  /** ISO-8601 time of the run. */
  time?: string;
  /** Pull request number when known (the merged PR of a push). */
  pr?: number;
  /** Runner fingerprint text, e.g. "Linux X64 | ubuntu24 20261110.1 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0". */
  runner?: string;
  /** Level changes that START at this run. */
  marks?: LevelMark[];
}

/**
 * A level change: for the metrics it matches, runs before it are another level, and a check fits
 * (the centre of) such a metric only on runs since the newest matching mark.
 */
export interface LevelMark {
  /** Globs over metric names; absent = every metric. */
  metrics?: string[];
  reason: 'accepted' | 'manual';
  /** For 'accepted': the pull request that carried the accept label. */
  pr?: number;
  note?: string;
}

/** A run dropped on purpose (`bellgate drop`): kept so that a merge never brings the run back. */
export interface Tombstone {
  id: string;
  /** When it was dropped (ISO-8601). */
  time?: string;
  reason?: string;
}

export interface MetricColumn {
  /** The unit the history first saw for the metric; values are stored in it, never relabelled. */
  unit?: string;
  /** One entry per run in History.runs order; NaN where the run has no value. */
  values: number[];
}

export interface History {
  series: string;
  /** Oldest first (by time, then id); dropped runs are never among them. */
  runs: RunInfo[];
  columns: Map<string, MetricColumn>;
  /**
   * Tombstones by run id. A read from the end holds those the document keeps up front (every
   * tombstone a Bellgate store wrote); absent means none.
   */
  dropped?: Map<string, Tombstone>;
}

export function emptyHistory(series: string): History {
  return { series, runs: [], columns: new Map(), dropped: new Map() };
}

/**
 * The CI run and attempt an id names, when it has the form "RUN-ATTEMPT" with both parts whole
 * numbers (the action's `${GITHUB_RUN_ID}-${GITHUB_RUN_ATTEMPT}`); undefined for any other id.
 * Two ids of one run are attempts of it: the higher attempt replaces the lower.
 *
 * @example attemptOf('8123-2') // { run: '8123', attempt: 2 }
 */
export function attemptOf(id: string): { run: string; attempt: number } | undefined {
  const m = /^(\d{1,20})-(\d{1,9})$/.exec(id);
  return m ? { run: m[1] as string, attempt: Number(m[2]) } : undefined;
}

/** The key under which runs replace each other: the CI run of an attempt id, else the id itself. */
export function replacementKey(id: string): string {
  const a = attemptOf(id);
  return a === undefined ? `id:${id}` : `run:${a.run}`;
}
