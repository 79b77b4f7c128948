import pc from 'picocolors';
import type { MetricResult, Report } from '../gate/report.js';
import { cutoffSigma } from '../model/tails.js';
import { cleanText } from './clean.js';
import { formatAgainstCutoff, formatChange, formatNumber, formatSigma, formatValue } from './format.js';
import { BLOCKS } from './sparkline.js';
import { STATUS_GLYPH } from './status.js';
import { detectableText, fullReason, metricReason, runnerText, sinceText } from './reason.js';

export interface ExplainInput {
  result: MetricResult;
  /** The baseline runs' values on the metric's own scale (not log), oldest first. */
  baselineValues: number[];
  cutoff: number;
  /** The report's family control, for the reason's wording. */
  report?: Pick<Report, 'family' | 'budget'>;
  color: boolean;
  /** Columns of the picture (default 72, at least 24). */
  width?: number;
}

const ROWS = 8;
const DOT_ROWS = 3;

/** Put `label` into `line` at column `at`, aligned left/centre/right, without overrunning. */
function place(line: string[], label: string, at: number, align: 'left' | 'centre' | 'right'): void {
  const chars = Array.from(label);
  let start = align === 'left' ? at : align === 'right' ? at - chars.length + 1 : at - Math.floor(chars.length / 2);
  start = Math.max(0, Math.min(line.length - chars.length, start));
  if (chars.some((_, i) => line[start + i] !== ' ')) return;
  chars.forEach((ch, i) => (line[start + i] = ch));
}

/**
 * A terminal picture of one metric's decision: the fitted Gaussian drawn as rows of block
 * characters (eighth-height steps), the baseline runs as a dot strip under it, the edges of the
 * band where the relative density stays above the cutoff (mean ± sqrt(-2 ln cutoff) sd) as `|`
 * and this run as `▲`, then the numbers in words. On the log scale the picture's x axis is
 * log(value) and labels are in the metric's own unit. Colour only when asked; never needed.
 * @example renderExplain({ result, baselineValues, cutoff: 0.01, color: false }).includes('▲') // true
 */
