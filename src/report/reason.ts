import { unitScale } from '../inputs/units.js';
import type { Tolerance } from '../config/types.js';
import type { MetricResult, Report, SharedMoveResult } from '../gate/report.js';
import { formatChange, formatDensity, formatNumber } from './format.js';

/** "1%" or "512". @example describeTolerance({ kind: 'percent', amount: 0.01 }) // '1%' */
export function describeTolerance(tolerance: Tolerance): string {
  return tolerance.kind === 'percent' ? `${formatNumber(tolerance.amount * 100)}%` : formatNumber(tolerance.amount);
}

/** A share as a percent with enough digits to check: "7.1%", "0.028%". */
export function formatShare(share: number): string {
  return formatChange(share).replace(/^[+±]/, '');
}

/** "1%", the budget of a report in words. */
function budgetText(budget: number): string {
  return formatShare(budget);
}

/**
 * One sentence on why a metric has its status (issue 13: the words live in src/report, the gate
 * gives data): the own move beside the shared move, how far that is in sd, the test it faced (the
 * tail against its family level, or the relative density against the cutoff) and the effective
 * relative-density cutoff under family control, the tolerance when it held the status back; or why
 * it was not judged. Numbers keep enough digits to be checked (formatNumber: 4 significant, never
 * rounding integer digits away).
 * @example metricReason(result, report) // 'own move +12.3% beside a shared move of +3.1% (timings), 6.2 sd; ...'
 */
export function metricReason(m: MetricResult, report: Pick<Report, 'family' | 'budget'>): string {
  const note = m.note;
  if (m.status === 'ignored') return 'matched a rule with ignore: true';
  if (m.status === 'new') return 'no history for this metric yet';
  if (m.status === 'missing') {
    if (note?.kind === 'no-reference')
      return `cannot be judged beside ${note.reference} (relative-to): this run lacks that metric`;
    const runs = note?.kind === 'missing' ? note.runs : 0;
    const held = `in the history (${runs} run${runs === 1 ? '' : 's'})`;
    if (note?.kind === 'missing' && note.notJudged !== undefined)
      return `${held} but not judged in this run: ${note.notJudged}`;
    return `${held} but absent from this run`;
  }
  if (m.status === 'learning' && note?.kind === 'learning') {
    if (note.levelRuns !== undefined && note.runs >= note.minRuns)
      return `only ${note.levelRuns} run${note.levelRuns === 1 ? '' : 's'} since the baseline's level start; 3 are needed`;
    return `only ${note.runs} baseline run${note.runs === 1 ? '' : 's'}; min-runs is ${note.minRuns}`;
  }
  const parts: string[] = [];
  parts.push(position(m));
  parts.push(testPhrase(m, report));
  let text = parts.join('; ');
  if (note?.kind === 'within-tolerance' && m.status === 'ok' && m.own !== undefined && significant(m, report))
    text += `, but the own move ${formatShare(Math.abs(m.own))} is within the tolerance ${describeTolerance(note.tolerance)}`;
  if (m.status === 'improved') text += ' (the better side)';
  return text;
}

/** Whether the metric's test fired (before the tolerance). */
function significant(m: MetricResult, report: Pick<Report, 'family' | 'budget'>): boolean {
  if (report.family !== 'none' && m.adjusted !== undefined) return m.adjusted <= report.budget;
  return (m.relativeDensity ?? 1) < m.cutoff;
}

/** "own move +12.3% beside a shared move of +3.1% (timings), 4.1 sd above the centre". */
function position(m: MetricResult): string {
  if (m.note?.kind === 'constant') {
    const centre =
      m.baseline === undefined ? NaN : m.baseline.scale === 'log' ? Math.exp(m.baseline.mean) : m.baseline.mean;
    return m.relativeDensity === 1
      ? `equal to the constant baseline ${formatNumber(centre)}`
      : `off the constant baseline ${formatNumber(centre)} (sd 0; set \`resolution\` to the smallest meaningful step)`;
  }
  const own = m.own === undefined ? '' : `${m.shared === undefined ? 'move' : 'own move'} ${formatChange(m.own)}`;
  const beside =
    m.shared === undefined ? '' : ` beside a shared move of ${formatChange(m.shared)} (${m.group ?? 'shared'})`;
  const z =
    m.z === undefined
      ? ''
      : `, ${formatNumber(Math.abs(m.z), 3)} sd ${m.z >= 0 ? 'above' : 'below'} the baseline centre`;
  return `${own}${beside}${z}` || 'at the baseline centre';
}

/** The test the metric faced, with its numbers. */
function testPhrase(m: MetricResult, report: Pick<Report, 'family' | 'budget'>): string {
  const r = m.relativeDensity ?? 1;
  if (report.family === 'none' || m.adjusted === undefined) {
    return `relative density ${formatDensity(r)} ${r < m.cutoff ? '<' : '≥'} cutoff ${formatDensity(m.cutoff)}`;
  }
  const fired = m.adjusted <= report.budget;
  const level = m.level === undefined ? '' : ` ${fired ? '≤' : '>'} ${report.family} level ${formatNumber(m.level, 3)}`;
  const tail = m.tail === undefined ? '' : `tail ${formatNumber(m.tail, 3)}${level}`;
  const density =
    m.effectiveCutoff === undefined
      ? ''
      : ` (relative density ${formatDensity(r)} ${r < m.effectiveCutoff ? '<' : '≥'} effective cutoff ${formatDensity(m.effectiveCutoff)})`;
  return `${tail}${density}, ${budgetText(report.budget)} chance of any false alarm per run`;
}

