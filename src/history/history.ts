/**
 * The in-memory history of one series: run descriptions oldest first, and one value column per
 * metric aligned with them (NaN where a run lacks the metric). Columnar because the gate reads a
 * metric's whole past at once, and because the stored document is columnar too (names once).
 * This module is pure; reading and writing documents lives beside it (document.ts, stores).
 * A History is never changed in place: appendRun, trimHistory and merges return new ones, and may
 * share unchanged value arrays with their input; the file store relies on that when it splices an
 * append into the text it read (splice-append.ts compares values with the arrays it decoded).
 * The one exception adds and never changes: appendRun's `extendInPlace`, for a caller that gives
 * the old History up, pushes the new run's values onto its arrays.
 */

/** Who produced a run. `id` is the CI run id and attempt ("1234-1"), unique within a series. */
export interface RunInfo {
  id: string;
  sha?: string;
  ref?: string;
  event?: string;
  /** ISO-8601 time of the run. */
  time?: string;
  /** Pull request number when known (the merged PR of a push). */
  pr?: number;
  /** Runner fingerprint text, e.g. "Linux X64 | ubuntu-24.04 20261110.1 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0". */
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

export interface MetricColumn {
  unit?: string;
  /** One entry per run in History.runs order; NaN where the run has no value. */
  values: number[];
}

export interface History {
  series: string;
  runs: RunInfo[];
  columns: Map<string, MetricColumn>;
  /**
   * Runs deleted on purpose by trimHistory since this history was loaded (in memory only, never
   * stored). A store's save compares runs + trimmed with the runs it read, so a shrink that no
   * trim explains is refused instead of losing data.
   */
  trimmed?: number;
}

export function emptyHistory(series: string): History {
  return { series, runs: [], columns: new Map() };
}
