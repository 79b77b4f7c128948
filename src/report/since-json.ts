import type { SinceMetric, SinceReport } from '../gate/since/since-report.js';
import { metricSentence } from './since-words.js';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** JSON has no NaN or Infinity: a number that is not finite becomes null. */
const num = (x: number | null | undefined): number | null => (x != null && Number.isFinite(x) ? x : null);
const opt = <T>(key: string, value: T | undefined, as: (v: T) => Json): Record<string, Json> =>
  value === undefined ? {} : { [key]: as(value) };

function runFields(r: { run: string; sha?: string; pr?: number; time?: string }): Record<string, Json> {
  return { run: r.run, sha: r.sha ?? null, pr: num(r.pr), time: r.time ?? null };
}

function metric(m: SinceMetric, report: SinceReport): Json {
  return {
    name: m.name,
    unit: m.unit ?? null,
    status: m.status,
    worse: m.worse,
    scale: m.scale,
    then: m.then ? { n: m.then.n, level: num(m.then.level), from: m.then.from, to: m.then.to } : null,
    now: m.now ? { n: m.now.n, level: num(m.now.level), from: m.now.from, to: m.now.to } : null,
    ratio: num(m.ratio),
    lower: num(m.lower),
    upper: num(m.upper),
    p: num(m.p),
    adjusted: num(m.adjusted),
    steps: m.steps.map((s) => ({
      ...runFields(s),
      offset: s.offset,
      ratio: num(s.ratio),
      p: num(s.p),
      ...opt('mark', s.mark, (k) => ({ ...runFields(k), reason: k.reason, note: k.note ?? null })),
    })),
    creep: m.creep
      ? {
          slope: num(m.creep.slope),
          lower: num(m.creep.lower),
          upper: num(m.creep.upper),
          p: num(m.creep.p),
          adjusted: num(m.creep.adjusted),
          s: m.creep.s,
          tau: num(m.creep.tau),
          runs: m.creep.runs,
          segments: m.creep.segments,
          reported: m.creep.reported,
        }
      : null,
    accepted: m.accepted.map((k) => ({ ...runFields(k), offset: k.offset, reason: k.reason, note: k.note ?? null })),
    summary: metricSentence(m, report),
  };
}

/**
 * The release review as JSON (schema bellgate.since/1): schema, series, reference (with
 * `exact` and the `note` when an earlier run stands in), latest, runs, settings, metrics[] with
 * name, unit, status, ratio and its interval, p and adjusted, steps[] (run, sha, pr, offset,
 * ratio, p, mark), creep (slope per run as a relative change, its interval, p, adjusted,
 * reported) and accepted[]. Every field is present (null when unknown) so consumers can rely on
 * the shape; non-finite numbers become null. 2-space indent, ends with a newline.
 * @example JSON.parse(renderSinceJson(report)).metrics[0].creep.slope // 0.0041
 */
export function renderSinceJson(report: SinceReport): string {
  const ref = report.reference;
  const doc: Json = {
    schema: report.schema,
    series: report.series,
    reference: {
      ...runFields(ref),
      index: ref.index,
      requested: {
        run: ref.requested.run ?? null,
        sha: ref.requested.sha ?? null,
        time: ref.requested.time ?? null,
      },
      exact: ref.exact,
      note: ref.note ?? null,
    },
    latest: runFields(report.latest),
    runs: report.runs,
    settings: { ...report.settings },
    metrics: report.metrics.map((m) => metric(m, report)),
  };
  return JSON.stringify(doc, null, 2) + '\n';
}
