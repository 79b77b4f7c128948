import { settingsFor } from '../config/rules.js';
import type { Config, MetricSettings } from '../config/types.js';
import type { History } from '../history/history.js';
import type { Measurement, Run } from '../inputs/run.js';
import { selectBaseline } from './baseline.js';
import type { GroupMemberInput } from './group-frame.js';
import { scoreMetric, type JudgeExtras } from './judge-metric.js';
import type { MetricResult } from './report.js';

/**
 * Every metric named by this run or holding a value in the history, in code-unit order (the same
 * on every machine). Names come from Maps, so `__proto__` is an ordinary name.
 * @example metricNames(history, run) // ['bundle/app.js', 'time/parse']
 */
export function metricNames(history: History, run: Run): string[] {
  const names = new Set<string>(run.metrics.keys());
  for (const [name, column] of history.columns) {
    if (!names.has(name) && holdsValue(column.values)) names.add(name);
  }
  // The default sort compares strings by UTF-16 code units, the same order as `<`, without a
  // callback per comparison.
  return [...names].sort();
}

/** Whether any value is finite (a plain loop: `some` with a closure costs more per metric). */
function holdsValue(values: readonly number[]): boolean {
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) return true;
  return false;
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
  if (settings.ignore) {
    return {
      result: {
        ...plain(name, settings),
        ...own(measurement),
        status: 'ignored',
        reason: 'matched a rule with ignore: true',
      },
    };
  }
  const baseline = selectBaseline(history, name, settings);
  if (measurement === undefined) {
    const runs = `${baseline.available} run${baseline.available === 1 ? '' : 's'}`;
    const notFitted = run.notFitted?.get(name);
    return {
      result: {
        ...plain(name, settings),
        status: 'missing',
        reason:
          notFitted === undefined
            ? `in the history (${runs}) but absent from this run`
            : `in the history (${runs}) but not judged in this run: ${notFitted}`,
      },
    };
  }
  let value = measurement.value;
  if (settings.relativeTo !== undefined) {
    const reference = run.metrics.get(settings.relativeTo)?.value;
    if (reference === undefined || !Number.isFinite(reference) || reference === 0) {
      const lacks = reference === undefined ? 'lacks' : `has ${reference} for`;
      const reason = `cannot be judged relative to ${settings.relativeTo}: this run ${lacks} that metric`;
      const status = baseline.values.length === 0 ? 'new' : 'missing';
      return { result: { ...plain(name, settings), ...own(measurement), status, reason } };
    }
    value /= reference;
  }
  // Set key by key rather than spread: this runs once per metric.
  const extras: JudgeExtras = { count: measurement.count };
  // a ratio has no unit
  if (measurement.unit !== undefined && settings.relativeTo === undefined) extras.unit = measurement.unit;
  if (baseline.since !== undefined) extras.since = baseline.since;
  if (baseline.relativeTo !== undefined) extras.relativeTo = baseline.relativeTo;
  const score = scoreMetric(name, settings, baseline.values, value, extras);
  return score.scored ? { score, baseline } : { result: score.result };
}

/** The fields every result of this metric starts with. */
function plain(name: string, settings: MetricSettings): Pick<MetricResult, 'name' | 'cutoff' | 'worse'> {
  return { name, cutoff: settings.cutoff, worse: settings.worse };
}

/** This run's own value, count and unit, for the results that are not scored. */
function own(measurement: Measurement | undefined): Partial<MetricResult> {
  if (measurement === undefined) return {};
  const fields: Partial<MetricResult> = { value: measurement.value, count: measurement.count };
  if (measurement.unit !== undefined) fields.unit = measurement.unit;
  return fields;
}
