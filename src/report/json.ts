import type { BaselineSummary, GroupResult, MetricResult, Report } from '../gate/report.js';

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
      ['relativeTo', b.relativeTo],
    ]),
  };
}

function metric(m: MetricResult): Json {
  // DESIGN.md's fields first and always present (null when not known), then the extras.
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
    ...extras([
      ['worse', m.worse],
      ['count', m.count === undefined ? undefined : num(m.count)],
      ['tail', m.tail === undefined ? undefined : num(m.tail)],
      ['adjusted', m.adjusted === undefined ? undefined : num(m.adjusted)],
      ['group', m.group],
      ['recent', m.recent?.map(num)],
      ['reason', m.reason],
    ]),
  };
}

function group(g: GroupResult): Json {
  return {
    name: g.name,
    status: g.status,
    members: g.members.map((m) => ({ name: m.name, share: num(m.share), ownZ: num(m.ownZ) })),
    n: num(g.n),
    distance: num(g.distance),
    tail: num(g.tail),
    level: num(g.level),
    common: { z: num(g.common.z), tail: num(g.common.tail), status: g.common.status },
    shrinkage: num(g.shrinkage),
    ...extras([
      ['distanceTail', g.distanceTail === undefined ? undefined : num(g.distanceTail)],
      ['ownTail', g.ownTail === undefined ? undefined : num(g.ownTail)],
      ['adjusted', g.adjusted === undefined ? undefined : num(g.adjusted)],
    ]),
    reason: g.reason,
  };
}

/**
 * The JSON report (`--format json`, the action's `report` output) with DESIGN.md's field names in
 * a stable order: schema, verdict, series, family, metrics[], groups[], then when present notes[]
 * (what the history could not give), missing (baseline metrics absent) and notJudged[]. Non-finite numbers become
 * null; 2-space indent; ends with a newline. Names are values, never keys, so an untrusted name
 * such as `__proto__` cannot reach an object's prototype.
 * @example JSON.parse(renderJson(report)).schema // 'bellgate.report/1'
 */
export function renderJson(report: Report): string {
  const doc: Json = {
    schema: report.schema,
    verdict: report.verdict,
    series: report.series,
    family: report.family,
    metrics: report.metrics.map(metric),
    groups: report.groups.map(group),
    ...extras([
      ['notes', report.notes],
      ['missing', report.missing === undefined ? undefined : { count: report.missing.count, of: report.missing.of }],
      ['notJudged', report.notJudged?.map((n) => ({ name: n.name, reason: n.reason }))],
    ]),
  };
  return JSON.stringify(doc, null, 2) + '\n';
}
