import type { MetricResult, Report } from '../gate/report.js';
import type { SinceReport } from '../gate/since/since-report.js';
import type { History } from '../history/history.js';
import { metricCells } from './cells.js';
import { reportNotes } from './notes.js';
import { escapeHtml } from './escape.js';
import { familyLine } from './family-line.js';
import { baselinePoints, chartColumn, columnPoints } from './html-data.js';
import { baselineHistogram } from './html-histogram.js';
import { historyChart } from './html-history-chart.js';
import { HTML_SCRIPT } from './html-script.js';
import { sinceSection } from './html-since.js';
import { HTML_STYLE } from './html-style.js';
import { fullReason, sharedReason } from './reason.js';
import { STATUS_GLYPH, statusCounts, statusRank, VERDICT_HEADLINE } from './status.js';

export interface HtmlReportInput {
  report: Report;
  history: History;
  title?: string;
  /** Shown in the footer; passed in because renderers never read the clock. */
  generatedAt?: string;
  /** A release review of the same history (`bellgate report --since REF`): drawn as its own section. */
  since?: { report: SinceReport; history: History };
}

// No network at all: the page may only use its own inline style and script, and data: images.
const CSP = "default-src 'none'; style-src 'unsafe-inline'; script-src 'unsafe-inline'; img-src data:";
const COLUMNS = [
  'status',
  'metric',
  'this run',
  'baseline (mean ± sd)',
  'change',
  'sigma',
  'rel. density vs cutoff',
  'detectable',
];
const NUMERIC = new Set([2, 4, 5, 6, 7]);
const LEGEND =
  '<p class="legend">Charts: dots are baseline-branch runs; the shaded band is where the fitted density stays above ' +
  'the cutoff; the dashed line is the fitted mean; this run is the large mark (▲ the worse side, regressed; ▼ the better side, improved; ● ok). ' +
  'Histograms show the baseline runs, the fitted density and the cutoff (dashed).</p>';

const sortAttr = (x: number | undefined): string => (x !== undefined && Number.isFinite(x) ? ` data-sort="${x}"` : '');

function summaryRow(m: MetricResult, i: number): string {
  const c = metricCells(m, m.unit === undefined ? undefined : escapeHtml(m.unit, 40));
  return (
    `<tr class="s-${m.status}"><td data-sort="${statusRank(m.status)}">${STATUS_GLYPH[m.status]} ${m.status}</td>` +
    `<td class="name"><a href="#m${i}">${escapeHtml(m.name, 300)}</a></td>` +
    `<td class="num"${sortAttr(m.value)}>${c.value}</td><td class="num">${c.baseline}</td>` +
    `<td class="num"${sortAttr(m.change)}>${c.change}</td><td class="num"${sortAttr(m.z)}>${c.sigma}</td>` +
    `<td class="num"${sortAttr(m.relativeDensity)}>${escapeHtml(c.density)}</td>` +
    `<td class="num"${sortAttr(m.detectable)}>${escapeHtml(c.detectable)}</td></tr>`
  );
}

function metricSection(m: MetricResult, i: number, history: History, report: Report): string {
  const column = chartColumn(history, m);
  const baseValues = baselinePoints(columnPoints(column, history.runs), m).map((p) => p.value);
  // A chart whose coordinates overflowed (values near the largest double) is left out, not drawn wrong.
  const cutoff = m.effectiveCutoff ?? m.cutoff;
  const charts = [historyChart(m, column, history.runs, cutoff), baselineHistogram(m, baseValues, cutoff)]
    .filter((s) => s !== '')
    .map((s) =>
      /\bNaN\b|Infinity/.test(s) ? '<p class="note-text">This chart cannot be drawn for these values.</p>' : s,
    );
  const unit = m.unit === undefined ? '' : ` <span class="meta">(${escapeHtml(m.unit, 40)})</span>`;
  const reason = escapeHtml(fullReason(m, report), 1500).replace(/([^.!?])$/, '$1.');
  const scale = m.baseline?.scale === 'log' ? ' Fitted on the log scale.' : '';
  const judged =
    m.z === undefined
      ? ''
      : ' Judged on its own move by the predictive Student-t of its own moves, whose tails are fitted to the history (heavier than the Gaussian band drawn).';
  const ratio =
    m.baseline?.relativeTo !== undefined
      ? ` Judged beside the move of ${escapeHtml(m.baseline.relativeTo, 300)} in the same run.`
      : '';
  return (
    `<section class="metric" id="m${i}"><h2><span class="s-${m.status}">${STATUS_GLYPH[m.status]} ${m.status}</span> ${escapeHtml(m.name, 300)}${unit}</h2>` +
    `<p class="reason">${reason}${scale}${ratio}${judged}</p>` +
    (charts.length > 0
      ? `<div class="charts">${charts.join('')}</div>`
      : '<p class="note-text">No values to draw yet.</p>') +
    '</section>'
  );
}

