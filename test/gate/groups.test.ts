import { beforeAll, describe, expect, it } from 'vitest';
import { prepareGate, runGate } from '../../src/gate/gate.js';
import type { Report } from '../../src/gate/report.js';
import { jStat } from '../model/jstat.js';
import { configFrom, historyOf, runOf } from './helpers/scenario.js';
import { historySlice, runAt, timingSeries, type TimingSeries } from './helpers/timings.js';

const GROUP = 'groups:\n  - name: timings\n    match: "time/*"\n';

// The group judge and ml-matrix load on demand, as the gate's callers load them (prepareGate).
beforeAll(() => prepareGate(configFrom(GROUP)));

function judge(series: TimingSeries, window: number, factors: Map<string, number>, yaml: string): Report {
  const config = configFrom(`defaults:\n  transform: log\n  window: ${window}\n${yaml}`);
  return runGate({
    config,
    history: historySlice(series, 0, window),
    run: runAt(series, window, factors),
    series: 'main',
  });
}

/** Factors that move run k's runner speed to exp(log factor) while keeping each metric's own noise. */
function runnerAt(series: TimingSeries, k: number, logFactor: number): Map<string, number> {
  return new Map(series.names.map((name) => [name, Math.exp(logFactor - series.runner[k]!)]));
}

function meanSd(values: readonly number[]): { mean: number; sd: number } {
  const mean = values.reduce((s, x) => s + x, 0) / values.length;
  return { mean, sd: Math.sqrt(values.reduce((s, x) => s + (x - mean) ** 2, 0) / (values.length - 1)) };
}

