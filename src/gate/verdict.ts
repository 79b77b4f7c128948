import type { MetricResult, SharedMoveResult, Status, Verdict } from './report.js';

/**
 * The run's verdict (README.md "How the decision works"): `regressed` when any metric regressed
 * (`accepted` instead when the pull request carries the accept label); else `unsettled` when a
 * shared move is beyond what the history has shown; `learning` when no metric had enough history
 * to be judged; otherwise `pass`.
 * @example decideVerdict([{ status: 'ok' }], [], false) // 'pass'
 */
export function decideVerdict(
  metrics: readonly Pick<MetricResult, 'status'>[],
  shared: readonly Pick<SharedMoveResult, 'status'>[],
  accepted: boolean,
): Verdict {
  if (metrics.some((m) => m.status === 'regressed')) return accepted ? 'accepted' : 'regressed';
  if (shared.some((s) => s.status === 'unsettled')) return 'unsettled';
  return metrics.some((m) => JUDGED.has(m.status)) ? 'pass' : 'learning';
}

/** Statuses that mean the metric had enough history to be judged. */
const JUDGED: ReadonlySet<Status> = new Set<Status>(['ok', 'regressed', 'improved']);

const RANK: Readonly<Record<Status, number>> = {
  regressed: 0,
  improved: 1,
  ok: 2,
  learning: 2,
  new: 2,
  missing: 2,
  ignored: 2,
};

/**
 * Report order: regressed first, then improved, then the rest, each by name (code-unit order,
 * the same on every machine). Returns a new array.
 * @example orderMetrics(results).map((m) => m.status) // ['regressed', 'improved', 'ok', 'new']
 */
export function orderMetrics<T extends Pick<MetricResult, 'status' | 'name'>>(metrics: readonly T[]): T[] {
  return [...metrics].sort(
    (a, b) => RANK[a.status] - RANK[b.status] || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0),
  );
}
