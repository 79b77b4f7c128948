import type { History } from '../../../src/history/history.js';
import type { Run } from '../../../src/inputs/run.js';
import { seededNormal } from '../../model/random.js';

/**
 * Invented CI timings: `metrics` benchmarks "time/bench-NN", each run multiplied by one shared
 * runner-speed factor exp(N(0, runnerSd)) and by its own noise exp(N(0, ownSd)) — the situation of
 * the simulated project of test/noise/simulate.ts, where the runner's noise is larger than each metric's own.
 */
export interface TimingSeries {
  names: string[];
  /** values[k][j]: run k, metric j. */
  values: number[][];
  /** The shared runner-speed log factor of each run, and each metric's noise-free value. */
  runner: number[];
  bases: number[];
}

export function timingSeries(
  seed: number,
  metrics: number,
  runs: number,
  runnerSd: number,
  ownSd: number,
): TimingSeries {
  const normal = seededNormal(seed);
  const names = Array.from({ length: metrics }, (_, j) => `time/bench-${String(j).padStart(2, '0')}`);
  const bases = names.map((_, j) => 20 + 7 * j);
  const runner: number[] = [];
  const values = Array.from({ length: runs }, () => {
    const speed = runnerSd * normal();
    runner.push(speed);
    return bases.map((b) => b * Math.exp(speed + ownSd * normal()));
  });
  return { names, values, runner, bases };
}

/** The history of runs [from, to) of a series, ids "run-<k>". */
export function historySlice(series: TimingSeries, from: number, to: number): History {
  const runs = [];
  for (let k = from; k < to; k++) runs.push({ id: `run-${k}` });
  const columns = new Map(
    series.names.map((name, j) => [name, { unit: 'ms', values: series.values.slice(from, to).map((row) => row[j]!) }]),
  );
  return { series: 'main', runs, columns };
}

/** Run k of a series as a Run, with optional factors applied to some metrics. */
export function runAt(series: TimingSeries, k: number, factors: ReadonlyMap<string, number> = new Map()): Run {
  const metrics = new Map(
    series.names.map((name, j) => [
      name,
      { value: series.values[k]![j]! * (factors.get(name) ?? 1), unit: 'ms', count: 1 },
    ]),
  );
  return { metrics, meta: new Map() };
}
