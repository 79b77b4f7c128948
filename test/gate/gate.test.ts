import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../src/config/load.js';
import { InputError } from '../../src/errors/input-error.js';
import { runGate } from '../../src/gate/gate.js';
import { REPORT_SCHEMA } from '../../src/gate/report.js';
import { sharedReason } from '../../src/report/reason.js';
import type { History, RunInfo } from '../../src/history/history.js';
import type { Run } from '../../src/inputs/run.js';
import { seededNormal } from '../model/random.js';
import { configFrom, historyOf, runOf } from './helpers/scenario.js';

// Ten quiet runs around 100 (no unit: judged on their own scale).
const QUIET = [99, 101, 100, 99, 101, 100, 99, 101, 100, 100];

function gate(yaml: string, columns: Record<string, number[]>, values: Record<string, number>, accepted = false) {
  const config = yaml === '' ? defaultConfig() : configFrom(yaml);
  return runGate({ config, history: historyOf(columns), run: runOf(values), series: 'main', accepted });
}

/**
 * A history of `timings` metrics in ms, each run = base x exp(shared + own), shared ~ N(0, sharedSd)
 * per run (the runner) and own ~ N(0, ownSd) per metric and run; plus the next run's values.
 */
function timings(options: {
  seed: number;
  metrics?: number;
  runs?: number;
  sharedSd?: number;
  ownSd?: number;
  runner?: (i: number) => string | undefined;
  level?: (name: string, i: number) => number;
}): { history: History; next: (shared: number, extra?: Record<string, number>) => Run } {
  const { seed, metrics = 12, runs = 60, sharedSd = 0.03, ownSd = 0.01 } = options;
  const normal = seededNormal(seed);
  const names = Array.from({ length: metrics }, (_, j) => `time/t${String(j).padStart(2, '0')}`);
  const base = names.map((_, j) => 5 + 3 * j);
  const columns = new Map(names.map((n) => [n, { unit: 'ms', values: [] as number[] }]));
  const infos: RunInfo[] = [];
  for (let i = 0; i < runs; i++) {
    const shared = sharedSd * normal();
    const runner = options.runner?.(i);
    infos.push({ id: `run-${i + 1}`, ...(runner === undefined ? {} : { runner }) });
    names.forEach((n, j) =>
      columns.get(n)!.values.push(base[j]! * Math.exp(shared + ownSd * normal()) * (options.level?.(n, i) ?? 1)),
    );
  }
  const next = (shared: number, extra: Record<string, number> = {}): Run => ({
    metrics: new Map(
      names.map((n, j) => [
        n,
        {
          value: base[j]! * Math.exp(shared + ownSd * normal()) * (extra[n] ?? 1) * (options.level?.(n, runs) ?? 1),
          unit: 'ms',
          count: 1,
        },
      ]),
    ),
    meta: new Map(),
  });
  return { history: { series: 'main', runs: infos, columns }, next };
}

