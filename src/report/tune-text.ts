import type { Family } from '../config/types.js';
import type { TuneResult } from '../gate/tune/tune.js';
import { FAMILIES } from '../gate/tune/tune.js';
import { cleanText } from './clean.js';
import { formatNumber } from './format.js';
import { textTable } from './tune-table.js';

/**
 * `bellgate tune` for a terminal: the cutoff ladder (false alarms per run, share of runs with a
 * false alarm per family setting, precision/recall/F1 with labels), false alarms per metric at the
 * current and the suggested cutoff, normality per metric, and the suggestion with its reasons.
 * Metric names pass through cleanText. Pure.
 * @example renderTuneText(result).split('\n')[0] // 'bellgate tune: series main, 120 runs, 112 replayed, ...'
 */
export function renderTuneText(result: TuneResult): string {
  const out: string[] = [];
  const refit = result.metrics.filter((m) => m.method === 'refit').length;
  out.push(
    `bellgate tune: series ${cleanText(result.series)}, ${result.runs} runs, ${result.replayedRuns} replayed, ` +
      `${formatNumber(result.metricsPerRun)} metrics judged in a typical run`,
  );
  out.push(
    `replay: ${result.metrics.length - refit} metrics slid incrementally, ${refit} refitted per run (change points or robust fit)`,
  );
  if (result.groups.length > 0) {
    out.push(
      `note: groups (${result.groups.map((g) => cleanText(g)).join(', ')}) are replayed member by member, as the gate judges them while a group is learning; their joint check is not in the ladder`,
    );
  }
  out.push('', ladderTable(result), '');
  out.push(
    `false alarms: alarms on runs not labelled as regressions; "runs/100" is the share of runs with at least one, by family setting (config: ${result.family}).`,
  );
  out.push('', perMetricTable(result));
  const normality = normalityTable(result);
  if (normality !== '') out.push('', normality);
  out.push('', ...suggestionLines(result));
  return `${out.join('\n')}\n`;
}

function ladderTable(result: TuneResult): string {
  const own = result.ladders.get(result.family)!;
  const labelled = own.some((r) => r.labelled !== undefined);
  const head = ['', 'cutoff', 'sigma', 'false/run', ...FAMILIES.map((f) => `runs/100 ${f}`)];
  if (labelled) head.push('precision', 'recall', 'F1');
  const rows = own.map((row, i) => {
    const mark = [
      row.cutoff === result.suggestion.cutoff ? '>' : ' ',
      row.cutoff === result.currentCutoff ? '*' : ' ',
    ].join('');
    const cells = [mark, formatNumber(row.cutoff), row.sigma.toFixed(2), row.alarmsPerRun.toFixed(3)];
    for (const f of FAMILIES) cells.push(per100(result.ladders.get(f as Family)![i]!.runsFlaggedPer100));
    if (row.labelled !== undefined)
      cells.push(row.labelled.precision.toFixed(3), row.labelled.recall.toFixed(3), row.labelled.f1.toFixed(3));
    return cells;
  });
  const legend = `  (> suggested, * current; cutoff chosen on family none, where a cutoff decides; config: family ${result.family}${labelled ? `; ${result.labels?.count ?? 0} labelled regressions` : ''})`;
  return `cutoff ladder\n${textTable([head, ...rows], 'lr')}\n${legend}`;
}

function perMetricTable(result: TuneResult): string {
  const own = result.ladders.get(result.family)!;
  const current = own.find((r) => r.cutoff === result.currentCutoff)!;
  const suggested = own.find((r) => r.cutoff === result.suggestion.cutoff)!;
  const shown = current === suggested ? [current] : [current, suggested];
  const head = ['metric', 'judged', ...shown.map((row) => `per100 @${formatNumber(row.cutoff)}`), 'replay'];
  const rows = result.metrics.map((m, j) => [
    cleanText(m.name),
    String(m.judged),
    ...shown.map((row) => per100(rate(row.perMetric[j]!, m.judged))),
    m.method,
  ]);
  return `false alarms per 100 judged runs, by metric\n${textTable([head, ...rows], `lr${'r'.repeat(shown.length)}l`)}`;
}

function normalityTable(result: TuneResult): string {
  const rows = result.metrics
    .filter((m) => m.normality !== undefined)
    .map((m) => {
      const n = m.normality!;
      return [
        cleanText(m.name),
        String(n.n),
        n.raw.skewness.toFixed(2),
        n.raw.andersonDarling.toFixed(3),
        n.log ? n.log.skewness.toFixed(2) : '-',
        n.log ? n.log.andersonDarling.toFixed(3) : '-',
        m.transform,
        n.note,
      ];
    });
  if (rows.length === 0) return '';
  const head = ['metric', 'n', 'skew', 'A*²', 'skew log', 'A*² log', 'transform', 'note'];
  return (
    "normality of the newest window (skewness: Joanes & Gill 1998; Anderson-Darling A*² with estimated mean and sd, 5% critical value 0.752: D'Agostino & Stephens 1986)\n" +
    textTable([head, ...rows], 'lrrrrrll')
  );
}

function suggestionLines(result: TuneResult): string[] {
  const s = result.suggestion;
  const lines = ['suggestion', `  defaults.cutoff: ${formatNumber(s.cutoff)} — ${s.reason}`];
  lines.push(
    `  family: ${s.family}${s.family === result.family ? ' (as configured)' : ` (configured: ${result.family})`} — ${s.familyReason}`,
  );
  for (const rule of s.rules) {
    const keys = [
      rule.cutoff === undefined ? '' : `cutoff: ${formatNumber(rule.cutoff)}`,
      rule.transform === undefined ? '' : `transform: ${rule.transform}`,
    ].filter((k) => k !== '');
    lines.push(`  rule ${cleanText(rule.metric)}: ${keys.join(', ')} — ${cleanText(rule.reason, 400)}`);
  }
  const t = result.target;
  lines.push(
    t.cutoff === undefined
      ? `  target ${t.per100} per 100 runs: no cutoff of the ladder meets it`
      : `  target ${t.per100} per 100 runs: loosest qualifying cutoff ${formatNumber(t.cutoff)}`,
  );
  if (result.labels?.best !== undefined) {
    const b = result.labels.best;
    lines.push(
      `  labels: best F1 ${b.f1.toFixed(3)} at cutoff ${formatNumber(b.cutoff)} (precision ${b.precision.toFixed(3)}, recall ${b.recall.toFixed(3)})`,
    );
  }
  return lines;
}

function rate(count: number, of: number): number {
  return of === 0 ? 0 : (100 * count) / of;
}

function per100(x: number): string {
  return x.toFixed(1);
}
