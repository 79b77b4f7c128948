import { settingsFor } from '../config/rules.js';
import type { Config } from '../config/types.js';
import type { History } from '../history/history.js';
import type { Run } from '../inputs/run.js';
import { selectBaseline } from './baseline.js';
import type { GroupMemberInput } from './group-frame.js';
import { scoreMetric } from './judge-metric.js';
import type { MetricResult } from './report.js';

/**
 * Every metric named by this run or holding a value in the history, in code-unit order (the same
 * on every machine). Names come from Maps, so `__proto__` is an ordinary name.
 * @example metricNames(history, run) // ['bundle/app.js', 'time/parse']
 */
export function metricNames(history: History, run: Run): string[] {
  const names = new Set<string>(run.metrics.keys());
  for (const [name, column] of history.columns) {
    if (column.values.some((v) => Number.isFinite(v))) names.add(name);
  }
  return [...names].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/**
 * One metric up to its single-metric score: `ignored` by a rule, `missing` from this run, `new`,
 * `learning`, or a scored entry (with its baseline) that groups and family control decide on.
 * With `relative-to`, this run's value becomes metric / reference; a run lacking a usable
 * reference gets a result that says so instead of a crash.
 * @example judgeName(config, history, run, 'time/parse') // { score, baseline }
 */
export function judgeName(
  config: Config,
  history: History,
  run: Run,
  name: string,
): GroupMemberInput | { result: MetricResult } {
  const settings = settingsFor(config, name);
  const measurement = run.metrics.get(name);
  const plain = { name, cutoff: settings.cutoff, worse: settings.worse };
  const own =
    measurement === undefined
      ? {}
      : { value: measurement.value, count: measurement.count, ...(measurement.unit === undefined ? {} : { unit: measurement.unit }) };
  if (settings.ignore) {
    return { result: { ...plain, ...own, status: 'ignored', reason: 'matched a rule with ignore: true' } };
  }
  const baseline = selectBaseline(history, name, settings);
  if (measurement === undefined) {
    const runs = `${baseline.available} run${baseline.available === 1 ? '' : 's'}`;
    return { result: { ...plain, status: 'missing', reason: `in the history (${runs}) but absent from this run` } };
  }
  let value = measurement.value;
  if (settings.relativeTo !== undefined) {
    const reference = run.metrics.get(settings.relativeTo)?.value;
    if (reference === undefined || !Number.isFinite(reference) || reference === 0) {
      const lacks = reference === undefined ? 'lacks' : `has ${reference} for`;
      const reason = `cannot be judged relative to ${settings.relativeTo}: this run ${lacks} that metric`;
      return { result: { ...plain, ...own, status: baseline.values.length === 0 ? 'new' : 'missing', reason } };
    }
    value /= reference;
  }
  const extras = {
    count: measurement.count,
    // a ratio has no unit
    ...(measurement.unit === undefined || settings.relativeTo !== undefined ? {} : { unit: measurement.unit }),
    ...(baseline.since === undefined ? {} : { since: baseline.since }),
    ...(baseline.relativeTo === undefined ? {} : { relativeTo: baseline.relativeTo }),
  };
  const score = scoreMetric(name, settings, baseline.values, value, extras);
  return score.scored ? { score, baseline } : { result: score.result };
}