describe('runGate: statuses and verdicts', () => {
  it('every status in one report, ordered regressed, improved, then by name', () => {
    const report = gate(
      'metrics:\n  - match: "legacy/*"\n    ignore: true\n',
      { 'b/slow': QUIET, 'a/fast': QUIET, 'c/ok': QUIET, 'd/gone': QUIET, 'e/young': [100, 101], 'legacy/old': QUIET },
      { 'b/slow': 120, 'a/fast': 80, 'c/ok': 100.5, 'e/young': 150, 'legacy/old': 500, 'f/brand-new': 1 },
    );
    expect(report.schema).toBe(REPORT_SCHEMA);
    expect(report.metrics.map((m) => [m.name, m.status])).toEqual([
      ['b/slow', 'regressed'],
      ['a/fast', 'improved'],
      ['c/ok', 'ok'],
      ['d/gone', 'missing'],
      ['e/young', 'learning'],
      ['f/brand-new', 'new'],
      ['legacy/old', 'ignored'],
    ]);
    expect(report.verdict).toBe('regressed');
    expect(report.blocks).toBe(true);
    expect(report.metrics.find((m) => m.name === 'd/gone')!.note).toEqual({ kind: 'missing', runs: 10 });
    // family control is on by default, at a 1% budget, and says so per metric
    expect(report.family).toBe('holm');
    expect(report.budget).toBe(0.01);
    const slow = report.metrics.find((m) => m.name === 'b/slow')!;
    expect(slow.adjusted).toBeLessThanOrEqual(0.01);
    expect(slow.effectiveCutoff).toBeGreaterThan(0);
    expect(slow.detectable).toBeGreaterThan(0.01);
  });

  it('verdicts: pass, learning, accepted, regressed', () => {
    expect(gate('', { m: QUIET }, { m: 100 }).verdict).toBe('pass');
    expect(gate('', { m: [100, 101] }, { m: 100 }).verdict).toBe('learning');
    expect(gate('', {}, { m: 100 }).verdict).toBe('learning');
    expect(gate('', { m: QUIET }, { m: 130 }, true).verdict).toBe('accepted');
    expect(gate('', { m: QUIET }, { m: 130 }, false).verdict).toBe('regressed');
  });

  it('family none judges each metric by its cutoff on the relative density; holm by the run budget', () => {
    const none = gate('family: none\ndefaults:\n  tolerance: 0\n', { m: QUIET }, { m: 103 }).metrics[0]!;
    expect(none.adjusted).toBeUndefined();
    expect(none.status).toBe(none.relativeDensity! < 0.01 ? 'regressed' : 'ok');
    const holm = gate('defaults:\n  tolerance: 0\n', { m: QUIET }, { m: 103 }).metrics[0]!;
    expect(holm.level).toBe(0.01);
    // the effective cutoff is the relative density where the worse tail equals the level
    expect(holm.status === 'regressed').toBe(holm.relativeDensity! < holm.effectiveCutoff!);
  });

  it('bad values give InputError, never a stack of NaN', () => {
    expect(() => gate('defaults:\n  transform: log\n', { m: QUIET }, { m: 0 })).toThrow(InputError);
    expect(() => gate('defaults:\n  transform: log\n', { m: [...QUIET, -1] }, { m: 100 })).toThrow(/run-11/);
  });

  it('names like __proto__ are ordinary metrics', () => {
    const columns = JSON.parse(`{"__proto__": [${QUIET.join(',')}], "constructor": [${QUIET.join(',')}]}`) as Record<
      string,
      number[]
    >;
    const report = gate('', columns, JSON.parse('{"__proto__": 130}') as Record<string, number>);
    expect(report.metrics.map((m) => [m.name, m.status])).toEqual([
      ['__proto__', 'regressed'],
      ['constructor', 'missing'],
    ]);
  });
});

