import type { SinceMetric } from '../gate/since/since-report.js';

const RANK = { worse: 0, better: 1, unchanged: 2, new: 3, gone: 4 } as const;

/** Whether a metric has anything to tell: a changed level, a step or a reported creep. */
export const noteworthy = (m: SinceMetric): boolean =>
  m.status === 'worse' || m.status === 'better' || m.steps.length > 0 || m.creep?.reported === true;

/** Worse first, then better, then the rest; noteworthy before quiet within each; input order kept otherwise. */
export function sinceOrder(metrics: readonly SinceMetric[]): SinceMetric[] {
  return metrics
    .map((m, i) => ({ m, i }))
    .sort(
      (a, b) => RANK[a.m.status] - RANK[b.m.status] || Number(noteworthy(b.m)) - Number(noteworthy(a.m)) || a.i - b.i,
    )
    .map(({ m }) => m);
}
