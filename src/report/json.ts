import type { BaselineSummary, MetricResult, Report, SharedMoveResult } from '../gate/report.js';
import { fullReason, sharedReason } from './reason.js';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** JSON has no NaN or Infinity; a number that is not finite becomes null, never a string. */
const num = (x: number | undefined): number | null => (x !== undefined && Number.isFinite(x) ? x : null);

/** Copy the optional extras in a fixed order, leaving out the absent ones. */
function extras(pairs: [string, Json | undefined][]): Record<string, Json> {
  const o: Record<string, Json> = {};
  for (const [k, v] of pairs) if (v !== undefined) o[k] = v;
  return o;
}

function baseline(b: BaselineSummary | undefined): Json {
  if (!b) return null;
  return {
    n: num(b.n),
    mean: num(b.mean),
    sd: num(b.sd),
    ...extras([
      ['scale', b.scale],
      ['since', b.since],
      ['sinceReason', b.sinceReason],
      ['sincePr', b.sincePr],
      ['levelRuns', b.levelRuns],
      ['relativeTo', b.relativeTo],
      ['runner', b.runner],
      ['dof', b.dof === undefined ? undefined : num(b.dof)],
    ]),
  };
}

function metric(m: MetricResult, report: Report): Json {
  // The documented fields first and always present (null when not known), then the extras.
  return {
    name: m.name,
    status: m.status,
    value: num(m.value),
    unit: m.unit ?? null,
    baseline: baseline(m.baseline),
    z: num(m.z),
    change: num(m.change),
    density: num(m.density),
    relativeDensity: num(m.relativeDensity),
    cutoff: num(m.cutoff),
    detectable: num(m.detectable),
    ...extras([
      ['worse', m.worse],
      ['count', m.count === undefined ? undefined : num(m.count)],
      ['shared', m.shared === undefined ? undefined : num(m.shared)],
      ['own', m.own === undefined ? undefined : num(m.own)],
      ['tail', m.tail === undefined ? undefined : num(m.tail)],
      ['adjusted', m.adjusted === undefined ? undefined : num(m.adjusted)],
      ['level', m.level === undefined ? undefined : num(m.level)],
      ['effectiveCutoff', m.effectiveCutoff === undefined ? undefined : num(m.effectiveCutoff)],
      ['noise', m.noise === undefined ? undefined : noise(m.noise)],
      ['group', m.group],
      ['recent', m.recent?.map(num)],
      ['reason', fullReason(m, report)],
    ]),
  };
}

function noise(n: NonNullable<MetricResult['noise']>): Json {
  return {
    betweenRuns: num(n.betweenRuns),
    ...extras([
      ['insideRun', n.insideRun === undefined ? undefined : num(n.insideRun)],
      [
        'moreRuns',
        n.moreRuns === undefined ? undefined : { runs: num(n.moreRuns.runs), detectable: num(n.moreRuns.detectable) },
      ],
    ]),
  };
}

function shared(s: SharedMoveResult): Json {
  return {
    name: s.name,
    status: s.status,
    members: num(s.members),
    move: num(s.move),
    n: num(s.n),
    ...extras([
      ['tail', s.tail === undefined ? undefined : num(s.tail)],
      ['largest', s.largest === undefined ? undefined : num(s.largest)],
      ['episode', s.episode === true ? true : undefined],
      ['held', s.held === undefined ? undefined : [...s.held]],
    ]),
    reason: sharedReason(s),
  };
}

/**
 * The JSON report (`--format json`, the action's `report` output) with the documented field names in
 * a stable order: schema, verdict, series, blocks, family, budget, unsettled, runner, metrics[],
 * shared[] (each group's shared move), then when present notes[] (what the history could not give),
 * missing (baseline metrics absent) and notJudged[]. Non-finite numbers become
 * null; 2-space indent; ends with a newline. Names are values, never keys, so an untrusted name
 * such as `__proto__` cannot reach an object's prototype.
 * @example JSON.parse(renderJson(report)).schema // 'bellgate.report/1'
 */
export function renderJson(report: Report): string {
  const doc: Json = {
    schema: report.schema,
    verdict: report.verdict,
    series: report.series,
    blocks: report.blocks,
    family: report.family,
    budget: num(report.budget),
    unsettled: report.unsettled,
    ...extras([['runner', report.runner]]),
    metrics: report.metrics.map((m) => metric(m, report)),
    shared: report.shared.map(shared),
    ...extras([
      ['notes', report.notes],
      ['missing', report.missing === undefined ? undefined : { count: report.missing.count, of: report.missing.of }],
      ['notJudged', report.notJudged?.map((n) => ({ name: n.name, reason: n.reason }))],
    ]),
  };
  return JSON.stringify(doc, null, 2) + '\n';
}