/** "baseline since run 4180-1 (accepted in #12)", or '' when the baseline spans its whole window. */
export function sinceText(m: MetricResult): string {
  const b = m.baseline;
  if (b?.since === undefined) return '';
  const why =
    b.sinceReason === 'accepted'
      ? b.sincePr === undefined
        ? 'an accepted change'
        : `accepted in #${b.sincePr}`
      : b.sinceReason === 'manual'
        ? 'a level mark'
        : 'a lasting change';
  const runs =
    b.levelRuns === undefined ? '' : `, ${b.levelRuns} run${b.levelRuns === 1 ? '' : 's'}; spread from all ${b.n}`;
  return `baseline since run ${b.since} (${why}${runs})`;
}

/** What the runner fingerprint says about the baseline, or ''. */
export function runnerText(m: MetricResult): string {
  const r = m.baseline?.runner;
  if (r === 'other') return 'no baseline run was on this runner: timings may differ by the machine';
  if (r === 'mixed') return 'fewer than min-runs baseline runs were on this runner: the baseline mixes runners';
  return '';
}

/**
 * What the gate can see of a metric (issue 13 item 6): "sees a slowdown of 7.1% or more (80% of
 * the time)", and what would make it smaller, from the history: more baseline runs; the noise is
 * between runs, not inside one (more samples per run will not help; a CPU-time or count metric
 * would likely be steadier); or the noise is inside the run (more samples would help).
 */
export function detectableText(m: MetricResult): string {
  if (m.detectable === undefined || !Number.isFinite(m.detectable)) return '';
  const timing = m.unit !== undefined && unitScale(m.unit)?.[0]?.dimension === 'time';
  const way = m.worse === 'lower' ? 'drop' : m.worse === 'both' ? 'move' : timing ? 'slowdown' : 'rise';
  const parts = [`can see a ${way} of ${formatShare(m.detectable)} or more (80% of the time)`];
  const noise = m.noise;
  if (noise?.moreRuns !== undefined)
    parts.push(`${noise.moreRuns.runs} more baseline runs would bring it to ${formatShare(noise.moreRuns.detectable)}`);
  if (noise?.insideRun !== undefined && m.count !== undefined && m.count > 1) {
    const inside = noise.insideRun / Math.sqrt(m.count);
    if (inside < noise.betweenRuns / 3)
      parts.push(
        'the noise is between runs, not inside one: more samples per run will not help; a CPU-time or count metric would likely be steadier',
      );
    else parts.push(`the noise is largely inside the run: more samples per run would lower it`);
  } else if (m.shared !== undefined && m.detectable > 0.05) {
    parts.push('a CPU-time or count metric would likely be steadier than a wall-clock timing');
  }
  return parts.join('; ');
}

/** The sentence of a group's shared move: what it was, against the history, and what to do. */
export function sharedReason(s: SharedMoveResult): string {
  if (s.status === 'learning')
    return `shared move ${formatChange(s.move)} of ${s.members} metrics; only ${s.n} baseline runs to judge it against`;
  const largest = s.largest === undefined ? '' : ` (the largest of ${s.n} baseline runs: ${formatChange(s.largest)})`;
  const tail = s.tail === undefined ? '' : `, tail ${formatNumber(s.tail, 3)}`;
  if (s.held !== undefined && s.held.length > 0)
    return (
      `a slow episode: several metrics of ${s.name} were far out at once, each by its own amount (shared move ${formatChange(s.move)}); ` +
      `${s.held.join(', ')} would have regressed, but one run in such a spell cannot tell the spell from a change. Re-run the check (a calm run that shows the same move confirms it)`
    );
  const episode =
    s.episode === true
      ? '; a slow episode (several metrics far out at once): judged against every baseline run, so less is visible'
      : '';
  if (s.status === 'unsettled')
    return (
      `every metric of ${s.name} moved together by ${formatChange(s.move)}, beyond what the history has shown${largest}${tail}: ` +
      'a slower runner, or a change that slowed everything; one run cannot tell. Re-run the check (a second run with the same move confirms the change), or record a baseline run on the same runner'
    );
  return `shared move ${formatChange(s.move)} of ${s.members} metrics, within what the history has shown${largest}${tail}${episode}`;
}

/**
 * Everything a reader is told about one metric, in one line: the reason, the baseline's start,
 * the runner, and (for judged metrics) what the gate can see.
 * @example fullReason(result, report) // 'own move +12.3% ...; baseline since run 41-1 (a lasting change); can see a slowdown of 7.1% or more ...'
 */
export function fullReason(m: MetricResult, report: Pick<Report, 'family' | 'budget'>): string {
  return [metricReason(m, report), sinceText(m), runnerText(m), detectableText(m)].filter((s) => s !== '').join('; ');
}
