import type { SinceMetric, SinceReport } from '../gate/since/since-report.js';
import { cleanText } from './clean.js';
import { formatChange, formatValue } from './format.js';
import { noteworthy, sinceOrder } from './since-order.js';
import { EVIDENCE_NOTE, metricSentence, pText, rangeLine, ratioText, statusLine, stepPlace } from './since-words.js';

const NAME_MAX = 80;

function details(m: SinceMetric, report: SinceReport): string[] {
  const unit = m.unit === undefined ? undefined : cleanText(m.unit, 20);
  const lines = [`${m.status.padEnd(9)} ${cleanText(m.name, NAME_MAX)}: ${metricSentence(m, report)}`];
  if (m.then && m.now) {
    lines.push(
      `          level ${formatValue(m.then.level, unit)} then (${m.then.n} runs to ${cleanText(m.then.to, 60)}), ${formatValue(m.now.level, unit)} now (${m.now.n} runs to ${cleanText(m.now.to, 60)})`,
    );
  }
  for (const s of m.steps) {
    const mark = s.mark ? `; ${s.mark.reason}${s.mark.pr === undefined ? '' : ` in PR #${s.mark.pr}`}` : '';
    lines.push(
      `          step ${ratioText(s.ratio)} at ${stepPlace(s, (t) => cleanText(t, 60))} (p ${pText(s.p)}${mark})`,
    );
  }
  if (m.creep?.reported) {
    const c = m.creep;
    const interval =
      c.lower === null || c.upper === null ? '' : ` (CI ${formatChange(c.lower)} to ${formatChange(c.upper)})`;
    lines.push(
      `          creep ${formatChange(c.slope)} per run${interval} over ${c.runs} runs in ${c.segments} segment${c.segments === 1 ? '' : 's'} (adjusted p ${pText(c.adjusted)})`,
    );
  }
  for (const a of m.accepted) {
    if (m.steps.some((s) => s.mark === a)) continue;
    lines.push(
      `          ${a.reason} at run ${cleanText(a.run, 60)}${a.pr === undefined ? '' : ` (PR #${a.pr})`}: no step found there`,
    );
  }
  return lines;
}

/**
 * The release review in the terminal: the range, how the reference was matched, the counts,
 * then each metric with something to tell (a changed level, a step, a creep) with its levels,
 * steps (run, sha, PR, size, accepted mark) and creep; quiet metrics on one line, or listed with
 * `all`. Every name passes cleanText, so a metric file cannot send terminal escape sequences.
 * @example renderSinceText(report).split('\n')[0] // 'Bellgate release review — series "ci" since run 812-1 ...'
 */
export function renderSinceText(report: SinceReport, options: { all?: boolean } = {}): string {
  const lines = [
    `Bellgate release review — series "${cleanText(report.series, NAME_MAX)}" ${rangeLine(report, (t) => cleanText(t, 60))}`,
  ];
  if (report.reference.note) lines.push(`Note: ${report.reference.note}.`);
  lines.push(`${statusLine(report)}.`);
  const ordered = sinceOrder(report.metrics);
  const told = ordered.filter((m) => options.all === true || noteworthy(m));
  const quiet = ordered.filter((m) => !told.includes(m));
  for (const m of told) lines.push('', ...details(m, report));
  if (quiet.length > 0) {
    lines.push(
      '',
      `${quiet.length} other metric${quiet.length === 1 ? '' : 's'} without a change, step or creep (--all lists them).`,
    );
  }
  lines.push('', EVIDENCE_NOTE);
  return lines.join('\n') + '\n';
}
