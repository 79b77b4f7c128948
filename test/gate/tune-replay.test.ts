import { describe, expect, it } from 'vitest';
import type { MetricSettings } from '../../src/config/types.js';
import { replayHistory } from '../../src/gate/tune/replay.js';
import type { MetricReplay } from '../../src/gate/tune/replay-point.js';
import type { History } from '../../src/history/history.js';
import { expectClose } from '../helpers/close.js';
import { jStat } from '../model/jstat.js';
import { seededNormal, seededUniform } from '../model/random.js';
import { historyOf, settingsWith } from './helpers/scenario.js';
import { defaultConfig } from '../../src/config/load.js';

/** Both replays of one history under one `defaults` block. */
function bothReplays(
  history: History,
  defaults: Partial<MetricSettings>,
): { fast: MetricReplay[]; slow: MetricReplay[] } {
  const config = { ...defaultConfig(), defaults: settingsWith(defaults) };
  return {
    fast: replayHistory(config, history).metrics,
    slow: replayHistory(config, history, { refit: true }).metrics,
  };
}

/** log r and tails agree to 1e-9 (relative, or absolute near 0); sides and runs are equal. */
function expectSameReplay(fast: MetricReplay[], slow: MetricReplay[]): void {
  expect(fast.map((m) => m.name)).toEqual(slow.map((m) => m.name));
  fast.forEach((f, j) => {
    const s = slow[j]!;
    expect(f.method).toBe('incremental');
    expect(s.method).toBe('refit');
    expect(f.run).toEqual(s.run);
    expect(f.side).toEqual(s.side);
    f.relativeDensity.forEach((r, p) => {
      const q = s.relativeDensity[p]!;
      if (q === 0 || r === 0) expect(r).toBe(q);
      else expectClose(Math.log(r), Math.log(q), 1e-9, 1e-9);
      expectClose(f.tail[p]!, s.tail[p]!, 1e-9, 1e-12);
    });
  });
}

describe('replay: incremental sliding window equals the refit of every baseline', () => {
  const normal = seededNormal(20261201);
  const uniform = seededUniform(7);
  const n = 400;
  // Offsets of 1e6 with unit noise stress the running moments (a naive sum of squares loses ~12 digits there).
  const history = historyOf({
    'build/time': Array.from({ length: n }, () => 1e6 + normal()),
    'latency/p50': Array.from({ length: n }, () => Math.exp(3 + 0.2 * normal())),
    'size/bundle': Array.from({ length: n }, () => 40000 + Math.round(20 * uniform())),
    'flat/constant': Array.from({ length: n }, (_, i) => (i % 50 === 49 ? 101 : 100)),
    'sparse/one': Array.from({ length: n }, (_, i) => (i % 3 === 0 ? NaN : 50 + normal())),
    calibrate: Array.from({ length: n }, () => 10 + 0.1 * normal()),
  });

  it.each([
    ['plain scale', { transform: 'none', changePoints: false }],
    ['log transform, window 25', { transform: 'log', window: 25, changePoints: false }],
    ['resolution floor 0.5, both sides', { resolution: 0.5, worse: 'both', changePoints: false }],
    [
      'relative-to a calibration metric',
      { relativeTo: 'calibrate', changePoints: false, tolerance: { kind: 'absolute', amount: 0 } },
    ],
    ['min-runs 2, window 3', { minRuns: 2, window: 3, changePoints: false }],
  ] as [string, Partial<MetricSettings>][])('%s', (_, defaults) => {
    const { fast, slow } = bothReplays(history, defaults);
    expectSameReplay(fast, slow);
    expect(fast.reduce((a, m) => a + m.run.length, 0)).toBeGreaterThan(1000);
  });

  it('falls back to refitting for change points', () => {
    const cp = bothReplays(history, { changePoints: true });
    expect(cp.fast.every((m) => m.method === 'refit')).toBe(true);
  });
});

describe('replay decides as the gate does', () => {
  it('a replayed relative density equals the Student-t density ratio of jstat (second opinion)', () => {
    // Baseline 9, 10, 11, 10, 10, 9, 11, 10 then 13: mean 10, s = sqrt(4/7) (n - 1 divisor),
    // t = 3 / (s sqrt(1 + 1/8)), r = f_t(t; 7) / f_t(0; 7) (Gelman et al., BDA section 3.2).
    const history = historyOf({ 'bench/parse': [9, 10, 11, 10, 10, 9, 11, 10, 13] });
    const config = { ...defaultConfig(), defaults: settingsWith({ changePoints: false }) };
    const [m] = replayHistory(config, history).metrics;
    expect(m!.run).toEqual([8]);
    const t = 3 / (Math.sqrt(4 / 7) * Math.sqrt(1 + 1 / 8));
    expectClose(m!.relativeDensity[0]!, jStat.studentt.pdf(t, 7) / jStat.studentt.pdf(0, 7), 1e-9);
    expectClose(m!.tail[0]!, 2 * (1 - jStat.studentt.cdf(t, 7)), 1e-7);
    expect(m!.side[0]).toBe(1);
  });
});
