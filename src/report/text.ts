import pc from 'picocolors';
import type { GroupResult, MetricResult, Report, Status } from '../gate/report.js';
import { cleanText } from './clean.js';
import { metricCells } from './cells.js';
import { formatSigma } from './format.js';
import { STATUS_GLYPH, statusCounts, statusRank, VERDICT_HEADLINE } from './status.js';

type Colors = ReturnType<typeof pc.createColors>;

/** Names are capped shorter in a terminal table than elsewhere, so a row fits a wide terminal. */
const TEXT_NAME_MAX = 80;
const JUDGED: ReadonlySet<Status> = new Set<Status>(['regressed', 'improved', 'ok']);
const LISTED: readonly Status[] = ['missing', 'learning', 'new', 'ignored'];

function paint(c: Colors, s: Status, text: string): string {
  if (s === 'regressed') return c.red(c.bold(text));
  if (s === 'improved') return c.green(text);
  if (s === 'missing') return c.yellow(text);
  if (s === 'ok') return text;
  return c.dim(text);
}

function padEnd(s: string, width: number): string {
  return s + ' '.repeat(Math.max(0, width - Array.from(s).length));
}

function groupLine(g: GroupResult): string {
  const top = [...g.members]
    .sort((a, b) => b.share - a.share)
    .slice(0, 3)
    .map((m) => `${cleanText(m.name, TEXT_NAME_MAX)} (${Math.round(m.share * 100)}%, own ${formatSigma(m.ownZ)})`);
  return `group ${cleanText(g.name, TEXT_NAME_MAX)}: ${g.status} — common move ${formatSigma(g.common.z)} (${g.common.status}); main contributors: ${top.join(', ') || 'none'}`;
}

/**
 * The terminal report: a headline (verdict and counts), a table of judged metrics (regressed and
 * improved first) with the reason under each flagged one, one line per group, then one line per
 * learning/new/missing/ignored set. Colour (picocolors) only when `color` is true; status words are
 * always printed, so the report reads the same without colour. Every name passes cleanText, so a
 * metric file cannot send terminal escape sequences.
 * @example renderText(report, { color: false }).split('\n')[0] // 'Bellgate — series "ci": pass — ...'
 */
export function renderText(report: Report, options: { color: boolean }): string {
  const c = pc.createColors(options.color);
  const lines: string[] = [];
  const verdictWord = report.verdict === 'regressed' ? c.red(c.bold('REGRESSED')) : c.bold(report.verdict.toUpperCase());
  lines.push(`Bellgate — series "${cleanText(report.series, TEXT_NAME_MAX)}": ${verdictWord}`);
  lines.push(`${VERDICT_HEADLINE[report.verdict]}; ${statusCounts(report.metrics.map((m) => m.status)) || 'no metrics'}.`);

  const judged = report.metrics
    .filter((m) => JUDGED.has(m.status))
    .sort((a, b) => statusRank(a.status) - statusRank(b.status));
  if (judged.length > 0) {
    const head = ['status', 'metric', 'this run', 'baseline', 'change', 'sigma', 'rel. density vs cutoff'];
    const rows = judged.map((m) => {
      const cells = metricCells(m, m.unit === undefined ? undefined : cleanText(m.unit, 20));
      return [`${STATUS_GLYPH[m.status]} ${m.status}`, cleanText(m.name, TEXT_NAME_MAX), cells.value, cells.baseline, cells.change, cells.sigma, cells.density];
    });
    const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => Array.from(r[i] ?? '').length)));
    lines.push('');
    lines.push(c.bold(head.map((h, i) => padEnd(h, widths[i] ?? 0)).join('  ').trimEnd()));
    judged.forEach((m, k) => {
      const row = rows[k] ?? [];
      const text = row.map((cell, i) => padEnd(cell, widths[i] ?? 0)).join('  ').trimEnd();
      lines.push(paint(c, m.status, text));
      if (m.status !== 'ok') lines.push(`    ${cleanText(m.reason, 400)}`);
    });
  }

  if (report.groups.length > 0) lines.push('');
  for (const g of report.groups) lines.push(paint(c, g.status, groupLine(g)));

  const listed = LISTED.map((s) => [s, report.metrics.filter((m) => m.status === s)] as const).filter(([, ms]) => ms.length > 0);
  if (listed.length > 0) lines.push('');
  for (const [s, ms] of listed) lines.push(paint(c, s, `${STATUS_GLYPH[s]} ${s} (${ms.length}): ${ms.map((m: MetricResult) => cleanText(m.name, TEXT_NAME_MAX)).join(', ')}`));
  return lines.join('\n') + '\n';
}
