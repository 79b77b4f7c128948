import type { RunInfo } from './history.js';
import { parseIsoTime } from './iso-time.js';

// Numeric collation puts run "999-1" before "1000-1", as CI run ids grow. Made on first use: a
// collator loads locale data (~10 ms), and ids are compared only between runs of the same time.
let ids: Intl.Collator | undefined;

/**
 * The order of runs in a history: by time, then by id. A run without a readable time sorts
 * before every timed run (it is treated as the oldest), so the order is total and the same in
 * merge, append and import.
 *
 * @example [b, a].sort(compareRuns) // oldest first
 */
export function compareRuns(a: RunInfo, b: RunInfo): number {
  const ta = timeKey(a);
  const tb = timeKey(b);
  if (ta !== tb) return ta < tb ? -1 : 1;
  ids ??= new Intl.Collator('en', { numeric: true });
  return ids.compare(a.id, b.id);
}

/** Milliseconds of a run's time, -Infinity when it has none or it cannot be read. */
export function timeKey(run: RunInfo): number {
  return run.time === undefined ? -Infinity : (parseIsoTime(run.time) ?? -Infinity);
}
