import type { SinceMetric, SinceReport } from '../gate/since/since-report.js';
import { escapeMarkdown } from './escape.js';
import { formatChange, formatValue } from './format.js';
import { MARKDOWN_LIMIT } from './markdown.js';
import { noteworthy, sinceOrder } from './since-order.js';
import { EVIDENCE_NOTE, pText, rangeLine, ratioText, ratioWithInterval, statusLine, stepPlace } from './since-words.js';

const HEAD =
  '| metric | status | then | now | change | adj. p | steps | creep per run |\n|---|---|---|---|---|---|---|---|';
const BUDGET = MARKDOWN_LIMIT - 2_000;

function row(m: SinceMetric, report: SinceReport): string {
  const unit = m.unit === undefined ? undefined : escapeMarkdown(m.unit, 20);
  const creep = m.creep?.reported ? formatChange(m.creep.slope) : '—';
  const steps =
    m.steps.length === 0 ? '—' : m.steps.map((s) => `${ratioText(s.ratio)} @ ${escapeMarkdown(s.run, 40)}`).join(', ');
  const status = m.status === 'worse' ? '**worse**' : m.status;
  return `| ${escapeMarkdown(m.name)} | ${status} | ${formatValue(m.then?.level, unit)} | ${formatValue(m.now?.level, unit)} | ${m.ratio === null ? 'n/a' : ratioWithInterval(m, report.settings.confidence)} | ${pText(m.adjusted)} | ${steps} | ${creep} |`;
}

function stepLines(m: SinceMetric): string[] {
  const lines = m.steps.map((s) => {
    const mark = s.mark ? ` — ${s.mark.reason}${s.mark.pr === undefined ? '' : ` in #${s.mark.pr}`}` : '';
    return `- **${escapeMarkdown(m.name)}** step ${ratioText(s.ratio)} at ${stepPlace(s, (t) => escapeMarkdown(t, 40))} (p ${pText(s.p)})${mark}`;
  });
  for (const a of m.accepted) {
    if (m.steps.some((s) => s.mark === a)) continue;
    lines.push(
      `- **${escapeMarkdown(m.name)}** ${a.reason} at run ${escapeMarkdown(a.run, 40)}${a.pr === undefined ? '' : ` (#${a.pr})`}: no step found there`,
    );
  }
  return lines;
}

/**
 * The release review for release notes and the job summary: a headline with the counts, the
 * range and how the reference was matched, a table of the metrics with something to tell, the
 * steps with their first run, commit and pull request (and the accepted marks), the quiet
 * metrics folded in a `<details>` table, and the evidence note. Metric names, units and run ids
 * pass escapeMarkdown; PR numbers are numbers (GitHub links them). Stays under GitHub's
 * 65,536-character limit by cutting rows with a note. `notes` (how the caller found the
 * reference, where the review ends) open the review, escaped.
 * @example renderSinceMarkdown(report).startsWith('### Bellgate release review') // true
 */
export function renderSinceMarkdown(report: SinceReport, options: { notes?: readonly string[] } = {}): string {
  const out = [
    `### Bellgate release review: ${statusLine(report)}`,
    `Series ${escapeMarkdown(report.series)}, ${rangeLine(report, (t) => escapeMarkdown(t, 60))}.`,
  ];
  for (const note of options.notes ?? []) out.push(`> ${escapeMarkdown(note, 500)}.`);
  if (report.reference.note) out.push(`> ${escapeMarkdown(report.reference.note, 500)}.`);
  const ordered = sinceOrder(report.metrics);
  const told = ordered.filter(noteworthy);
  const quiet = ordered.filter((m) => !noteworthy(m));
  let room = BUDGET;
  const take = (lines: string[], what: string): string => {
    const kept: string[] = [];
    for (const [i, l] of lines.entries()) {
      if (room - l.length - 1 < 300) {
        kept.push(`\n_…and ${lines.length - i} more ${what} not shown (size limit); see the JSON report._`);
        break;
      }
      kept.push(l);
      room -= l.length + 1;
    }
    return kept.join('\n');
  };
  if (told.length > 0) {
    out.push(
      '',
      `${HEAD}\n${take(
        told.map((m) => row(m, report)),
        'metrics',
      )}`,
    );
    const steps = told.flatMap(stepLines);
    if (steps.length > 0) out.push('', take(steps, 'steps'));
  } else {
    out.push('', 'No metric changed level, stepped or crept in this range.');
  }
  if (quiet.length > 0) {
    out.push(
      '',
      `<details><summary>${quiet.length} other metric${quiet.length === 1 ? '' : 's'}</summary>\n\n${HEAD}\n${take(
        quiet.map((m) => row(m, report)),
        'metrics',
      )}\n\n</details>`,
    );
  }
  out.push('', `<sub>${EVIDENCE_NOTE}</sub>`);
  return out.join('\n') + '\n';
}
