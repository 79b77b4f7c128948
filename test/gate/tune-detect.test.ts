import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../src/config/load.js';
import type { Config } from '../../src/config/types.js';
import { tuneHistory } from '../../src/gate/tune/tune.js';
import type { RegressionLabel } from '../../src/gate/tune/labels.js';
import { jStat } from '../model/jstat.js';
import { seededNormal, seededUniform } from '../model/random.js';
import { historyOf, settingsWith } from './helpers/scenario.js';

const METRICS = 20;
const RUNS = 240;
const config: Config = {
  ...defaultConfig(),
  defaults: settingsWith({ changePoints: false, tolerance: { kind: 'absolute', amount: 0 }, window: 60, minRuns: 8 }),
};

/** 20 metrics of 240 runs, 1000 + 10 N(0, 1) each, from a seeded source; `shift` adds to chosen cells. */
function syntheticHistory(seed: number, shift: (run: number, metric: number) => number = () => 0) {
  const normal = seededNormal(seed);
  const columns: Record<string, number[]> = {};
  for (let j = 0; j < METRICS; j++) {
    columns[`bench/m${String(j).padStart(2, '0')}`] = Array.from(
      { length: RUNS },
      (_, i) => 1000 + 10 * normal() + shift(i, j),
    );
  }
  return historyOf(columns);
}

describe('tune finds injected regressions in a seeded history', () => {
  const uniform = seededUniform(4242);
  const injected = new Map<number, number>();
  while (injected.size < 12) injected.set(30 + Math.floor(uniform() * (RUNS - 30)), Math.floor(uniform() * METRICS));
  // +8 sd on one metric of 12 runs: far beyond any cutoff of the ladder, so a good cutoff catches all.
  const history = syntheticHistory(1201, (run, metric) => (injected.get(run) === metric ? 80 : 0));
  const labels: RegressionLabel[] = [...injected].map(([run, metric]) => ({
    run: `run-${run + 1}`,
    metric: `bench/m${String(metric).padStart(2, '0')}`,
    where: 'labels.yml:1:1',
  }));
  const result = tuneHistory({ config, history, labels });
  const rows = result.ladders.get('none')!;

  it('catches the injected regressions with high precision at a strict cutoff', () => {
    const strict = rows.find((r) => r.cutoff === 1e-4)!.labelled!;
    expect(strict.labels).toBe(12);
    expect(strict.recall).toBeGreaterThanOrEqual(0.9);
    expect(strict.precision).toBeGreaterThanOrEqual(0.9);
  });

  it('a loose cutoff keeps the recall but loses precision to false alarms', () => {
    const loose = rows.find((r) => r.cutoff === 0.1)!.labelled!;
    expect(loose.recall).toBeGreaterThanOrEqual(0.9);
    expect(loose.precision).toBeLessThan(0.5);
  });

  it('the suggestion is the F1-optimal cutoff, and it is strict', () => {
    expect(result.labels?.best?.f1).toBeGreaterThanOrEqual(0.9);
    expect(result.suggestion.cutoff).toBe(result.labels!.best!.cutoff);
    expect(result.suggestion.cutoff).toBeLessThanOrEqual(0.001);
    expect(result.metricsPerRun).toBe(20);
    expect(result.suggestion.family).toBe('holm'); // 20 metrics a run is "many"
  });
});

describe('false alarms on a clean Gaussian history match the Student-t tail (jstat)', () => {
  // For Gaussian data the predictive t = (x - mean) / (s sqrt(1 + 1/n)) is exactly Student-t with
  // n - 1 dof, so P(r < c on the worse side) = P(T > t*) with t*^2 = nu (c^(-2/(nu+1)) - 1)
  // (solving (1 + t^2/nu)^(-(nu+1)/2) = c). Summed over every judged (run, metric) with jstat's t CDF.
  const history = syntheticHistory(777);
  const result = tuneHistory({ config, history });

  it.each([0.1, 0.01])('cutoff %s', (cutoff) => {
    let expected = 0;
    let variance = 0;
    for (let k = 8; k < RUNS; k++) {
      const n = Math.min(k, 60);
      const nu = n - 1;
      const t = Math.sqrt(nu * (Math.pow(cutoff, -2 / (nu + 1)) - 1));
      const p = 1 - jStat.studentt.cdf(t, nu);
      expected += METRICS * p;
      variance += METRICS * p * (1 - p);
    }
    const row = result.ladders.get('none')!.find((r) => r.cutoff === cutoff)!;
    // Points share baselines, so allow 5 binomial sd.
    expect(Math.abs(row.falseAlarms - expected)).toBeLessThan(5 * Math.sqrt(variance) + 1);
    expect(row.alarmsPerRun).toBeCloseTo(row.falseAlarms / (RUNS - 8), 12);
  });
});

describe('too little history', () => {
  it('with no run judged, the configured cutoff is kept and nothing is suggested per metric', () => {
    // 5 runs < min-runs 8: every replayed run is still learning.
    const history = historyOf({ 'bench/a': [1, 2, 3, 4, 5], 'bench/b': [5, 4, 3, 2, 1] });
    const result = tuneHistory({ config, history });
    expect(result.replayedRuns).toBe(0);
    expect(result.suggestion.cutoff).toBe(config.defaults.cutoff);
    expect(result.suggestion.reason).toMatch(/no evidence yet/);
    expect(result.suggestion.rules).toEqual([]);
  });
});
