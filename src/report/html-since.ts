import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import type { SinceMetric, SinceReport } from '../gate/since/since-report.js';
import type { History, RunInfo } from '../history/history.js';
import { escapeHtml } from './escape.js';
import { formatValue } from './format.js';
import { bottomAxis, leftAxis, valueScale } from './html-axis.js';
import { chartSvg, svgElement, textElement } from './html-svg.js';
import { noteworthy, sinceOrder } from './since-order.js';
import { EVIDENCE_NOTE, metricSentence, rangeLine, ratioText, statusLine } from './since-words.js';

const W = 560;
const H = 200;
const M = { top: 14, right: 18, bottom: 40, left: 72 };
/** Metrics drawn at most; the rest are listed (a page of thousands of charts helps no one). */
const MAX_CHARTS = 60;

/**
 * An SVG of one metric's path from the reference to now: every recorded value from the first
 * run of the level-then window to the newest run, the reference as a vertical line, the level
 * then and the level now as dashed lines over their windows, and each step as a marked vertical
 * line with a tooltip (its size, first run, pull request). The y axis is logarithmic when the
 * review compared ratios. Returns '' when the history holds none of the metric's runs.
 */
export function sincePathChart(m: SinceMetric, report: SinceReport, history: History): string {
  const ids = new Map(history.runs.map((r, i) => [r.id, i] as const));
  const from = ids.get(m.then?.from ?? report.reference.run) ?? ids.get(report.reference.run);
  const to = ids.get(report.latest.run);
  const column = history.columns.get(m.name);
  if (from === undefined || to === undefined || column === undefined) return '';
  const pts: { index: number; value: number; run: RunInfo }[] = [];
  for (let i = from; i <= to; i++) {
    const value = column.values[i];
    if (value !== undefined && Number.isFinite(value)) pts.push({ index: i, value, run: history.runs[i]! });
  }
  if (pts.length === 0) return '';
  const levels = [m.then?.level, m.now?.level].filter((v): v is number => v !== undefined && Number.isFinite(v));
  const all = [...pts.map((p) => p.value), ...levels];
  const log = m.scale === 'log' && all.every((v) => v > 0);
  const y = valueScale(log, Math.min(...all), Math.max(...all), [H - M.bottom, M.top]);
  const x = scaleLinear()
    .domain([from, Math.max(from + 1, to)])
    .range([M.left, W - M.right]);
  const unit = m.unit === undefined ? '' : escapeHtml(m.unit, 40);
  const parts: string[] = [];
  const vertical = (index: number, cls: string, tip: string): string =>
    svgElement('line', { class: cls, x1: x(index), x2: x(index), y1: M.top, y2: H - M.bottom }, tip);
  const reference = ids.get(report.reference.run);
  if (reference !== undefined)
    parts.push(vertical(reference, 'since-ref', `reference: run ${escapeHtml(report.reference.run, 100)}`));
  for (const [window, name] of [
    [m.then, 'then'],
    [m.now, 'now'],
  ] as const) {
    const a = window === undefined ? undefined : ids.get(window.from);
    const b = window === undefined ? undefined : ids.get(window.to);
    if (window === undefined || a === undefined || b === undefined) continue;
    const tip = `level ${name}: ${escapeHtml(formatValue(window.level))} ${unit} (median of ${window.n} runs)`;
    parts.push(
      svgElement(
        'line',
        {
          class: `mean since-${name}`,
          x1: x(a),
          x2: x(Math.max(b, a + 0.5)),
          y1: y(window.level),
          y2: y(window.level),
        },
        tip,
      ),
    );
  }
  for (const s of m.steps) {
    const at = ids.get(s.run);
    if (at === undefined) continue;
    const pr = s.pr === undefined ? '' : `, PR #${s.pr}`;
    const mark = s.mark ? `, ${s.mark.reason}` : '';
    parts.push(vertical(at, 'since-step', escapeHtml(`step ${ratioText(s.ratio)} from run ${s.run}${pr}${mark}`, 300)));
    parts.push(textElement({ class: 'note', x: x(at) + 3, y: M.top + 10 }, escapeHtml(ratioText(s.ratio))));
  }
  const trace = line<{ index: number; value: number }>()
    .x((p) => x(p.index))
    .y((p) => y(p.value));
  if (pts.length > 1) parts.push(svgElement('path', { class: 'trace', d: trace(pts) ?? '' }));
  for (const p of pts) {
    const tip = escapeHtml(
      `run ${p.run.id}${p.run.time ? ` · ${p.run.time}` : ''}: ${formatValue(p.value)} ${m.unit ?? ''}`,
      300,
    );
    parts.push(svgElement('circle', { class: 'point', cx: x(p.index), cy: y(p.value), r: 2.4 }, tip));
  }
  const axes =
    bottomAxis(x, H - M.bottom, 'run, from the level-then window to the newest') + leftAxis(y, M.left, unit || 'value');
  return chartSvg(W, H, `path of ${escapeHtml(m.name, 200)} since the reference`, axes + parts.join(''));
}

/**
 * The HTML report's release review section: the headline counts and range, how the reference was
 * matched, then per metric (worse first; the first MAX_CHARTS that have something to tell) its
 * sentence and its path chart; quiet metrics are listed by name. Everything from the history is
 * escaped.
 */
export function sinceSection(report: SinceReport, history: History): string {
  const ordered = sinceOrder(report.metrics);
  const told = ordered.filter(noteworthy);
  const quiet = ordered.filter((m) => !noteworthy(m));
  const drawn = told.slice(0, MAX_CHARTS).map((m) => {
    const chart = sincePathChart(m, report, history);
    const unit = m.unit === undefined ? '' : ` <span class="meta">(${escapeHtml(m.unit, 40)})</span>`;
    return (
      `<div class="since-metric" data-metric="${escapeHtml(m.name, 300)}"><h3><span class="s-${m.status === 'worse' ? 'regressed' : m.status === 'better' ? 'improved' : 'ok'}">${m.status}</span> ${escapeHtml(m.name, 300)}${unit}</h3>` +
      `<p class="reason">${escapeHtml(metricSentence(m, report), 1500)}</p>${chart || '<p class="note-text">No values to draw.</p>'}</div>`
    );
  });
  const more =
    told.length > MAX_CHARTS
      ? `<p class="note-text">…and ${told.length - MAX_CHARTS} more metrics with changes; see the JSON review.</p>`
      : '';
  const rest =
    quiet.length > 0
      ? `<p class="meta">Unchanged, new or gone without steps or creep: ${quiet.map((m) => escapeHtml(m.name, 300)).join(', ')}.</p>`
      : '';
  const note = report.reference.note ? `<p class="report-note">${escapeHtml(report.reference.note, 500)}.</p>` : '';
  return (
    `<section id="since" class="since"><h2>Release review: ${escapeHtml(statusLine(report))}</h2>` +
    `<p class="meta">${escapeHtml(
      rangeLine(report, (t) => t),
      600,
    )}. Dots are recorded runs; the solid line is the reference, dashed lines the level then and now, red lines the steps.</p>` +
    note +
    (told.length === 0 ? '<p>No metric changed level, stepped or crept in this range.</p>' : drawn.join('')) +
    more +
    rest +
    `<p class="legend">${escapeHtml(EVIDENCE_NOTE)}</p></section>`
  );
}