describe('runGate: the shared move of the timings (issue 13 item 3)', () => {
  it('a time unit puts a metric on the log scale (transform: auto) and in the timings group', () => {
    const { history, next } = timings({ seed: 1 });
    const report = runGate({ config: defaultConfig(), history, run: next(0), series: 'main' });
    const m = report.metrics[0]!;
    expect(m.baseline!.scale).toBe('log');
    expect(m.group).toBe('timings');
    expect(report.shared.map((s) => s.name)).toEqual(['timings']);
    expect(gate('', { size: QUIET }, { size: 100 }).metrics[0]!.baseline!.scale).toBeUndefined();
  });

  it('a slow runner (every timing +5%, within what the runner has shown) passes; the shared move is reported', () => {
    const { history, next } = timings({ seed: 2 });
    const report = runGate({ config: defaultConfig(), history, run: next(Math.log(1.05)), series: 'main' });
    expect(report.verdict).toBe('pass');
    expect(report.shared[0]!.move).toBeGreaterThan(0.03);
    expect(report.metrics.every((m) => m.shared! > 0.03)).toBe(true);
  });

  it('never absorbs a single metric slowdown: +10% in one timing on a +5% runner is caught, the others are not', () => {
    for (const metrics of [3, 12]) {
      const { history, next } = timings({ seed: 3, metrics, sharedSd: 0.03, ownSd: 0.01 });
      const report = runGate({
        config: defaultConfig(),
        history,
        run: next(Math.log(1.05), { 'time/t01': 1.1 }),
        series: 'main',
      });
      const statuses = report.metrics.map((m) => [m.name, m.status]);
      expect(statuses.filter(([, s]) => s === 'regressed')).toEqual([['time/t01', 'regressed']]);
      const slowed = report.metrics.find((m) => m.name === 'time/t01')!;
      // the own move is the slowdown, not the runner's part
      expect(slowed.own!).toBeGreaterThan(0.07);
      expect(slowed.own!).toBeLessThan(0.13);
    }
  });

  it('every timing moving beyond what the history has shown is unsettled: neither pass nor regressed; blocks only when set', () => {
    const { history, next } = timings({ seed: 4, sharedSd: 0.02 });
    const run = next(Math.log(1.3));
    const report = runGate({ config: defaultConfig(), history, run, series: 'main' });
    expect(report.verdict).toBe('unsettled');
    expect(report.shared[0]!.status).toBe('unsettled');
    expect(report.metrics.some((m) => m.status === 'regressed')).toBe(false);
    expect(report.blocks).toBe(false);
    const blocking = runGate({ config: configFrom('unsettled: block\n'), history, run, series: 'main' });
    expect(blocking.blocks).toBe(true);
    // a faster runner is never unsettled
    expect(runGate({ config: defaultConfig(), history, run: next(Math.log(0.75)), series: 'main' }).verdict).toBe(
      'pass',
    );
  });

  it('shared-move: false judges each timing alone (a slow runner then flags them)', () => {
    const { history, next } = timings({ seed: 5, sharedSd: 0.005, ownSd: 0.005 });
    const run = next(Math.log(1.06));
    const report = runGate({ config: configFrom('defaults:\n  shared-move: false\n'), history, run, series: 'main' });
    expect(report.shared).toEqual([]);
    expect(report.metrics.filter((m) => m.status === 'regressed').length).toBeGreaterThan(6);
  });

  it("a configured group has its own shared move; relative-to takes the reference metric's move", () => {
    const { history, next } = timings({ seed: 6, metrics: 6 });
    const grouped = runGate({
      config: configFrom('groups:\n  - name: pair\n    match: ["time/t00", "time/t01"]\n'),
      history,
      run: next(0),
      series: 'main',
    });
    expect(grouped.metrics.find((m) => m.name === 'time/t00')!.group).toBe('pair');
    expect(grouped.metrics.find((m) => m.name === 'time/t02')!.group).toBe('timings');
    const yaml = 'metrics:\n  - match: "time/t05"\n    relative-to: time/t04\n';
    const both = runGate({
      config: configFrom(yaml),
      history,
      run: next(0, { 'time/t04': 1.2, 'time/t05': 1.2 }),
      series: 'main',
    });
    const t05 = both.metrics.find((m) => m.name === 'time/t05')!;
    expect(t05.baseline!.relativeTo).toBe('time/t04');
    expect(t05.status).toBe('ok');
    const alone = runGate({ config: configFrom(yaml), history, run: next(0, { 'time/t05': 1.2 }), series: 'main' });
    expect(alone.metrics.find((m) => m.name === 'time/t05')!.status).toBe('regressed');
    const lacking = next(0);
    lacking.metrics.delete('time/t04');
    const missing = runGate({ config: configFrom(yaml), history, run: lacking, series: 'main' });
    expect(missing.metrics.find((m) => m.name === 'time/t05')!.note).toEqual({
      kind: 'no-reference',
      reference: 'time/t04',
    });
  });
});