describe("groups (issue 6): the common move and each member's own move", () => {
  // 50 invented benchmarks; runner-speed sd 3.5% shared by all, own noise 1.8% each (seeded).
  const shared = timingSeries(11, 50, 101, 0.035, 0.018);

  it('a slow runner within what runners have shown is flagged without a group, not with one', () => {
    // This run's runner is 2.5 sd slower than the mean of the 100 runners in the history (about
    // +9%): ordinary for a runner. Alone, each metric's sd mixes the runner's and its own noise
    // (3.9%), so the metrics whose own noise adds to the shift cross the cutoff's 3 sd.
    const runners = meanSd(shared.runner.slice(0, 100));
    const slow = runnerAt(shared, 100, runners.mean + 2.5 * runners.sd);
    const alone = judge(shared, 100, slow, '');
    expect(alone.verdict).toBe('regressed');
    expect(alone.metrics.filter((m) => m.status === 'regressed').length).toBeGreaterThan(0);
    const grouped = judge(shared, 100, slow, GROUP);
    expect(grouped.verdict).toBe('pass');
    const group = grouped.groups[0]!;
    expect(group.status).toBe('ok');
    expect(group.common.status).toBe('ok');
    expect(group.common.z).toBeGreaterThan(2);
    expect(group.common.tail).toBeGreaterThan(group.level);
    expect(grouped.metrics.every((m) => m.group === 'timings')).toBe(true);
    // the single-metric figures stay in the report
    expect(grouped.metrics.some((m) => (m.relativeDensity ?? 1) < 0.01)).toBe(true);
  });

  it("a slowdown of everything beyond the runners' history is caught by the common move", () => {
    const runners = meanSd(shared.runner.slice(0, 100));
    const grouped = judge(shared, 100, runnerAt(shared, 100, runners.mean + 6 * runners.sd), GROUP);
    expect(grouped.groups[0]!.common.status).toBe('regressed');
    expect(grouped.groups[0]!.status).toBe('regressed');
    expect(grouped.verdict).toBe('regressed');
    expect(grouped.groups[0]!.reason).toMatch(/common move \+\d.* beyond the group's history/);
  });

  it('one metric 5% off its group is flagged with the group and not alone', () => {
    // runner sd 4%, own noise 1% (20 benchmarks): +5% is 1.2 sd alone but about 5 own sd.
    // The target sits exactly 5% above what this run's runner implies for it (no own noise).
    const series = timingSeries(23, 20, 61, 0.04, 0.01);
    const target = series.names[7]!;
    const implied = series.bases[7]! * Math.exp(series.runner[60]!);
    const factors = new Map([[target, (1.05 * implied) / series.values[60]![7]!]]);
    const alone = judge(series, 60, factors, '');
    expect(alone.metrics.find((m) => m.name === target)!.status).toBe('ok');
    const grouped = judge(series, 60, factors, GROUP);
    const member = grouped.metrics.find((m) => m.name === target)!;
    expect(member.status).toBe('regressed');
    expect(member.reason).toMatch(/in group timings: own move \+[\d.]+ sd/);
    expect(grouped.metrics.filter((m) => m.status === 'regressed').map((m) => m.name)).toEqual([target]);
    const group = grouped.groups[0]!;
    expect(group.status).toBe('regressed');
    const top = [...group.members].sort((a, b) => b.ownZ - a.ownZ)[0]!;
    expect(top.name).toBe(target);
    expect(top.ownZ).toBeGreaterThan(4);
    const shares = group.members.map((m) => m.share);
    expect(Math.max(...shares)).toBe(group.members.find((m) => m.name === target)!.share);
    expect(shares.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 9); // shares of d^2 sum to 1 by construction of the contributions
    expect(group.n).toBe(60);
    expect(group.shrinkage).toBeGreaterThanOrEqual(0);
    expect(group.shrinkage).toBeLessThanOrEqual(1);
  });

  it('worse: lower members are signed so that worse is positive: a drop regresses, a rise improves', () => {
    const series = timingSeries(23, 20, 61, 0.04, 0.01);
    const implied = (j: number) => series.bases[j]! * Math.exp(series.runner[60]!);
    const factors = new Map([
      [series.names[3]!, (0.95 * implied(3)) / series.values[60]![3]!],
      [series.names[9]!, (1.05 * implied(9)) / series.values[60]![9]!],
    ]);
    const report = judge(series, 60, factors, `metrics:\n  - match: "time/*"\n    worse: lower\n${GROUP}`);
    expect(report.metrics.find((m) => m.name === series.names[3])!.status).toBe('regressed');
    expect(report.metrics.find((m) => m.name === series.names[9])!.status).toBe('improved');
    expect(report.groups[0]!.status).toBe('regressed');
    expect(report.verdict).toBe('regressed');
  });

  it('a group without enough shared history is learning and its members are judged alone', () => {
    const quiet = [99, 101, 100, 99, 101, 100, 99, 101, 100, 100];
    const config = configFrom(GROUP);
    const report = runGate({
      config,
      history: historyOf({ 'time/a': quiet, 'time/b': [100, 100, 100] }),
      run: runOf({ 'time/a': 130, 'time/b': 100 }),
      series: 'main',
    });
    expect(report.groups[0]!.status).toBe('learning');
    expect(report.groups[0]!.reason).toMatch(/members are judged alone/);
    expect(report.metrics.find((m) => m.name === 'time/a')!.status).toBe('regressed');
    expect(report.verdict).toBe('regressed');
  });
});

describe('groups: the moves checked by hand', () => {
  it('common and own moves of a two-member group', () => {
    // a = 1..8 and b = 2 1 4 3 6 5 8 7: both mean 4.5, n-1 sd s = sqrt(42/7) = 2.449.
    // common c = ((a + b)/2 - 4.5)/s = (-3 -3 -1 -1 1 1 3 3)/s: mean 0, sd sqrt(40/7)/s.
    // own move of a: (a - b)/(2s) = (-.5 .5 -.5 .5 ...)/s: mean 0, sd (0.5/s) sqrt(8/7).
    // This run: a = 4.5 + 2, b = 4.5 -> c = 1/s, own move of a = 1/s, of b = -1/s:
    // common z = 1 / sqrt(40/7) = 0.41833; own z of a = 1 / (0.5 sqrt(8/7)) = 1.87083.
    const report = runGate({
      config: configFrom(GROUP),
      history: historyOf({ 'time/a': [1, 2, 3, 4, 5, 6, 7, 8], 'time/b': [2, 1, 4, 3, 6, 5, 8, 7] }),
      run: runOf({ 'time/a': 6.5, 'time/b': 4.5 }),
      series: 'main',
    });
    const group = report.groups[0]!;
    expect(group.n).toBe(8);
    expect(group.common.z).toBeCloseTo(1 / Math.sqrt(40 / 7), 12);
    // its tail: predictive Student-t, 7 dof, scale sqrt(1 + 1/8); jstat as the second opinion
    const t = 1 / Math.sqrt(40 / 7) / Math.sqrt(1 + 1 / 8);
    expect(group.common.tail).toBeCloseTo(2 * (1 - jStat.studentt.cdf(t, 7)), 8);
    expect(group.members.find((m) => m.name === 'time/a')!.ownZ).toBeCloseTo(1 / (0.5 * Math.sqrt(8 / 7)), 12);
    expect(group.members.find((m) => m.name === 'time/b')!.ownZ).toBeCloseTo(-1 / (0.5 * Math.sqrt(8 / 7)), 12);
    expect(group.status).toBe('ok');
  });
});

describe('groups: calibration and family control', () => {
  it('on clean runs the group test fires at about its level, never above it (Bonferroni bound)', () => {
    // 10 members, runner sd 3%, own noise 1.5%; cutoff 0.2 stands for level 0.0728, large enough
    // to count in 300 runs. The group is one test at that level: its three checks share it.
    const series = timingSeries(31, 10, 340, 0.03, 0.015);
    const config = configFrom(
      `defaults:\n  transform: log\n  window: 40\n  cutoff: 0.2\n  change-points: false\n${GROUP}`,
    );
    let fired = 0;
    let level = 0;
    for (let k = 40; k < 340; k++) {
      const report = runGate({
        config,
        history: historySlice(series, k - 40, k),
        run: runAt(series, k),
        series: 'main',
      });
      const group = report.groups[0]!;
      level = group.level;
      if (group.tail < group.level) fired++;
    }
    console.info(`group calibration: the group test fired in ${fired}/300 clean runs at level ${level.toFixed(4)}`);
    // Bin(300, 0.0728): mean 21.8; 99.9% quantile about 37. The weighted Bonferroni spends 0.8 +
    // 0.1 of the level on near-exact checks (the distance part is conservative), so at least
    // half the level shows: below 6 would mean a dead test (P < 1e-4 under Bin(300, 0.036)).
    expect(level).toBeCloseTo(0.0728, 3); // two-sided normal tail at sqrt(-2 ln 0.2) = 1.794 sd (A&S 26.1)
    expect(fired).toBeLessThanOrEqual(37);
    expect(fired).toBeGreaterThanOrEqual(6);
  }, 300_000);

  it('with family control the group enters the adjustment as one decision', () => {
    const series = timingSeries(23, 20, 61, 0.04, 0.01);
    const extra = { 'size/app': [500, 501, 499, 500, 502, 498, 500, 501, 499, 500] };
    const config = configFrom(`family: holm\ndefaults:\n  transform: log\n  window: 60\n${GROUP}`);
    const history = historySlice(series, 0, 60);
    history.columns.set('size/app', { values: [...Array<number>(50).fill(Number.NaN), ...extra['size/app']] });
    const run = runAt(series, 60);
    run.metrics.set('size/app', { value: 500, count: 1 });
    const report = runGate({ config, history, run, series: 'main' });
    const group = report.groups[0]!;
    const size = report.metrics.find((m) => m.name === 'size/app')!;
    // Holm over 2 decisions: the smaller tail doubles, the other is max(own x 1, that) (Holm 1979)
    const smaller = Math.min(group.tail, size.tail!);
    expect(Math.min(group.adjusted!, size.adjusted!)).toBeCloseTo(Math.min(1, 2 * smaller), 12);
    expect(size.reason).toMatch(/holm-adjusted over 2/);
  });
});
