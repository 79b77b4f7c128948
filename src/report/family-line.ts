import type { Report } from '../gate/report.js';
import { formatShare } from './reason.js';

/**
 * The sentence every report carries about family control (issue 13 item 5): with it on, the
 * chance of any false alarm in the run was held at the budget on the worse side; with it off,
 * each metric was judged by its own cutoff.
 * @example familyLine({ family: 'holm', budget: 0.01 }) // 'family control: holm holds the chance of any false alarm in this run at 1% ...'
 */
export function familyLine(report: Pick<Report, 'family' | 'budget' | 'metrics'>): string {
  if (report.family === 'none')
    return 'family control: none — each metric is judged by its own cutoff on the relative density.';
  const judged = report.metrics.filter((m) => m.adjusted !== undefined).length;
  const goal =
    report.family === 'fdr'
      ? 'the expected share of false alarms among the flagged metrics'
      : 'the chance of any false alarm in this run';
  return `family control: ${report.family} holds ${goal} at ${formatShare(report.budget)} on the worse side, over ${judged} judged metric${judged === 1 ? '' : 's'}.`;
}
