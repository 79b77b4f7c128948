/**
 * One error annotation per regressed metric and one notice per improved one, so the reviewer sees
 * them on the run page without opening the log. Messages name the metric, the move and the cutoff.
 */
import type { MetricResult, Report } from '../gate/report.js';
import type { ActionSink } from './sink.js';

function line(m: MetricResult): string {
  const parts: string[] = [];
  if (m.value !== undefined) parts.push(`value ${m.value}${m.unit ? ` ${m.unit}` : ''}`);
  if (m.baseline) parts.push(`baseline ${m.baseline.mean} ± ${m.baseline.sd} (n=${m.baseline.n})`);
  if (m.change !== undefined) parts.push(`change ${(m.change * 100).toFixed(1)}%`);
  if (m.relativeDensity !== undefined) parts.push(`relative density ${m.relativeDensity.toPrecision(3)} vs cutoff ${m.cutoff}`);
  return `${m.reason}${parts.length ? ` (${parts.join(', ')})` : ''}`;
}

/**
 * Emits the annotations of a report; returns how many of each were written.
 * @example annotate(report, sink) // { errors: 1, notices: 0 }
 */
export function annotate(report: Report, sink: Pick<ActionSink, 'error' | 'notice'>, series: string): { errors: number; notices: number } {
  let errors = 0;
  let notices = 0;
  for (const m of report.metrics) {
    if (m.status === 'regressed') {
      sink.error(line(m), { title: `bellgate [${series}]: ${m.name} regressed` });
      errors += 1;
    } else if (m.status === 'improved') {
      sink.notice(line(m), { title: `bellgate [${series}]: ${m.name} improved` });
      notices += 1;
    }
  }
  return { errors, notices };
}
