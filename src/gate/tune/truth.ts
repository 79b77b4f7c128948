import type { History } from '../../history/history.js';
import type { RegressionLabel } from './labels.js';

/** Labels turned into lookups by run index: which alarms are real, and which labels an alarm catches. */
export interface Truth {
  /** Number of distinct labels (duplicates collapse). */
  count: number;
  /** run index -> 'run' when the whole run is labelled, else the labelled metric names. */
  byRun: Map<number, 'run' | Set<string>>;
}

/**
 * Indexes labels (already checked with checkLabels) by run. A whole-run label covers every metric
 * of that run; it wins over metric labels of the same run.
 * @example buildTruth(labels, history).count // 2
 */
export function buildTruth(labels: readonly RegressionLabel[], history: History): Truth {
  const indexOf = new Map(history.runs.map((run, i) => [run.id, i] as const));
  const byRun = new Map<number, 'run' | Set<string>>();
  for (const label of labels) {
    const i = indexOf.get(label.run);
    if (i === undefined) continue;
    const known = byRun.get(i);
    if (label.metric === undefined || known === 'run') {
      byRun.set(i, 'run');
      continue;
    }
    byRun.set(i, (known ?? new Set<string>()).add(label.metric));
  }
  let count = 0;
  for (const v of byRun.values()) count += v === 'run' ? 1 : v.size;
  return { count, byRun };
}

/** Whether an alarm of `metric` in run `run` is a labelled (real) regression. */
export function isLabelled(truth: Truth | undefined, run: number, metric: string): boolean {
  const labelled = truth?.byRun.get(run);
  return labelled === 'run' || (labelled !== undefined && labelled.has(metric));
}
