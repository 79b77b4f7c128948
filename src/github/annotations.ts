/**
 * One error annotation per regressed metric and one notice per improved one, so the reviewer sees
 * them on the run page without opening the log. Messages name the metric, the move and the cutoff.
 */
import type { MetricResult, Report } from '../gate/report.js';
import { formatBaseline } from '../report/cells.js';
import { cleanText } from '../report/clean.js';
import { formatAgainstCutoff, formatChange, formatValue } from '../report/format.js';
import { fullReason } from '../report/reason.js';
import type { ActionSink } from './sink.js';

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

/**
 * Emits the annotations of a report; returns how many of each were written.
 * @example annotate(report, sink) // { errors: 1, notices: 0 }
 */
export function annotate(
  report: Report,
  sink: Pick<ActionSink, 'error' | 'notice'>,
  series: string,
): { errors: number; notices: number } {
  let errors = 0;
  let notices = 0;
  for (const m of report.metrics) {
    if (m.status === 'regressed') {
      sink.error(line(m, report), { title: `bellgate [${cleanText(series)}]: ${cleanText(m.name)} regressed` });
      errors += 1;
    } else if (m.status === 'improved') {
      sink.notice(line(m, report), { title: `bellgate [${cleanText(series)}]: ${cleanText(m.name)} improved` });
      notices += 1;
    }
  }
  return { errors, notices };
}
