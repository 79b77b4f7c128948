import { describe, expect, it } from 'vitest';
import { runGate } from '../../src/gate/gate.js';
import type { Report } from '../../src/gate/report.js';
import { configFrom, historyOf, runOf } from './helpers/scenario.js';
import { historySlice, runAt, timingSeries, type TimingSeries } from './helpers/timings.js';

const GROUP = 'groups:\n  - name: timings\n    match: "time/*"\n';

function judge(series: TimingSeries, window: number, factors: Map<string, number>, yaml: string): Report {
  const config = configFrom(`defaults:\n  transform: log\n  window: ${window}\n${yaml}`);
  return runGate({ config, history: historySlice(series, 0, window), run: runAt(series, window, factors), series: 'main' });
}

/** Factors that move run k's runner speed to exp(log factor) while keeping each metric's own noise. */
function runnerAt(series: TimingSeries, k: number, logFactor: number): Map<string, number> {
  return new Map(series.names.map((name) => [name, Math.exp(logFactor - series.runner[k]!)]));
}

function meanSd(values: readonly number[]): { mean: number; sd: number } {
  const mean = values.reduce((s, x) => s + x, 0) / values.length;
  return { mean, sd: Math.sqrt(values.reduce((s, x) => s + (x - mean) ** 2, 0) / (values.length - 1)) };
}

describe('groups (issue 6): the common move and each member\'s own move', () => {
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

  it('a slowdown of everything beyond the runners\' history is caught by the common move', () => {
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