describe('runGate: levels (issue 13 item 2)', () => {
  const step = (name: string, i: number): number => (name === 'time/t03' && i >= 30 ? 1.15 : 1);

  it('a lasting +15% step of one timing restarts its centre; the spread still comes from every level', () => {
    const { history, next } = timings({ seed: 7, level: step });
    const report = runGate({ config: defaultConfig(), history, run: next(0), series: 'main' });
    const m = report.metrics.find((r) => r.name === 'time/t03')!;
    expect(m.status).toBe('ok');
    expect(m.baseline!.sinceReason).toBe('change');
    expect(m.baseline!.since).toBe('run-31');
    expect(m.baseline!.n).toBe(60);
    const off = runGate({
      config: configFrom('defaults:\n  change-points: false\n'),
      history,
      run: next(0),
      series: 'main',
    });
    expect(off.metrics.find((r) => r.name === 'time/t03')!.baseline!.since).toBeUndefined();
  });

  it('a regime that comes and goes is not a new level', () => {
    const regime = (name: string, i: number): number => (name === 'time/t03' && i >= 20 && i < 38 ? 1.15 : 1);
    const { history, next } = timings({ seed: 8, level: regime });
    const m = runGate({ config: defaultConfig(), history, run: next(0), series: 'main' }).metrics.find(
      (r) => r.name === 'time/t03',
    )!;
    expect(m.baseline!.since).toBeUndefined();
  });

  it('a level mark restarts the centre at its run: "accepted in #N"; fewer than 3 runs since is learning', () => {
    const { history, next } = timings({ seed: 9, level: (n, i) => (n === 'time/t03' && i >= 55 ? 1.3 : 1) });
    history.runs[55]!.marks = [{ metrics: ['time/t03'], reason: 'accepted', pr: 42 }];
    const report = runGate({
      config: configFrom('defaults:\n  change-points: false\n'),
      history,
      run: next(0),
      series: 'main',
    });
    const m = report.metrics.find((r) => r.name === 'time/t03')!;
    expect(m.status).toBe('ok');
    expect(m.baseline).toMatchObject({ since: 'run-56', sinceReason: 'accepted', sincePr: 42, levelRuns: 5, n: 60 });
    expect(report.metrics.find((r) => r.name === 'time/t04')!.baseline!.since).toBeUndefined();
    history.runs[58]!.marks = [{ reason: 'manual' }];
    const early = runGate({ config: defaultConfig(), history, run: next(0), series: 'main' });
    expect(early.metrics.every((r) => r.status === 'learning')).toBe(true);
  });
});

describe('runGate: runner fingerprints (issue 13 item 4)', () => {
  it('prefers baseline runs of this runner when there are min-runs of them, and says when there are not', () => {
    // a pool of two CPU models: on "B" one benchmark runs 25% slower
    const runner = (i: number): string => (i % 3 === 0 ? 'B' : 'A');
    const level = (name: string, i: number): number => (name === 'time/t02' && runner(i) === 'B' ? 1.25 : 1);
    const { history, next } = timings({ seed: 10, runner, level });
    const run = next(0); // this run (index 60) is on B, where time/t02 runs 25% slower
    const onB = runGate({ config: defaultConfig(), history, run, series: 'main', runner: 'B' });
    const m = onB.metrics.find((r) => r.name === 'time/t02')!;
    expect(m.baseline!.runner).toBe('same');
    expect(m.baseline!.n).toBe(20);
    expect(m.status).toBe('ok');
    const unknown = runGate({ config: defaultConfig(), history, run, series: 'main', runner: 'C' });
    expect(unknown.metrics[0]!.baseline!.runner).toBe('other');
  });
});

