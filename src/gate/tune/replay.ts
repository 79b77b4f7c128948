import { settingsFor } from '../../config/rules.js';
import type { Config } from '../../config/types.js';
import type { History, MetricColumn } from '../../history/history.js';
import type { Measurement, Run } from '../../inputs/run.js';
import { median } from '../../model/median.js';
import { runGate } from '../gate.js';
import type { Report } from '../report.js';

/** One injected regression: run `run`'s `metric` moved by `shift` (0.1 = 10%) on its worse side. */
export interface Injection {
  run: number;
  metric: string;
  shift: number;
}

/** The runs a replay judges (indexes into history.runs) and the regressions injected into them. */
export interface ReplayPlan {
  runs: number[];
  /** Runs known to be regressions (labels): judged, but neither clean trials nor injected. */
  labelled: ReadonlySet<number>;
  injections: Injection[];
}

/** Injected shift sizes (issue 13 item 7). */
export const SHIFTS: readonly number[] = [0.05, 0.1, 0.2];

/** Newest runs replayed by default: bounds the time (every run is a few gate calls per setting). */
export const DEFAULT_LAST = 100;

/**
 * The replay plan: the newest `last` runs from min-runs on, each judged against the runs before
 * it, and per judged run and shift size `perSize` injections, each on one metric of the run.
 * Metrics are taken in turn per size (offset between sizes), so every size visits every metric
 * evenly and one run carries different metrics for different sizes. Deterministic.
 */
export function replayPlan(
  config: Config,
  history: History,
  options: { last?: number; perSize?: number; labelled?: ReadonlySet<number>; shifts?: readonly number[] } = {},
): ReplayPlan {
  const last = options.last ?? DEFAULT_LAST;
  const perSize = options.perSize ?? 1;
  const shifts = options.shifts ?? SHIFTS;
  const labelled = options.labelled ?? new Set<number>();
  const first = Math.max(1, config.defaults.minRuns, history.runs.length - last);
  const runs: number[] = [];
  for (let k = first; k < history.runs.length; k++) runs.push(k);
  const injections: Injection[] = [];
  let turn = 0;
  for (const k of runs) {
    if (labelled.has(k)) continue;
    const names = injectable(config, history, k);
    if (names.length === 0) continue;
    const offset = Math.max(1, Math.floor(names.length / shifts.length));
    for (let r = 0; r < perSize; r++, turn++)
      shifts.forEach((shift, si) =>
        injections.push({ run: k, metric: names[(turn + si * offset) % names.length]!, shift }),
      );
  }
  return { runs, labelled, injections };
}

/** Metrics of run k that a rule does not ignore and that the runs before it hold. */
function injectable(config: Config, history: History, k: number): string[] {
  const names: string[] = [];
  for (const [name, column] of history.columns) {
    if (!Number.isFinite(column.values[k]!) || settingsFor(config, name).ignore) continue;
    if (column.values.slice(0, k).some((v) => Number.isFinite(v))) names.push(name);
  }
  return names.sort();
}

/** Runs after an alarm that must hold its level for it to count as a lasting step, not a false alarm. */
export const HOLD_RUNS = 5;

/**
 * Whether an alarm of run k on `name` (value and relative change from the report) was a real
 * lasting step of the history rather than a false alarm: the median of the metric's next
 * HOLD_RUNS values (later runs of the history, which the replay of run k never saw) keeps at least
 * half of the change, on the same side, from the same centre. A history with a merged change
 * flags it when it comes; calling that a false alarm would punish the gate for being right.
 * False when fewer than HOLD_RUNS later runs hold the metric (the end of the history: no hindsight).
 * @example holdsLater(history, 30, 'timing/t27', 118, 0.18) // true for a +15% step kept since
 */
export function holdsLater(history: History, k: number, name: string, value: number, change: number): boolean {
  const column = history.columns.get(name);
  if (column === undefined || !Number.isFinite(change) || change === 0) return false;
  const later: number[] = [];
  for (let i = k + 1; i < history.runs.length && later.length < HOLD_RUNS; i++)
    if (Number.isFinite(column.values[i]!)) later.push(column.values[i]!);
  if (later.length < HOLD_RUNS) return false;
  const centre = value / (1 + change);
  const kept = (median(later) - centre) / centre;
  return Math.sign(kept) === Math.sign(change) && Math.abs(kept) >= Math.abs(change) / 2;
}

/** The history before run k: what the gate knew when run k came. */
export function historyBefore(history: History, k: number): History {
  const columns = new Map<string, MetricColumn>();
  for (const [name, column] of history.columns)
    columns.set(name, {
      ...(column.unit === undefined ? {} : { unit: column.unit }),
      values: column.values.slice(0, k),
    });
  return { ...history, runs: history.runs.slice(0, k), columns };
}

/** Run k of the history as a Run to judge, with an injected shift when given. */
export function runAt(config: Config, history: History, k: number, injection?: Injection): Run {
  const metrics = new Map<string, Measurement>();
  for (const [name, column] of history.columns) {
    let value = column.values[k]!;
    if (!Number.isFinite(value)) continue;
    if (injection?.metric === name) {
      const lower = settingsFor(config, name).worse === 'lower';
      value *= lower ? 1 - injection.shift : 1 + injection.shift;
    }
    metrics.set(name, { value, count: 1, ...(column.unit === undefined ? {} : { unit: column.unit }) });
  }
  return { metrics, meta: new Map() };
}

/**
 * Replays the real gate (runGate) over the plan with one config: every planned run clean, then
 * every injection, each judged against the runs before it. `visit` sees each report. Pure.
 * Cost: (runs + injections) gate calls.
 */
export function replayGate(
  config: Config,
  history: History,
  plan: ReplayPlan,
  visit: { clean: (k: number, report: Report) => void; injected: (i: Injection, report: Report) => void },
  tick: () => void = () => {},
): void {
  const before = new Map<number, History>();
  const prefix = (k: number): History => {
    let h = before.get(k);
    if (h === undefined) before.set(k, (h = historyBefore(history, k)));
    return h;
  };
  const judge = (k: number, injection?: Injection): Report => {
    const runner = history.runs[k]!.runner;
    return runGate({
      config,
      history: prefix(k),
      run: runAt(config, history, k, injection),
      series: history.series,
      ...(runner === undefined ? {} : { runner }),
    });
  };
  for (const k of plan.runs) {
    visit.clean(k, judge(k));
    tick();
  }
  for (const injection of plan.injections) {
    visit.injected(injection, judge(injection.run, injection));
    tick();
  }
}
