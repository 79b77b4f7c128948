import { settingsFor } from '../config/rules.js';
import type { Config } from '../config/types.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';

/** How many of the metrics the baseline holds this run lacks (Report.missing). */
export interface MissingCount {
  /** Baseline metrics absent from this run. */
  count: number;
  /** Baseline metrics: not ignored, in the newest history run, with at least `min-runs` values. */
  of: number;
}

/**
 * Counts the baseline metrics this run lacks. A baseline metric is one the newest recorded run
 * holds, with at least `min-runs` values in the history and no ignore rule: a metric dropped long
 * ago, or one still learning, does not count. A metric whose only samples were not judged (a NaN,
 * a failed test) is missing too. Pure; walks back at most `min-runs` values per metric.
 * @example missingMetrics(config, history, run) // { count: 7, of: 10 }
 */
export function missingMetrics(config: Config, history: History, run: Run): MissingCount {
  const last = history.runs.length - 1;
  let count = 0;
  let of = 0;
  if (last < 0) return { count, of };
  for (const [name, column] of history.columns) {
    if (!Number.isFinite(column.values[last] ?? NaN)) continue;
    const settings = settingsFor(config, name);
    if (settings.ignore || !holdsAtLeast(column.values, last, settings.minRuns)) continue;
    of += 1;
    if (!run.metrics.has(name)) count += 1;
  }
  return { count, of };
}

/**
 * Whether a run's metrics are mostly missing from the baseline: more than half of the baseline
 * metrics (the missing-metrics policy of the CLI and the action acts on this).
 * @example mostlyMissing({ count: 7, of: 10 }) // true
 */
export function mostlyMissing(missing: MissingCount | undefined): boolean {
  return missing !== undefined && missing.count * 2 > missing.of;
}

function holdsAtLeast(values: readonly number[], last: number, wanted: number): boolean {
  let found = 0;
  for (let i = last; i >= 0 && found < wanted; i--) if (Number.isFinite(values[i]!)) found++;
  return found >= wanted;
}
