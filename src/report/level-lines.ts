import type { MetricResult, Report } from '../gate/report.js';
import { sinceText } from './reason.js';

const SHOWN = 10;

/**
 * "route/match-static: baseline since run 6101-1 (accepted in #2, 3 runs; spread from all 13)"
 * for each metric whose baseline starts at a level mark (an accepted merge, `bellgate mark`) and
 * whose reason line is not printed anyway (regressed and improved metrics carry it there), at
 * most SHOWN of them, then a count. Names pass through `clean` (the renderer's escaping).
 * @example levelLines(report, (t) => t) // ['time/parse: baseline since run 41-1 (accepted in #12, 3 runs; spread from all 60)']
 */
export function levelLines(report: Pick<Report, 'metrics'>, clean: (text: string) => string): string[] {
  const marked = report.metrics.filter(
    (m: MetricResult) =>
      m.status !== 'regressed' &&
      m.status !== 'improved' &&
      (m.baseline?.sinceReason === 'accepted' || m.baseline?.sinceReason === 'manual'),
  );
  const lines = marked.slice(0, SHOWN).map((m) => clean(`${m.name}: ${sinceText(m)}`));
  if (marked.length > SHOWN) lines.push(`and ${marked.length - SHOWN} more metrics with a level mark`);
  return lines;
}
