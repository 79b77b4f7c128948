import { describe, expect, it } from 'vitest';
import { runGate } from '../../src/gate/gate.js';
import type { History } from '../../src/history/history.js';
import type { Run } from '../../src/inputs/run.js';
import { seededNormal } from '../model/random.js';
import { configFrom } from './helpers/scenario.js';

const METRICS = 200;
const RUNS = 200;
const WINDOW = 30;

/** One run of pure noise: a fresh 30-run history and a new value for each of 200 metrics. */
function noiseRun(normal: () => number): { history: History; run: Run } {
  const names = Array.from({ length: METRICS }, (_, j) => `noise/${j}`);
  const columns = new Map(names.map((name) => [name, { values: Array.from({ length: WINDOW }, () => 50 + normal()) }]));
  const runs = Array.from({ length: WINDOW }, (_, i) => ({ id: `run-${i + 1}` }));
  const metrics = new Map(names.map((name) => [name, { value: 50 + normal(), count: 1 }]));
  return { history: { series: 'main', runs, columns }, run: { metrics, meta: new Map() } };
}

/**
 * Binomial quantile: smallest k with P(X <= k) >= q for X ~ Bin(n, p), summing the pmf by its
 * recurrence pmf(k + 1) = pmf(k) (n - k) / (k + 1) p / (1 - p), pmf(0) = (1 - p)^n.
 */
function binomialQuantile(n: number, p: number, q: number): number {
  let pmf = (1 - p) ** n;
  let cumulative = pmf;
  for (let k = 0; k < n; k++) {
    if (cumulative >= q) return k;
    pmf *= ((n - k) / (k + 1)) * (p / (1 - p));
    cumulative += pmf;
  }
  return n;
}

describe('family control over many metrics (issue 6), simulated', () => {
  it('holm keeps the share of runs with any false alarm near the level; none does not', () => {
    // A budget of 7% (large enough to count in 200 runs; cutoff 0.2 for `none`, 1.79 sd two-sided).
    // worse: both, so the whole two-sided level counts; tolerance 0 so only the statistics decide.
    const yaml = (family: string) =>
      `family: ${family}\nbudget: 7%\ndefaults:\n  cutoff: 0.2\n  worse: both\n  tolerance: 0\n  min-runs: 8\n  window: ${WINDOW}\n  change-points: false\n`;
    const holm = configFrom(yaml('holm'));
    const none = configFrom(yaml('none'));
    const level = 0.07;
    const normal = seededNormal(20261201);
    let holmRuns = 0;
    let noneRuns = 0;
    for (let i = 0; i < RUNS; i++) {
      const { history, run } = noiseRun(normal);
      if (runGate({ config: holm, history, run, series: 'main' }).verdict === 'regressed') holmRuns++;
      if (runGate({ config: none, history, run, series: 'main' }).verdict === 'regressed') noneRuns++;
    }
    // Holm (1979) bounds the chance of any false alarm by the budget; with independent metrics it
    // is close to it (1 - (1 - 0.07/200)^200 = 0.0676). The predictive (moderated variances, fitted
    // tails) must not lose that: the count must lie between the 0.1% quantile of Bin(200, 0.0676)
    // and the 99.9% quantile of Bin(200, 0.07) (about 4 and 26).
    console.info(`family simulation: runs with a false alarm, holm ${holmRuns}/${RUNS}, none ${noneRuns}/${RUNS}`);
    const familyRate = 1 - (1 - level / METRICS) ** METRICS;
    expect(holmRuns).toBeGreaterThanOrEqual(binomialQuantile(RUNS, familyRate, 0.001));
    expect(holmRuns).toBeLessThanOrEqual(binomialQuantile(RUNS, level, 0.999));
    // Without control each run holds 200 chances of 0.07: nearly every run has an alarm.
    expect(noneRuns / RUNS).toBeGreaterThan(0.9);
  }, 300_000);
});
