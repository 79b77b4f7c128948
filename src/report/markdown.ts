import type { MetricResult, Report, SharedMoveResult, Status } from '../gate/report.js';
import { metricCells } from './cells.js';
import { escapeMarkdown } from './escape.js';
import { familyLine } from './family-line.js';
import { formatValue } from './format.js';
import { markerLine } from './marker.js';
import { reportNotes } from './notes.js';
import { sparkline } from './sparkline.js';
import { levelLines } from './level-lines.js';
import { fullReason, sharedReason } from './reason.js';
import { GLYPH_LEGEND, STATUS_GLYPH, statusCounts, statusRank, VERDICT_HEADLINE } from './status.js';

/** GitHub rejects comment bodies over 65,536 characters; stay well under with room for the footer. */
export const MARKDOWN_LIMIT = 65_536;
const BUDGET = MARKDOWN_LIMIT - 2_000;
const FLAGGED: ReadonlySet<Status> = new Set<Status>(['regressed', 'improved']);
const HEAD =
  '| status | metric | baseline (mean ± sd) | this run | change | own move | sigma | rel. density vs cutoff | detectable |\n|---|---|---|---|---|---|---|---|---|';

export interface MarkdownOptions {
  /** Hidden marker put in an HTML comment on the first line (see commentMarker). */
  marker?: string;
  runUrl?: string;
  htmlReportUrl?: string;
}

function row(m: MetricResult): string {
  const unit = m.unit === undefined ? undefined : escapeMarkdown(m.unit, 20);
  const c = metricCells(m, unit);
  const status = FLAGGED.has(m.status)
    ? `${STATUS_GLYPH[m.status]} **${m.status}**`
    : `${STATUS_GLYPH[m.status]} ${m.status}`;
  return `| ${status} | ${escapeMarkdown(m.name)} | ${c.baseline} | ${c.value} | ${c.change} | ${c.own} | ${c.sigma} | ${c.density.replace('<', '&lt;')} | ${c.detectable} |`;
}

function picture(m: MetricResult, report: Report): string {
  const recent = m.recent ?? [];
  const line = sparkline(recent, m.value);
  const unit = m.unit === undefined ? undefined : escapeMarkdown(m.unit, 20);
  const shown = line
    ? `\`${line}\` ${recent.length} baseline runs → this run ${formatValue(m.value, unit)}`
    : `this run ${formatValue(m.value, unit)}`;
  return `- **${escapeMarkdown(m.name)}** ${shown}. ${escapeMarkdown(fullReason(m, report), 800)}`;
}

function sharedLine(s: SharedMoveResult): string {
  const mark = s.status === 'unsettled' ? '⚠ **unsettled**' : s.status;
  return `- shared move of **${escapeMarkdown(s.name)}**: ${mark} — ${escapeMarkdown(sharedReason(s), 800)}`;
}

/** Take lines while they fit in `room` characters; say how many were left out. */
function fit(lines: string[], room: number, what: string): { text: string; used: number } {
  const kept: string[] = [];
  let used = 0;
  for (const [i, l] of lines.entries()) {
    if (used + l.length + 1 > room - 200) {
      kept.push(`\n_…and ${lines.length - i} more ${what} not shown (comment size limit); see the JSON report._`);
      break;
    }
    kept.push(l);
    used += l.length + 1;
  }
  const text = kept.join('\n');
  return { text, used: text.length };
}

const isWebUrl = (u: string | undefined): u is string => u !== undefined && /^https?:\/\/[^\s<>()[\]"'`]+$/.test(u);

/**
 * The PR comment and job summary: optional hidden marker, a one-line verdict, a table of flagged
 * metrics with a sparkline of each one's recent baseline and this run, the groups' findings, and
 * every other metric in a collapsed `<details>` table; links to the run and HTML report when given;
 * a footer naming Bellgate. Every metric-file string passes escapeMarkdown. The body stays under
 * GitHub's 65,536-character limit by cutting table rows with a note.
 * @example renderMarkdown(report, { marker: commentMarker('ci') }).startsWith('<!-- bellgate:series=ci -->') // true
 */
export function renderMarkdown(report: Report, options: MarkdownOptions = {}): string {
  const out: string[] = [];
  if (options.marker !== undefined) out.push(markerLine(options.marker));
  // What the reader must know before the verdict (the history was not used, metrics missing).
  for (const note of reportNotes(report, (t) => t)) out.push(`> **Note:** ${escapeMarkdown(note, 2000)}`, '');
  const counts = statusCounts(report.metrics.map((m) => m.status)) || 'no metrics';
  out.push(`### Bellgate: **${report.verdict}** — ${counts}`);
  out.push(`Verdict ${report.verdict}: ${VERDICT_HEADLINE[report.verdict]} (series ${escapeMarkdown(report.series)}).`);
  let room = BUDGET - out.join('\n').length;

  const sorted = [...report.metrics].sort((a, b) => statusRank(a.status) - statusRank(b.status));
  const flagged = sorted.filter((m) => FLAGGED.has(m.status));
  const rest = sorted.filter((m) => !FLAGGED.has(m.status));
  const add = (text: string): void => {
    out.push(text);
    room -= text.length + 1;
  };
  if (flagged.length > 0) {
    add('');
    add(`${HEAD}\n${fit(flagged.map(row), room / 2, 'flagged metrics').text}`);
    add('');
    add(
      fit(
        flagged.map((m) => picture(m, report)),
        room / 2,
        'pictures',
      ).text,
    );
    add(`<sub>${GLYPH_LEGEND}</sub>`);
  }
  const levels = levelLines(report, (t) => `- ${escapeMarkdown(t, 800)}`);
  if (levels.length > 0) add(`\n${levels.join('\n')}`);
  add('');
  add(familyLine(report));
  if (report.shared.length > 0) add(fit(report.shared.map(sharedLine), room / 2, 'shared moves').text);
  if (rest.length > 0) {
    add('');
    add(
      `<details><summary>${rest.length} other metric${rest.length === 1 ? '' : 's'}: ${statusCounts(rest.map((m) => m.status))}</summary>\n`,
    );
    add(`${HEAD}\n${fit(rest.map(row), room, 'metrics').text}\n\n</details>`);
  }
  const links: string[] = [];
  if (isWebUrl(options.runUrl)) links.push(`[workflow run](${options.runUrl})`);
  if (isWebUrl(options.htmlReportUrl)) links.push(`[full HTML report](${options.htmlReportUrl})`);
  out.push('');
  if (links.length > 0) out.push(links.join(' · '));
  out.push(
    "<sub>Reported by Bellgate: each metric is judged on its own move beside the run's shared move, against the predictive distribution of its baseline, on its worse side.</sub>",
  );
  return out.join('\n') + '\n';
}
