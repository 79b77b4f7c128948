import { beforeAll, describe, expect, it } from 'vitest';
import { prepareGate, runGate } from '../../src/gate/gate.js';
import { configFrom } from './helpers/scenario.js';
import { historySlice, runAt, timingSeries, type TimingSeries } from './helpers/timings.js';

// The group judge and ml-matrix load on demand, as the gate's callers load them (prepareGate).
beforeAll(() => prepareGate(configFrom('groups:\n  - name: timings\n    match: "time/*"\n')));

// DESIGN.md "What good looks like": about 50 timing metrics whose runner-speed noise (sd 3.5%)
// is larger than their own noise (sd 1.8%). Each of 300 runs is judged against the 100 runs
// before it, once as is (clean) and once with one metric 10% slower (a real regression).
const WINDOW = 100;
const RUNS = 300;
const SERIES = timingSeries(2026, 50, WINDOW + RUNS, 0.035, 0.018);

function measure(series: TimingSeries, yaml: string): { falseAlarms: number; recall: number } {
  const config = configFrom(yaml);
  let alarms = 0;
  let caught = 0;
  for (let k = WINDOW; k < WINDOW + RUNS; k++) {
    const history = historySlice(series, k - WINDOW, k);
    if (runGate({ config, history, run: runAt(series, k), series: 'main' }).verdict === 'regressed') alarms++;
    const target = series.names[k % series.names.length]!;
    const slower = runGate({ config, history, run: runAt(series, k, new Map([[target, 1.1]])), series: 'main' });
    if (slower.metrics.find((m) => m.name === target)?.status === 'regressed') caught++;
  }
  return { falseAlarms: (100 * alarms) / RUNS, recall: caught / RUNS };
}

describe('the DESIGN target on realistic CI noise (bounded: 300 clean + 300 regressed runs)', () => {
  it('a fixed "5% slower" rule fires on a large share of clean runs (the problem)', () => {
    let fired = 0;
    for (let k = WINDOW; k < WINDOW + RUNS; k++) {
      const history = SERIES.values.slice(k - WINDOW, k);
      const slower = SERIES.names.some((_, j) => {
        const mean = history.reduce((s, row) => s + row[j]!, 0) / WINDOW;
        return SERIES.values[k]![j]! > 1.05 * mean;
      });
      if (slower) fired++;
    }
    console.info(`fixed 5% rule: ${((100 * fired) / RUNS).toFixed(1)} false alarms per 100 clean runs`);
    // the runner's shared 3.5% moves every metric at once; own noise adds the rest
    expect(fired / RUNS).toBeGreaterThan(0.25);
  });

  it('plain per-metric Gaussian at cutoff 0.01 catches only a minority of +10% regressions', () => {
    const plain = measure(SERIES, `defaults:\n  transform: log\n  window: ${WINDOW}\n`);
    console.info(
      `plain cutoff 0.01: ${plain.falseAlarms.toFixed(2)} false alarms per 100, recall ${(100 * plain.recall).toFixed(1)}%`,
    );
    expect(plain.recall).toBeLessThan(0.5);
  }, 900_000);

  it('a group over the timings reaches <= 1 false alarm per 100 clean runs and >= 85% recall', () => {
    // cutoff 0.04 (level 0.0112) instead of the default 0.01: the setting a tuning replay picks for
    // this project, spending the group's false-alarm budget (the group is one test at that level,
    // about half of it on the worse side) on recall.
    const grouped = measure(
      SERIES,
      `defaults:\n  transform: log\n  window: ${WINDOW}\n  cutoff: 0.04\ngroups:\n  - name: timings\n    match: "time/*"\n`,
    );
    console.info(
      `group cutoff 0.04: ${grouped.falseAlarms.toFixed(2)} false alarms per 100, recall ${(100 * grouped.recall).toFixed(1)}%`,
    );
    expect(grouped.falseAlarms).toBeLessThanOrEqual(1);
    expect(grouped.recall).toBeGreaterThanOrEqual(0.85);
  }, 900_000);
});
