import pc from 'picocolors';
import type { MetricResult, Report, SharedMoveResult, Status } from '../gate/report.js';
import { cleanText } from './clean.js';
import { metricCells } from './cells.js';
import { OK_ROWS_LISTED } from './ok-rows.js';
import { familyLine } from './family-line.js';
import { levelLines } from './level-lines.js';
import { fullReason, sharedReason } from './reason.js';
import { GLYPH_LEGEND, STATUS_GLYPH, statusCounts, VERDICT_HEADLINE } from './status.js';
import { reportNotes } from './notes.js';

type Colors = ReturnType<typeof pc.createColors>;

/** Names are capped shorter in a terminal table than elsewhere, so a row fits a wide terminal. */
const TEXT_NAME_MAX = 80;
/** The statuses of the table, in statusRank order. */
const JUDGED: readonly Status[] = ['regressed', 'improved', 'ok'];
const LISTED: readonly Status[] = ['missing', 'learning', 'new', 'ignored'];

function paint(c: Colors, s: Status, text: string): string {
  if (s === 'regressed') return c.red(c.bold(text));
  if (s === 'improved') return c.green(text);
  if (s === 'missing') return c.yellow(text);
  if (s === 'ok') return text;
  return c.dim(text);
}

// Printable ASCII only: such a name is what cleanText would return (within the cap), and its
// width is its length. One native regular-expression test per cell costs less than a loop over
// its characters in a process that runs the report once, before the loop could be optimised.
const PLAIN = /^[\u0020-\u007E]*$/;
const SURROGATE = /[\uD800-\uDFFF]/;

/** cleanText, skipping its two replacements for a printable-ASCII name within the cap. */
function clean(s: string, max: number): string {
  return s.length <= max && PLAIN.test(s) ? s : cleanText(s, max);
}

/** Width in code points (Array.from(s).length), building the array only when a pair can occur. */
function codePoints(s: string): number {
  return SURROGATE.test(s) ? Array.from(s).length : s.length;
}

function sharedLine(s: SharedMoveResult): string {
  return `shared move of ${clean(s.name, TEXT_NAME_MAX)}: ${s.status} — ${sharedReason(s)}`;
}

/**
 * The terminal report: a headline (verdict and counts), a table of judged metrics (regressed and
 * improved first) with the reason under each flagged one, the family control and each group's
 * shared move, then one line per
 * learning/new/missing/ignored set. More than OK_ROWS_LISTED ok metrics are counted on one line
 * instead of listed, unless `all` is set. Colour (picocolors) only when `color` is true; status
 * words are always printed, so the report reads the same without colour. Every name passes
 * cleanText, so a metric file cannot send terminal escape sequences.
 * @example renderText(report, { color: false }).split('\n')[0] // 'Bellgate — series "ci": pass — ...'
 */
export function renderText(report: Report, options: { color: boolean; all?: boolean }): string {
  const c = pc.createColors(options.color);
  const lines: string[] = [];
  for (const note of reportNotes(report, (t) => cleanText(t, 2000))) lines.push(c.yellow(`note: ${note}`));
  const verdictWord =
    report.verdict === 'regressed'
      ? c.red(c.bold('REGRESSED'))
      : report.verdict === 'unsettled'
        ? c.yellow(c.bold('UNSETTLED'))
        : c.bold(report.verdict.toUpperCase());
  lines.push(`Bellgate — series "${clean(report.series, TEXT_NAME_MAX)}": ${verdictWord}`);
  lines.push(
    `${VERDICT_HEADLINE[report.verdict]}; ${statusCounts(report.metrics.map((m) => m.status)) || 'no metrics'}.`,
  );

  // Regressed, then improved, then ok, each in report order (a stable sort by statusRank, in one pass).
  const byStatus = new Map<Status, MetricResult[]>(JUDGED.map((status) => [status, []]));
  for (const m of report.metrics) byStatus.get(m.status)?.push(m);
  const okCount = byStatus.get('ok')!.length;
  const foldOk = options.all !== true && okCount > OK_ROWS_LISTED;
  if (foldOk) byStatus.set('ok', []);
  const judged = [...byStatus.values()].flat();
  if (judged.length > 0) {
    const head = ['status', 'metric', 'this run', 'baseline', 'change', 'sigma', 'rel. density vs cutoff'];
    const columns = head.length;
    // Every cell and its width once, flat (row-major); the widths pad the columns and the cells.
    const cells: string[] = new Array<string>(judged.length * columns);
    const cellWidths = new Int32Array(judged.length * columns);
    const widths = head.map((h) => h.length);
    judged.forEach((m, row) => {
      const shown = metricCells(m, m.unit === undefined ? undefined : clean(m.unit, 20));
      const at = row * columns;
      cells[at] = `${STATUS_GLYPH[m.status]} ${m.status}`;
      cells[at + 1] = clean(m.name, TEXT_NAME_MAX);
      cells[at + 2] = shown.value;
      cells[at + 3] = shown.baseline;
      cells[at + 4] = shown.change;
      cells[at + 5] = shown.sigma;
      cells[at + 6] = shown.density;
      // Only the name and the cells carrying a unit can hold a surrogate pair: the glyphs and the
      // formatted numbers are single UTF-16 units each, so their width is their length.
      const unitCells = m.unit !== undefined;
      for (let i = 0; i < columns; i++) {
        const cell = cells[at + i]!;
        const width = i === 1 || (unitCells && (i === 2 || i === 3)) ? codePoints(cell) : cell.length;
        cellWidths[at + i] = width;
        if (width > widths[i]!) widths[i] = width;
      }
    });
    lines.push('');
    lines.push(
      c.bold(
        head
          .map((h, i) => h + ' '.repeat(widths[i]! - h.length))
          .join('  ')
          .trimEnd(),
      ),
    );
    const parts: string[] = new Array<string>(columns);
    judged.forEach((m, row) => {
      const at = row * columns;
      for (let i = 0; i < columns; i++) parts[i] = cells[at + i]! + ' '.repeat(widths[i]! - cellWidths[at + i]!);
      lines.push(paint(c, m.status, parts.join('  ').trimEnd()));
      if (m.status !== 'ok') lines.push(`    ${clean(fullReason(m, report), 600)}`);
    });
    lines.push(c.dim(GLYPH_LEGEND));
  }
  if (foldOk) {
    if (judged.length === 0) lines.push('');
    lines.push(`${STATUS_GLYPH.ok} ok (${okCount}): within their baselines, not listed (--all lists every metric)`);
  }

  const levels = levelLines(report, (t) => clean(t, 600));
  if (levels.length > 0) lines.push('', ...levels);
  lines.push('');
  lines.push(familyLine(report));
  for (const s of report.shared) lines.push(s.status === 'unsettled' ? c.yellow(sharedLine(s)) : sharedLine(s));

  const listed = new Map<Status, string[]>(LISTED.map((status) => [status, []]));
  for (const m of report.metrics) listed.get(m.status)?.push(clean(m.name, TEXT_NAME_MAX));
  let first = true;
  for (const [s, names] of listed) {
    if (names.length === 0) continue;
    if (first) lines.push('');
    first = false;
    lines.push(paint(c, s, `${STATUS_GLYPH[s]} ${s} (${names.length}): ${names.join(', ')}`));
  }
  return lines.join('\n') + '\n';
}
