import { settingsFor } from '../config/rules.js';
import type { Config, MetricSettings } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import type { History } from '../history/history.js';
import type { Measurement, Run } from '../inputs/run.js';
import { unitScale } from '../inputs/units.js';
import type { MetricResult } from './report.js';
import { levelMark, type LevelStart } from './level-marks.js';

/** A metric this run can judge: its settings, scale and whole column on that scale. */
export interface Candidate {
  name: string;
  settings: MetricSettings;
  measurement: Measurement;
  /** Judged on the log scale (transform log, or auto for a timing). */
  log: boolean;
  /** +1 when higher is worse (and for both), -1 when lower is: turns moves into "worse is positive". */
  sign: 1 | -1;
  /** The metric has a time unit. */
  timing: boolean;
  /** Values on the fit scale, aligned with history.runs; NaN where a run lacks the metric. */
  values: number[];
  /** This run's value on the fit scale. */
  current: number;
  /** The newest level mark that matches the metric, if any. */
  mark?: LevelStart;
}

/**
 * Every metric named by this run or holding a value in the history, in code-unit order (the same
 * on every machine). Names come from Maps, so `__proto__` is an ordinary name.
 * @example metricNames(history, run) // ['bundle/app.js', 'time/parse']
 */
export function metricNames(history: History, run: Run): string[] {
  const names = new Set<string>(run.metrics.keys());
  for (const [name, column] of history.columns) {
    if (!names.has(name) && column.values.some((v) => Number.isFinite(v))) names.add(name);
  }
  return [...names].sort();
}

/**
 * Sorts the metrics into results that need no judging (ignored, missing, new) and candidates.
 * `transform: auto` takes the log scale for a metric with a time unit whose values are all above
 * 0 (a timing of 0 stays on its own scale rather than failing the check). Throws InputError for a
 * value that is not finite, or a value at or below 0 of a metric set to `transform: log`.
 * @example sortMetrics(config, history, run).candidates.map((c) => c.name) // ['time/parse']
 */
export function sortMetrics(
  config: Config,
  history: History,
  run: Run,
): { finished: MetricResult[]; candidates: Candidate[] } {
  const finished: MetricResult[] = [];
  const candidates: Candidate[] = [];
  for (const name of metricNames(history, run)) {
    const settings = settingsFor(config, name);
    const measurement = run.metrics.get(name);
    const column = history.columns.get(name);
    const plain = { name, cutoff: settings.cutoff, worse: settings.worse };
    if (settings.ignore) {
      finished.push({ ...plain, ...own(measurement), status: 'ignored', note: { kind: 'ignored' } });
      continue;
    }
    const held = column === undefined ? 0 : column.values.filter((v) => Number.isFinite(v)).length;
    if (measurement === undefined) {
      finished.push({ ...plain, status: 'missing', note: { kind: 'missing', runs: held } });
      continue;
    }
    if (!Number.isFinite(measurement.value)) {
      throw new InputError(`value ${measurement.value} of ${name} is not a finite number`, {
        where: name,
        fix: 'check the metric file',
      });
    }
    if (held === 0) {
      finished.push({ ...plain, ...own(measurement), status: 'new', note: { kind: 'new' } });
      continue;
    }
    const unit = measurement.unit ?? column?.unit;
    const timing = unit !== undefined && unitScale(unit)?.[0]?.dimension === 'time';
    const raw = column!.values;
    const log = onLogScale(settings, timing, raw, measurement.value, name, history);
    candidates.push({
      name,
      settings,
      measurement,
      log,
      sign: settings.worse === 'lower' ? -1 : 1,
      timing,
      values: log ? raw.map((v) => (Number.isFinite(v) ? Math.log(v) : Number.NaN)) : [...raw],
      current: log ? Math.log(measurement.value) : measurement.value,
      ...markOf(history, name),
    });
  }
  return { finished, candidates };
}

function markOf(history: History, name: string): { mark?: LevelStart } {
  const mark = levelMark(history, name);
  return mark === undefined ? {} : { mark };
}

/** Whether the metric is judged on the log scale; refuses values a configured log cannot take. */
function onLogScale(
  settings: MetricSettings,
  timing: boolean,
  column: readonly number[],
  value: number,
  name: string,
  history: History,
): boolean {
  if (settings.transform === 'none') return false;
  const bad = column.findIndex((v) => Number.isFinite(v) && !(v > 0));
  if (settings.transform === 'auto') return timing && bad < 0 && value > 0;
  if (bad >= 0) {
    throw new InputError(
      `history run ${history.runs[bad]?.id ?? bad + 1} has value ${column[bad]} for ${name}, which cannot be log-transformed`,
      { where: name, fix: 'use `transform: none` for this metric, or remove the bad run from the history' },
    );
  }
  if (!(value > 0)) {
    throw new InputError(`value ${value} cannot be log-transformed (must be > 0)`, {
      where: name,
      fix: 'use `transform: none` for this metric, or check the value',
    });
  }
  return true;
}

/** This run's own value, count and unit, for the results that are not judged. */
function own(measurement: Measurement | undefined): Partial<MetricResult> {
  if (measurement === undefined) return {};
  const fields: Partial<MetricResult> = { value: measurement.value, count: measurement.count };
  if (measurement.unit !== undefined) fields.unit = measurement.unit;
  return fields;
}