describe('runGate: detectable (issue 13 item 6)', () => {
  it('a slowdown of 1.25 x detectable is caught at least 80% of the time (Gaussian own noise)', () => {
    let caught = 0;
    let trials = 0;
    for (let seed = 100; seed < 160; seed++) {
      const { history, next } = timings({ seed, metrics: 10 });
      const probe = runGate({ config: defaultConfig(), history, run: next(0), series: 'main' });
      const d = probe.metrics.find((m) => m.name === 'time/t05')!.detectable!;
      expect(d).toBeGreaterThan(0.01);
      expect(d).toBeLessThan(0.2);
      const slowed = runGate({
        config: defaultConfig(),
        history,
        run: next(0, { 'time/t05': 1 + 1.25 * d }),
        series: 'main',
      });
      trials++;
      if (slowed.metrics.find((m) => m.name === 'time/t05')!.status === 'regressed') caught++;
    }
    expect(caught / trials).toBeGreaterThanOrEqual(0.8);
  });
});

describe('calm runs and slow episodes (issue 13: time-clustered slow spells)', () => {
  // 20 timings with 1% own and 1% shared noise; one history run in four carries a spell that slows
  // a block of 8 timings by 30-60% each (as the recorded corpus shows), the rest not at all.
  function spells(seed: number) {
    const normal = seededNormal(seed);
    const names = Array.from({ length: 20 }, (_, j) => `time/t${String(j).padStart(2, '0')}`);
    const spell = names.map((_, j) => 1.3 + 0.03 * (j % 11));
    const draw = (episode: boolean, extra: Record<string, number> = {}): number[] => {
      const shared = 0.01 * normal();
      const start = 2 + (Math.floor(10 * Math.abs(normal())) % 10);
      return names.map(
        (n, j) =>
          (10 + j) *
          Math.exp(shared + 0.01 * normal()) *
          (episode && j >= start && j < start + 8 ? spell[j]! : 1) *
          (extra[n] ?? 1),
      );
    };
    const columns = new Map(names.map((n) => [n, { unit: 'ms', values: [] as number[] }]));
    const infos: RunInfo[] = [];
    for (let i = 0; i < 60; i++) {
      infos.push({ id: `run-${i + 1}` });
      draw(i % 4 === 3).forEach((v, j) => columns.get(names[j]!)!.values.push(v));
    }
    const run = (values: number[]): Run => ({
      metrics: new Map(names.map((n, j) => [n, { value: values[j]!, unit: 'ms', count: 1 }])),
      meta: new Map(),
    });
    return { history: { series: 'main', runs: infos, columns } as History, draw, run };
  }

  it('a calm run is judged against the calm runs: +10% on one timing with 1% noise is caught', () => {
    const { history, draw, run } = spells(21);
    const report = runGate({
      config: defaultConfig(),
      history,
      run: run(draw(false, { 'time/t05': 1.1 })),
      series: 'main',
    });
    expect(report.metrics.filter((m) => m.status === 'regressed').map((m) => m.name)).toEqual(['time/t05']);
    // the calm runs' spread, not the spells': about the 1% own noise (common practice: within a factor 2)
    const sd = report.metrics.find((m) => m.name === 'time/t05')!.baseline!.sd;
    expect(sd).toBeGreaterThan(0.005);
    expect(sd).toBeLessThan(0.02);
  });

  it('a run in a spell is held, not regressed: unsettled, naming the timings it held', () => {
    const { history, draw, run } = spells(22);
    for (let k = 0; k < 20; k++) {
      const report = runGate({ config: defaultConfig(), history, run: run(draw(true)), series: 'main' });
      expect(report.verdict).not.toBe('regressed');
      expect(report.shared[0]!.episode).toBe(true);
    }
  });
});

describe('the words of a held episode (src/report)', () => {
  it('names the held timings and asks for a re-run; a calm run says nothing of episodes', () => {
    const base = { name: 'timings', members: 20, move: 0.02, n: 60 };
    const held = sharedReason({ ...base, status: 'unsettled', episode: true, held: ['time/t03', 'time/t04'] });
    expect(held).toContain('slow episode');
    expect(held).toContain('time/t03, time/t04');
    expect(held).toContain('Re-run');
    expect(sharedReason({ ...base, status: 'ok' })).not.toContain('episode');
    expect(sharedReason({ ...base, status: 'ok', episode: true })).toContain('judged against every baseline run');
  });
});
