/**
 * One annotation per flagged metric, so the reviewer sees them on the run page without opening
 * the log: an error per regressed metric (a notice when the regression is accepted: the step
 * passes, so nothing on the page should read as a failure) and a notice per improved one.
 * GitHub shows at most 10 annotations of a kind per step, and the verdict's own annotation is
 * written first: so at most 9 per-metric ones of a kind follow, the last slot saying "and N more"
 * when there are more. Messages name the metric, the move and the cutoff.
 */
import type { MetricResult, Report } from '../gate/report.js';
import { formatBaseline } from '../report/cells.js';
import { cleanText } from '../report/clean.js';
import { formatAgainstCutoff, formatChange, formatValue } from '../report/format.js';
import { fullReason } from '../report/reason.js';
import type { ActionSink } from './sink.js';

/** Annotations of one kind GitHub shows per step (docs: "Workflow commands", annotation limits). */
export const ANNOTATIONS_SHOWN = 10;

// Names and units come from metric files (or a history they filled): shown through cleanText, so
// control and bidirectional-override characters never reach the run page.
function line(m: MetricResult, report: Report): string {
  const unit = m.unit === undefined ? undefined : cleanText(m.unit);
  const parts: string[] = [];
  if (m.value !== undefined) parts.push(`value ${formatValue(m.value, unit)}`);
  if (m.baseline) parts.push(`baseline ${formatBaseline(m.baseline, unit)}`);
  if (m.change !== undefined) parts.push(`change ${formatChange(m.change)}`);
  if (m.relativeDensity !== undefined)
    parts.push(`relative density ${formatAgainstCutoff(m.relativeDensity, m.effectiveCutoff ?? m.cutoff)}`);
  return `${cleanText(fullReason(m, report), 2000)}${parts.length ? ` (${parts.join(', ')})` : ''}`;
}

type Kind = 'error' | 'notice';

/**
 * Emits the per-metric annotations of a report, after the `used` annotations of each kind that
 * were already written (the verdict's), so that no kind passes ANNOTATIONS_SHOWN. Returns how
 * many of each were written.
 * @example annotate(report, sink, 'ci', { error: 1, notice: 0 }) // { errors: 1, notices: 0 }
 */
export function annotate(
  report: Report,
  sink: Pick<ActionSink, 'error' | 'notice'>,
  series: string,
  used: Record<Kind, number> = { error: 0, notice: 0 },
): { errors: number; notices: number } {
  const accepted = report.verdict === 'accepted';
  const regressed = report.metrics.filter((m) => m.status === 'regressed');
  const improved = report.metrics.filter((m) => m.status === 'improved');
  const byKind: Record<Kind, { m: MetricResult; word: string }[]> = { error: [], notice: [] };
  for (const m of regressed)
    byKind[accepted ? 'notice' : 'error'].push({ m, word: accepted ? 'regressed (accepted)' : 'regressed' });
  for (const m of improved) byKind.notice.push({ m, word: 'improved' });
  const written: Record<Kind, number> = { error: 0, notice: 0 };
  const who = `bellgate [${cleanText(series)}]`;
  for (const kind of ['error', 'notice'] as const) {
    const all = byKind[kind];
    const room = Math.max(0, ANNOTATIONS_SHOWN - used[kind]);
    // Every one fits, or all but the last slot, which counts the rest.
    const shown = all.length <= room ? all : all.slice(0, Math.max(0, room - 1));
    for (const { m, word } of shown) sink[kind](line(m, report), { title: `${who}: ${cleanText(m.name)} ${word}` });
    written[kind] = shown.length;
    const rest = all.length - shown.length;
    if (rest > 0 && room > 0) {
      const names = all
        .slice(shown.length, shown.length + 5)
        .map(({ m }) => cleanText(m.name, 80))
        .join(', ');
      sink[kind](`${names}${rest > 5 ? ', …' : ''}: see the job summary for every metric`, {
        title: `${who}: and ${rest} more metric${rest === 1 ? '' : 's'} ${kind === 'error' ? 'regressed' : 'flagged'}`,
      });
      written[kind] += 1;
    }
  }
  return { errors: written.error, notices: written.notice };
}
