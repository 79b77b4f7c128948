import { describe, expect, it } from 'vitest';
import { labelScore, scoreLadder } from '../../src/gate/tune/ladder.js';
import type { Replay } from '../../src/gate/tune/replay.js';
import type { MetricReplay, Side } from '../../src/gate/tune/replay-point.js';
import { bestF1, chooseCutoff, loosestUnder, noisyMetricRules, recommendFamily } from '../../src/gate/tune/suggest.js';
import { buildTruth } from '../../src/gate/tune/truth.js';
import { expectClose } from '../helpers/close.js';
import { historyOf } from './helpers/scenario.js';

function metric(
  name: string,
  r: number[],
  options: { tail?: number[]; side?: Side[]; runs?: number[] } = {},
): MetricReplay {
  return {
    name,
    method: 'incremental',
    run: options.runs ?? r.map((_, i) => i + 1),
    relativeDensity: r,
    tail: options.tail ?? r.map(() => 1),
    side: options.side ?? r.map(() => 1 as Side),
  };
}

describe('precision, recall and F1 against labels', () => {
  // One metric replayed in runs 1..6 with relative densities 0.5, 0.03, 0.008, 0.004, 0.0005, 0.2,
  // all on the worse side; runs 3, 4 and 6 are labelled regressions (run 6 is one the gate cannot see).
  // By hand (F1 = 2PR / (P + R)):
  //   cutoff 0.1 : alarms runs 2, 3, 4, 5 -> TP 2, FP 2: P 1/2, R 2/3, F1 4/7  = 0.5714
  //   cutoff 0.05: the same alarms                      -> F1 4/7
  //   cutoff 0.01: alarms runs 3, 4, 5    -> TP 2, FP 1: P 2/3, R 2/3, F1 2/3  = 0.6667  <- best
  //   cutoff 0.005: alarms runs 4, 5      -> TP 1, FP 1: P 1/2, R 1/3, F1 2/5
  //   cutoff 0.001: alarm run 5           -> TP 0:                     F1 0
  const replay: Replay = { runCount: 7, metrics: [metric('bench/a', [0.5, 0.03, 0.008, 0.004, 0.0005, 0.2])] };
  const history = historyOf({ 'bench/a': [1, 1, 1, 1, 1, 1, 1] });
  const truth = buildTruth(
    ['run-4', 'run-5', 'run-7'].map((run) => ({ run, where: 'labels.yml:1:1' })),
    history,
  );
  const rows = scoreLadder(replay, [0.1, 0.05, 0.01, 0.005, 0.001], 'none', truth);

  it('scores each cutoff as computed by hand', () => {
    const f1 = rows.map((r) => r.labelled!.f1);
    [4 / 7, 4 / 7, 2 / 3, 2 / 5, 0].forEach((expected, i) => expectClose(f1[i]!, expected, 1e-12));
    expectClose(rows[2]!.labelled!.precision, 2 / 3, 1e-12);
    expectClose(rows[2]!.labelled!.recall, 2 / 3, 1e-12);
    expect(rows.map((r) => r.falseAlarms)).toEqual([2, 2, 1, 1, 1]);
  });

  it('the F1-optimal cutoff is 0.01, as computed by hand', () => {
    expect(bestF1(rows)?.cutoff).toBe(0.01);
    expect(chooseCutoff(rows, 1, true).cutoff).toBe(0.01);
  });

  it('a metric label covers only that metric; a run label covers every metric of the run', () => {
    const two: Replay = { runCount: 3, metrics: [metric('a', [0.001, 0.5]), metric('b', [0.001, 0.001])] };
    const h = historyOf({ a: [1, 1, 1], b: [1, 1, 1] });
    const labelled = buildTruth(
      [
        { run: 'run-2', metric: 'a', where: '' },
        { run: 'run-3', where: '' },
      ],
      h,
    );
    const [row] = scoreLadder(two, [0.01], 'none', labelled);
    // Alarms: a@run1 (labelled), b@run1 (not), b@run2 (run label) -> 2 true, 1 false; both labels caught.
    expect(row!.labelled).toEqual(labelScore(2, 2, 2, 1));
    expect(row!.perMetric).toEqual([0, 1]);
  });
});