export function renderExplain(input: ExplainInput): string {
  const { result: m, cutoff } = input;
  const context = input.report ?? { family: 'none', budget: 0.01 };
  const c = pc.createColors(input.color);
  const width = Math.max(24, Math.floor(input.width ?? 72));
  const name = cleanText(m.name);
  const unit = m.unit === undefined ? undefined : cleanText(m.unit, 20);
  const out: string[] = [`${name} — ${STATUS_GLYPH[m.status]} ${m.status}`];
  const b = m.baseline;
  if (!b || !(b.sd > 0 && Number.isFinite(b.sd)) || !Number.isFinite(b.mean)) {
    out.push(`no fitted baseline: ${cleanText(fullReason(m, context), 600)}`);
    if (m.value !== undefined) out.push(`this run: ${formatValue(m.value, unit)}`);
    return out.join('\n') + '\n';
  }
  const log = b.scale === 'log';
  const toFit = (x: number): number => (log ? Math.log(x) : x);
  const fromFit = (t: number): number => (log ? Math.exp(t) : t);
  // The picture is of this run's expectation: the baseline centre moved by the run's shared move.
  const shared = m.shared ?? 0;
  const centre = log ? b.mean + Math.log1p(shared) : b.mean * (1 + shared);
  const k = cutoffSigma(cutoff);
  const pts = input.baselineValues.map(toFit).filter((t) => Number.isFinite(t));
  const now = m.value === undefined ? NaN : toFit(m.value);
  const span = [
    centre - Math.max(k, 3.5) * b.sd,
    centre + Math.max(k, 3.5) * b.sd,
    ...pts,
    ...(Number.isFinite(now) ? [now] : []),
  ];
  let lo = Math.min(...span);
  let hi = Math.max(...span);
  const pad = (hi - lo) * 0.03;
  lo -= pad;
  hi += pad;
  const col = (t: number): number => Math.max(0, Math.min(width - 1, Math.floor(((t - lo) / (hi - lo)) * width)));
  const inBand = (t: number): boolean => Math.abs(t - centre) <= k * b.sd;

  // Density rows: each column's height in eighths of a row, relative density exp(-z^2/2) of the fit.
  const eighths = Array.from({ length: width }, (_, i) => {
    const z = (lo + ((i + 0.5) / width) * (hi - lo) - centre) / b.sd;
    return Math.round(Math.exp(-0.5 * z * z) * ROWS * 8);
  });
  for (let r = ROWS - 1; r >= 0; r--) {
    const line = eighths.map((e, i) => {
      const fill = e - r * 8;
      const ch = fill >= 8 ? '█' : fill <= 0 ? ' ' : (BLOCKS[fill - 1] ?? ' ');
      return inBand(lo + ((i + 0.5) / width) * (hi - lo)) ? ch : c.dim(ch);
    });
    out.push(line.join('').trimEnd());
  }
  // Markers: band edges and this run on one rule.
  const rule = Array.from({ length: width }, () => '─');
  rule[col(centre - k * b.sd)] = '|';
  rule[col(centre + k * b.sd)] = '|';
  const nowCol = Number.isFinite(now) ? col(now) : -1;
  if (nowCol >= 0) rule[nowCol] = '▲';
  const paintRun = m.status === 'regressed' ? c.red : m.status === 'improved' ? c.green : (s: string) => s;
  out.push(rule.map((ch, i) => (i === nowCol ? paintRun(c.bold(ch)) : ch)).join(''));
  // Dot strip of the baseline runs, stacked up to DOT_ROWS high ('+' when more).
  const counts = new Array<number>(width).fill(0);
  for (const t of pts) counts[col(t)] = (counts[col(t)] ?? 0) + 1;
  for (let r = 0; r < DOT_ROWS; r++) {
    const line = counts
      .map((n) => (n > r ? (r === DOT_ROWS - 1 && n > DOT_ROWS ? '+' : '•') : ' '))
      .join('')
      .trimEnd();
    if (line) out.push(line);
  }
  const axis = Array.from({ length: width }, () => ' ');
  place(axis, formatNumber(fromFit(centre)), col(centre), 'centre');
  place(axis, formatNumber(fromFit(lo)), 0, 'left');
  place(axis, formatNumber(fromFit(hi)), width - 1, 'right');
  out.push(axis.join('').trimEnd());
  out.push(`█ fitted density${log ? ' (of log value)' : ''}   • baseline runs   | cutoff band edges   ▲ this run`);
  out.push('');

  const centreText = log
    ? `geometric mean ${formatValue(Math.exp(b.mean), unit)}, sd ${formatNumber(b.sd, 3)} on the log scale (×/÷ ${formatNumber(Math.exp(b.sd), 4)})`
    : `mean ${formatValue(b.mean, unit)}, sd ${formatValue(b.sd, unit)}`;
  out.push(`baseline: ${centreText}, n = ${b.n} runs${b.since ? ` (level since run ${cleanText(b.since, 80)})` : ''}`);
  out.push(`this run: ${formatValue(m.value, unit)} (${formatChange(m.change)}, ${formatSigma(m.z)})`);
  const [low, high] = [formatValue(fromFit(centre - k * b.sd), unit), formatValue(fromFit(centre + k * b.sd), unit)];
  out.push(
    `band where the fitted Gaussian's density stays above the cutoff: ${low} to ${high} (mean ± ${formatNumber(k, 3)} sd)`,
  );
  out.push(
    `relative density vs cutoff: ${formatAgainstCutoff(m.relativeDensity, cutoff)}; worse side: ${m.worse === 'both' ? 'either' : m.worse}`,
  );
  out.push(
    '  (from the predictive Student-t of the own moves, its tails fitted to the history: heavier than the Gaussian drawn)',
  );
  if (m.shared !== undefined)
    out.push(
      `shared move of the run (${cleanText(m.group ?? 'shared', 80)}): ${formatChange(m.shared)}; own move ${formatChange(m.own)}`,
    );
  for (const extra of [sinceText(m), runnerText(m), detectableText(m)])
    if (extra !== '') out.push(cleanText(extra, 600));
  out.push(`verdict for this metric: ${paintRun(m.status)} — ${cleanText(metricReason(m, context), 600)}`);
  return out.join('\n') + '\n';
}
