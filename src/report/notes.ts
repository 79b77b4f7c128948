import type { Report } from '../gate/report.js';
import { LEVEL_MIN_RUNS } from '../gate/judge.js';
import { mostlyMissing } from '../gate/missing-metrics.js';

/** Names listed in the "not judged" line before it only counts the rest. */
const NOT_JUDGED_LISTED = 10;

/**
 * The lines every rendering of a report opens with, before its verdict: the adapters' notes (the
 * history was not used, this run was not recorded), "N of M baseline metrics missing" when more
 * than half of them are, and the values this run did not judge. Plain, unescaped text: each
 * renderer escapes it for its medium (`clean` is applied to names and reasons from metric files).
 * @example reportNotes(report, (s) => s) // ['7 of 10 baseline metrics are missing from this run: ...']
 */
export function reportNotes(report: Report, clean: (text: string) => string): string[] {
  const lines = (report.notes ?? []).map(clean);
  if (mostlyMissing(report.missing)) {
    const { count, of } = report.missing!;
    lines.push(
      `${count} of ${of} baseline metrics are missing from this run: check that every benchmark ran and wrote its file`,
    );
  }
  const notJudged = report.notJudged ?? [];
  if (notJudged.length > 0) {
    const shown = notJudged.slice(0, NOT_JUDGED_LISTED).map((n) => `${clean(n.name)} (${clean(n.reason)})`);
    const more = notJudged.length - shown.length;
    lines.push(
      `${notJudged.length} value${notJudged.length === 1 ? '' : 's'} not judged nor recorded: ${shown.join(', ')}${more > 0 ? ` and ${more} more` : ''}`,
    );
  }
  const learning = learningLine(report);
  if (learning !== undefined) lines.push(learning);
  return lines;
}

/** The seeding hint of a learning report: what a new adopter can do instead of waiting. */
const SEED = 'record runs on the baseline branch, or seed the history with `bellgate import`';

/**
 * For a `learning` verdict: how many baseline runs the closest metric has and how many it needs
 * ("5 of the 8 baseline runs (min-runs) ... 3 more"), or that the history holds none yet.
 * Undefined for any other verdict.
 * @example learningLine(report) // 'learning: the baseline holds 5 runs; a metric is judged once it has 8 (min-runs): 3 more. ...'
 */
export function learningLine(report: Pick<Report, 'verdict' | 'metrics'>): string | undefined {
  if (report.verdict !== 'learning') return undefined;
  let best: { runs: number; minRuns: number; levelRuns?: number } | undefined;
  for (const m of report.metrics) {
    if (m.note?.kind !== 'learning') continue;
    const gap = (n: { runs: number; minRuns: number }) => n.minRuns - n.runs;
    if (best === undefined || gap(m.note) < gap(best)) best = m.note;
  }
  if (best === undefined)
    return report.metrics.some((m) => m.status === 'new')
      ? `learning: the history holds no runs of these metrics yet; ${SEED}`
      : undefined;
  if (best.runs >= best.minRuns && best.levelRuns !== undefined)
    return `learning: ${best.levelRuns} run${best.levelRuns === 1 ? '' : 's'} since a level change, and ${LEVEL_MIN_RUNS} are needed before it is judged; record runs on the baseline branch`;
  const more = best.minRuns - best.runs;
  return `learning: the baseline holds ${best.runs} run${best.runs === 1 ? '' : 's'}; a metric is judged once it has ${best.minRuns} (min-runs): ${more} more; ${SEED}`;
}