/**
 * One self-contained HTML page for a report and its history: a summary table of all metrics by
 * status (sortable by its headers when JavaScript runs; readable without), then per metric an SVG
 * of its history with the fitted mean, the band where the relative density stays above the cutoff
 * (mean ± sqrt(-2 ln cutoff) sd; on the log scale when the fit was) and this run, and an SVG
 * histogram of the baseline with the fitted density and the cutoff. Inline CSS, SVG and script
 * only, under a Content-Security-Policy that forbids any network access. Everything from metric
 * files is escaped.
 * @example renderHtmlReport({ report, history }).startsWith('<!doctype html>') // true
 */
export function renderHtmlReport(input: HtmlReportInput): string {
  const { report, history } = input;
  const title = escapeHtml(input.title ?? `Bellgate report: ${report.series}`, 300);
  const order = report.metrics
    .map((m, i) => ({ m, i }))
    .sort((a, b) => statusRank(a.m.status) - statusRank(b.m.status) || a.i - b.i);
  const head = COLUMNS.map(
    (c, k) => `<th scope="col"${NUMERIC.has(k) ? ' class="num"' : ''}><button type="button">${c}</button></th>`,
  );
  const shared = report.shared.map(
    (g) =>
      `<li><span class="s-${g.status === 'unsettled' ? 'regressed' : 'ok'}">${g.status}</span> shared move of ` +
      `<strong>${escapeHtml(g.name, 300)}</strong>: ${escapeHtml(sharedReason(g), 1500)}</li>`,
  );
  const verdictClass = report.verdict === 'regressed' ? 'regressed' : 'ok';
  const counts = statusCounts(report.metrics.map((m) => m.status)) || 'no metrics';
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${CSP}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${title}</title><style>${HTML_STYLE}</style></head><body>`,
    `<header><h1>${title}</h1><p class="meta">series ${escapeHtml(report.series, 300)} · ` +
      `${history.runs.length} runs in the history · ${escapeHtml(familyLine(report))}</p>`,
    ...reportNotes(report, (t) => t).map((note) => `<p class="report-note">${escapeHtml(note, 2000)}</p>`),
    `<p class="verdict"><strong class="s-${verdictClass}">${report.verdict}</strong> — ` +
      `${escapeHtml(VERDICT_HEADLINE[report.verdict])}. ${counts}.</p></header>`,
    '<main><table id="summary"><caption class="meta">All metrics, regressions first. Click a header to sort.</caption>',
    `<thead><tr>${head.join('')}</tr></thead><tbody>${order.map(({ m, i }) => summaryRow(m, i)).join('')}</tbody></table>`,
    shared.length > 0 ? `<h2>Shared moves</h2><ul>${shared.join('')}</ul>` : '',
    LEGEND,
    order.map(({ m, i }) => metricSection(m, i, history, report)).join(''),
    input.since ? sinceSection(input.since.report, input.since.history) : '',
    `</main><footer>Generated by Bellgate${input.generatedAt ? ` at ${escapeHtml(input.generatedAt, 100)}` : ''}. ` +
      `Schema ${escapeHtml(report.schema)}.</footer>`,
    `<script>${HTML_SCRIPT}</script></body></html>`,
    '',
  ].join('\n');
}
