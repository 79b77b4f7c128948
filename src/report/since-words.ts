/**
 * The release review's sentences, shared by its text, markdown and JSON renderers. Plain text:
 * each renderer escapes metric names for its own target before they go in.
 */
import type { SinceMetric, SinceReport, SinceStep } from '../gate/since/since-report.js';
import { formatChange, formatNumber } from './format.js';

/** A ratio as a signed percent change: 1.083 -> "+8.3%". */
export const ratioText = (ratio: number | null): string => (ratio === null ? 'n/a' : formatChange(ratio - 1));

/** A p-value with two significant digits. */
export const pText = (p: number | null): string =>
  p === null ? 'n/a' : p < 1e-4 ? p.toExponential(1).replace('e+', 'e') : formatNumber(p, 2);

/** "+8.3% (95% CI +6.1% to +10.4%)" */
export function ratioWithInterval(m: SinceMetric, confidence: number): string {
  const interval =
    m.lower === null || m.upper === null
      ? ''
      : ` (${Math.round(confidence * 100)}% CI ${ratioText(m.lower)} to ${ratioText(m.upper)})`;
  return `${ratioText(m.ratio)}${interval}`;
}

/**
 * Where a step starts: "run 812-1 (sha 4f1c2ab, PR #123), 20 runs after the reference". Run id and
 * sha come from the history and pass `escape` (the target's escaping); the PR is a number.
 */
export function stepPlace(s: SinceStep, escape: (text: string) => string): string {
  const who = [s.sha ? `sha ${escape(s.sha.slice(0, 7))}` : undefined, s.pr === undefined ? undefined : `PR #${s.pr}`]
    .filter(Boolean)
    .join(', ');
  return `run ${escape(s.run)}${who ? ` (${who})` : ''}, ${s.offset} run${s.offset === 1 ? '' : 's'} after the reference`;
}

/** One sentence on a metric: what moved, how, and whether a mark explains it. */
export function metricSentence(m: SinceMetric, report: SinceReport): string {
  if (m.status === 'new') return 'no value at or before the reference: new since then.';
  if (m.status === 'gone') return 'no value after the reference: gone since then.';
  const level =
    m.status === 'unchanged'
      ? `level ${ratioText(m.ratio)}, within the noise (adjusted p ${pText(m.adjusted)})`
      : `level ${ratioWithInterval(m, report.settings.confidence)}, ${m.status} (adjusted p ${pText(m.adjusted)})`;
  const parts = [level];
  if (m.steps.length > 0) {
    parts.push(
      `${m.steps.length} step${m.steps.length === 1 ? '' : 's'} (${m.steps.map((s) => ratioText(s.ratio)).join(', ')})`,
    );
  }
  if (m.creep?.reported) parts.push(`creep ${formatChange(m.creep.slope)} per run`);
  const accepted = m.steps.filter((s) => s.mark?.reason === 'accepted').length;
  if (accepted > 0) parts.push(`${accepted} of the steps accepted`);
  return `${parts.join('; ')}.`;
}

/** The headline counts: "3 worse, 1 better, 12 unchanged". */
export function statusLine(report: SinceReport): string {
  const order = ['worse', 'better', 'unchanged', 'new', 'gone'] as const;
  const counts = order
    .map((s) => [s, report.metrics.filter((m) => m.status === s).length] as const)
    .filter(([, n]) => n > 0)
    .map(([s, n]) => `${n} ${s}`);
  return counts.join(', ') || 'no metrics';
}

/** The range reviewed; run ids, sha and times pass `escape`. */
export function rangeLine(report: SinceReport, escape: (text: string) => string): string {
  const ref = report.reference;
  const at = [ref.sha ? `sha ${ref.sha.slice(0, 7)}` : undefined, ref.time].filter(Boolean).join(', ');
  const latest = report.latest;
  return `since run ${escape(ref.run)}${at ? ` (${escape(at)})` : ''}: ${report.runs} run${report.runs === 1 ? '' : 's'} to ${escape(latest.run)}${latest.time ? ` (${escape(latest.time)})` : ''}`;
}

/** The limits a reader must keep in mind, once per report. */
export const EVIDENCE_NOTE =
  'Evidence, not proof: levels are medians of the runs around each point, steps and creep come from rank tests on noisy CI runs, and a change that came and went is not shown.';
