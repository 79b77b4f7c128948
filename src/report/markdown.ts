import type { GroupResult, MetricResult, Report, Status } from '../gate/report.js';
import { metricCells } from './cells.js';
import { escapeMarkdown } from './escape.js';
import { formatSigma, formatValue } from './format.js';
import { markerLine } from './marker.js';
import { reportNotes } from './notes.js';
import { sparkline } from './sparkline.js';
import { STATUS_GLYPH, statusCounts, statusRank, VERDICT_HEADLINE } from './status.js';

/** GitHub rejects comment bodies over 65,536 characters; stay well under with room for the footer. */
export const MARKDOWN_LIMIT = 65_536;
const BUDGET = MARKDOWN_LIMIT - 2_000;
const FLAGGED: ReadonlySet<Status> = new Set<Status>(['regressed', 'improved']);
const HEAD =
  '| status | metric | baseline (mean ± sd) | this run | change | sigma | rel. density vs cutoff |\n|---|---|---|---|---|---|---|';

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
  return `| ${status} | ${escapeMarkdown(m.name)} | ${c.baseline} | ${c.value} | ${c.change} | ${c.sigma} | ${c.density.replace('<', '&lt;')} |`;
}

function picture(m: MetricResult): string {
  const recent = m.recent ?? [];
  const line = sparkline(recent, m.value);
  const unit = m.unit === undefined ? undefined : escapeMarkdown(m.unit, 20);
  const shown = line
    ? `\`${line}\` ${recent.length} baseline runs → this run ${formatValue(m.value, unit)}`
    : `this run ${formatValue(m.value, unit)}`;
  return `- **${escapeMarkdown(m.name)}** ${shown}. ${escapeMarkdown(m.reason, 500)}`;
}

function groupLine(g: GroupResult): string {
  const top = [...g.members]
    .sort((a, b) => b.share - a.share)
    .slice(0, 3)
    .map((m) => `${escapeMarkdown(m.name)} ${Math.round(m.share * 100)}% (own ${formatSigma(m.ownZ)})`);
  return `- group **${escapeMarkdown(g.name)}**: ${g.status} — common move ${formatSigma(g.common.z)} (${g.common.status}); main contributors: ${top.join(', ') || 'none'}. ${escapeMarkdown(g.reason, 500)}`;
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
    add(fit(flagged.map(picture), room / 2, 'pictures').text);
  }
  if (report.groups.length > 0) {
    add('');
    add(fit(report.groups.map(groupLine), room / 2, 'groups').text);
  }
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
    '<sub>Reported by Bellgate: a metric is flagged when its relative density under the baseline fit falls below its cutoff on its worse side.</sub>',
  );
  return out.join('\n') + '\n';
}