describe('family settings on the ladder', () => {
  // One run, three metrics with tails 0.001, 0.012, 0.02 (worse side), relative densities 0.5.
  // Level of cutoff 0.1: sqrt(-2 ln 0.1) = 2.146 sd, two-sided normal tail between 2 x (1 - 0.98422)
  // = 0.0316 at 2.15 and 2 x (1 - 0.98382) = 0.0324 at 2.14 (Abramowitz & Stegun table 26.1, from memory).
  // By hand: bonferroni 0.003, 0.036, 0.06 -> 1 alarm; holm (Holm 1979) 0.003, 0.024, 0.024 -> 3;
  // fdr (Benjamini & Hochberg 1995) 0.003, 0.018, 0.02 -> 3; none: r 0.5 >= 0.1 -> 0.
  const replay: Replay = {
    runCount: 2,
    metrics: ['a', 'b', 'c'].map((name, i) => metric(name, [0.5], { tail: [[0.001, 0.012, 0.02][i]!] })),
  };

  it('counts alarms per family as computed by hand', () => {
    const count = (family: 'none' | 'bonferroni' | 'holm' | 'fdr'): number =>
      scoreLadder(replay, [0.1], family)[0]!.falseAlarms;
    const level = scoreLadder(replay, [0.1], 'none')[0]!.level;
    expect(level).toBeGreaterThan(0.0315);
    expect(level).toBeLessThan(0.0325);
    expect([count('none'), count('bonferroni'), count('holm'), count('fdr')]).toEqual([0, 1, 3, 3]);
  });

  it('a better-side or within-tolerance move never alarms', () => {
    const quiet: Replay = {
      runCount: 2,
      metrics: [metric('a', [1e-9], { side: [-1] }), metric('b', [1e-9], { side: [0] })],
    };
    expect(scoreLadder(quiet, [0.1], 'none')[0]!.falseAlarms).toBe(0);
  });
});

describe('--target: the loosest cutoff under the false-alarm target', () => {
  // 100 runs of one metric: 10 runs below 0.1, 5 below 0.05, 1 below 0.01, none below 0.005,
  // so runs flagged per 100 are 10, 5, 1, 0, 0 for cutoffs 0.1, 0.05, 0.01, 0.005, 0.001.
  const r = Array.from({ length: 100 }, (_, i) => (i < 1 ? 0.006 : i < 5 ? 0.02 : i < 10 ? 0.07 : 0.9));
  const rows = scoreLadder({ runCount: 101, metrics: [metric('a', r)] }, [0.1, 0.05, 0.01, 0.005, 0.001], 'none');

  it('counts runs flagged per 100', () => {
    expect(rows.map((row) => row.runsFlaggedPer100)).toEqual([10, 5, 1, 0, 0]);
  });

  it.each([
    [10, 0.1],
    [5, 0.05],
    [4.9, 0.01],
    [1, 0.01],
    [0.5, 0.005],
    [0, 0.005],
  ])('target %s per 100 picks %s', (target, cutoff) => {
    expect(loosestUnder(rows, target)?.cutoff).toBe(cutoff);
    expect(chooseCutoff(rows, target, false).cutoff).toBe(cutoff);
  });

  it('no qualifying cutoff: the strictest is suggested and the reason says so', () => {
    const noisy = scoreLadder({ runCount: 11, metrics: [metric('a', Array(10).fill(1e-9))] }, [0.1, 0.01], 'none');
    expect(loosestUnder(noisy, 1)).toBeUndefined();
    const choice = chooseCutoff(noisy, 1, false);
    expect(choice.cutoff).toBe(0.01);
    expect(choice.reason).toMatch(/no cutoff keeps false alarms/);
  });
});

describe('per-metric rules and the family advice', () => {
  // 100 runs; metric a alarms in 10 runs at cutoff 0.1 (r 0.05) and none at 0.01; b and c once each.
  // At 0.1: 12 false alarms over 3 metrics, mean 4; a has 10 >= 2 and > 2 x 4 -> its own rule, at the
  // loosest stricter cutoff where its alarms drop to the mean: 0.01 (0 alarms). b and c: 1 < 2, none.
  const base = Array.from({ length: 100 }, () => 0.9);
  const a = base.map((r, i) => (i < 10 ? 0.05 : r));
  const once = base.map((r, i) => (i === 50 ? 0.05 : r));
  const replay: Replay = { runCount: 101, metrics: [metric('a', a), metric('b', once), metric('c', once)] };
  const rows = scoreLadder(replay, [0.1, 0.01, 0.001], 'none');

  it('gives a much noisier metric its own stricter cutoff', () => {
    const rules = noisyMetricRules(rows, ['a', 'b', 'c'], 0.1);
    expect(rules.map((r) => [r.metric, r.cutoff])).toEqual([['a', 0.01]]);
    expect(rules[0]!.reason).toMatch(/10 false alarms at 0.1/);
  });

  it('keeps the configured family for few metrics a run, and suggests holm for many', () => {
    const ladders = new Map([
      ['none', rows],
      ['holm', scoreLadder(replay, [0.1, 0.01, 0.001], 'holm')],
    ] as const);
    expect(recommendFamily(3, ladders, 0.1, 'none', 1).family).toBe('none');
    expect(recommendFamily(3, ladders, 0.1, 'fdr', 1).family).toBe('fdr');
    const many = recommendFamily(30, ladders, 0.1, 'none', 1);
    expect(many.family).toBe('holm');
    expect(many.reason).toMatch(/Holm 1979/);
  });
});
