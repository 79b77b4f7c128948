import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../src/config/load.js';
import { runGate } from '../../src/gate/gate.js';
import { REPORT_SCHEMA } from '../../src/gate/report.js';
import { InputError } from '../../src/errors/input-error.js';
import { expectClose } from '../helpers/close.js';
import { configFrom, historyOf, runOf } from './helpers/scenario.js';

// Ten quiet runs around 100, checked by hand: mean 100; deviations -1 1 0 -1 1 0 -1 1 0 0, squares 6;
// MLE sd sqrt(0.6) = 0.7746, n-1 sd s = sqrt(6/9) = 0.8165.
const QUIET = [99, 101, 100, 99, 101, 100, 99, 101, 100, 100];

function gate(yaml: string, columns: Record<string, number[]>, values: Record<string, number>, accepted = false) {
  const config = yaml === '' ? defaultConfig() : configFrom(yaml);
  return runGate({ config, history: historyOf(columns), run: runOf(values), series: 'main', accepted });
}

describe('runGate: statuses and verdicts', () => {
  it('every status in one report, ordered regressed, improved, then by name', () => {
    const report = gate(
      'metrics:\n  - match: "legacy/*"\n    ignore: true\n',
      { 'b/slow': QUIET, 'a/fast': QUIET, 'c/ok': QUIET, 'd/gone': QUIET, 'e/young': [100, 101], 'legacy/old': QUIET },
      { 'b/slow': 120, 'a/fast': 80, 'c/ok': 100.5, 'e/young': 150, 'legacy/old': 500, 'f/brand-new': 1 },
    );
    expect(report.schema).toBe(REPORT_SCHEMA);
    expect(report.series).toBe('main');
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
    const gone = report.metrics.find((m) => m.name === 'd/gone')!;
    expect(gone.reason).toBe('in the history (10 runs) but absent from this run');
    expect(report.metrics.find((m) => m.name === 'legacy/old')!.reason).toMatch(/ignore/);
    const slow = report.metrics.find((m) => m.name === 'b/slow')!;
    expectClose(slow.baseline!.sd, Math.sqrt(0.6), 1e-12);
    expectClose(slow.z!, 20 / Math.sqrt(0.6), 1e-12);
    for (const m of report.metrics) expect(m.reason.length).toBeGreaterThan(5);
  });

  it('verdicts: pass, learning (nothing had enough history), accepted (accept label)', () => {
    expect(gate('', { m: QUIET }, { m: 100 }).verdict).toBe('pass');
    expect(gate('', { m: [100, 101] }, { m: 100 }).verdict).toBe('learning');
    expect(gate('', {}, { m: 100 }).verdict).toBe('learning');
    expect(gate('', { m: QUIET }, { m: 130 }, true).verdict).toBe('accepted');
    expect(gate('', { m: QUIET }, { m: 130 }, false).verdict).toBe('regressed');
  });

  it('config keys reach the decision: min-runs, window, worse, cutoff, tolerance', () => {
    expect(gate('defaults:\n  min-runs: 11\n', { m: QUIET }, { m: 130 }).metrics[0]!.status).toBe('learning');
    // window 3 keeps 101 100 100: mean 100.33, sd 0.471
    const windowed = gate('defaults:\n  window: 3\n  min-runs: 3\n', { m: QUIET }, { m: 100 }).metrics[0]!;
    expect(windowed.baseline!.n).toBe(3);
    expectClose(windowed.baseline!.mean, 301 / 3, 1e-12);
    expect(gate('metrics:\n  - match: "*"\n    worse: lower\n', { m: QUIET }, { m: 130 }).metrics[0]!.status).toBe(
      'improved',
    );
    expect(gate('defaults:\n  tolerance: 40\n', { m: QUIET }, { m: 130 }).metrics[0]!.status).toBe('ok');
    expect(gate('defaults:\n  tolerance: 40%\n', { m: QUIET }, { m: 130 }).metrics[0]!.status).toBe('ok');
    expect(gate('defaults:\n  tolerance: 20%\n', { m: QUIET }, { m: 130 }).metrics[0]!.status).toBe('regressed');
    // 103: t = 3 / (0.8165 sqrt(1.1)) = 3.503 with 9 dof -> r = (1 + 3.503^2/9)^-5 = 2.364^-5 = 0.0136
    expect(gate('defaults:\n  cutoff: 0.02\n  tolerance: 0\n', { m: QUIET }, { m: 103 }).metrics[0]!.status).toBe(
      'regressed',
    );
    expect(gate('defaults:\n  cutoff: 0.01\n  tolerance: 0\n', { m: QUIET }, { m: 103 }).metrics[0]!.status).toBe('ok');
  });

  it('a later rule overrides an earlier one (through settingsFor)', () => {
    const yaml = 'metrics:\n  - match: "**"\n    worse: lower\n  - match: "time/*"\n    worse: higher\n';
    expect(gate(yaml, { 'time/a': QUIET }, { 'time/a': 130 }).metrics[0]!.status).toBe('regressed');
  });

  it('relative-to judges the ratio; a run lacking the reference gets a reason, not a crash', () => {
    // the runner was 20% slower for both: the ratio did not move
    const columns = { 'time/parse': QUIET.map((x) => x * 2), 'time/calibrate': QUIET };
    const yaml = 'metrics:\n  - match: "time/parse"\n    relative-to: time/calibrate\n';
    const both = gate(yaml, columns, { 'time/parse': 240, 'time/calibrate': 120 });
    const parse = both.metrics.find((m) => m.name === 'time/parse')!;
    expect(parse.status).toBe('ok');
    expect(parse.baseline!.relativeTo).toBe('time/calibrate');
    expectClose(parse.value!, 2, 1e-15);
    expect(both.metrics.find((m) => m.name === 'time/calibrate')!.status).toBe('regressed');
    const alone = gate(yaml, columns, { 'time/parse': 240 }).metrics.find((m) => m.name === 'time/parse')!;
    expect(alone.status).toBe('missing');
    expect(alone.reason).toBe('cannot be judged relative to time/calibrate: this run lacks that metric');
  });

  it('fit: robust from the config ignores a past regression inside the baseline', () => {
    // median 100, MAD 1 -> robust sd 1.4826; the MLE sd is about 17 because of the 160
    const polluted = [...QUIET.slice(0, 5), 160, ...QUIET.slice(5)];
    const robust = gate('defaults:\n  fit: robust\n', { m: polluted }, { m: 108 }).metrics[0]!;
    expectClose(robust.baseline!.sd, 1.4826, 1e-12);
    expect(robust.status).toBe('regressed');
    expect(gate('', { m: polluted }, { m: 108 }).metrics[0]!.status).toBe('ok');
  });

  it('transform: log and uncertainty: plug-in from the config', () => {
    const logged = gate('defaults:\n  transform: log\n', { m: QUIET }, { m: 100 }).metrics[0]!;
    expect(logged.baseline!.scale).toBe('log');
    expectClose(logged.baseline!.mean, QUIET.reduce((s, x) => s + Math.log(x), 0) / 10, 1e-12);
    // 102.5: z = 2.5 / 0.7746 = 3.227, plug-in r = exp(-5.208) = 0.00547; predictive r is 0.036
    const plug = gate('defaults:\n  uncertainty: plug-in\n  tolerance: 0\n', { m: QUIET }, { m: 102.5 }).metrics[0]!;
    expectClose(plug.relativeDensity!, Math.exp(-(2.5 ** 2) / (2 * 0.6)), 1e-12);
    expect(plug.status).toBe('regressed');
    expect(gate('defaults:\n  tolerance: 0\n', { m: QUIET }, { m: 102.5 }).metrics[0]!.status).toBe('ok');
  });

  it('change-points: a merged step stops being flagged once min-runs runs hold the new level', () => {
    const step = (k: number) => [
      ...Array.from({ length: 40 }, (_, i) => QUIET[i % 10]!),
      ...Array.from({ length: k }, (_, i) => 10 + QUIET[i % 10]!),
    ];
    const at = (k: number, yaml = '') => gate(yaml, { m: step(k) }, { m: 110 }).metrics[0]!;
    expect(at(2).status).toBe('regressed');
    expect(at(8).status).toBe('ok');
    expect(at(8).baseline!.since).toBe('run-41');
    expect(at(8).baseline!.n).toBe(8);
    expect(at(8, 'defaults:\n  change-points: false\n').baseline!.since).toBeUndefined();
  });

  it('bad values give InputError, never a stack of NaN', () => {
    expect(() => gate('defaults:\n  transform: log\n', { m: QUIET }, { m: -3 })).toThrow(InputError);
    const nan = gate('', { m: QUIET }, { m: 100 });
    expect(JSON.stringify(nan)).not.toMatch(/NaN|null/);
  });

  it('names like __proto__ are ordinary metrics', () => {
    // JSON.parse makes "__proto__" an own key, as a metric file would
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

describe('runGate: family control', () => {
  it('holm: tails adjusted across the judged metrics, compared with cutoffLevel(cutoff)', () => {
    // three metrics; c at 103 (t = 3.503, 9 dof): two-sided tail between 0.005 and 0.01
    // (Student-t table, 9 dof: t_{0.995} = 3.250, t_{0.9975} = 3.690); Holm adjusts it to >= 2 x 0.005
    const columns = { a: QUIET, b: QUIET, c: QUIET };
    const report = gate('family: holm\ndefaults:\n  tolerance: 0\n', columns, { a: 130, b: 100, c: 103 });
    expect(report.family).toBe('holm');
    const a = report.metrics.find((m) => m.name === 'a')!;
    const c = report.metrics.find((m) => m.name === 'c')!;
    expect(a.status).toBe('regressed');
    expectClose(a.adjusted!, Math.min(1, 3 * a.tail!), 1e-12); // smallest tail x m (Holm 1979, first step)
    expect(a.reason).toMatch(/holm-adjusted over 3 to .* < level 0\.00241/);
    expect(c.tail!).toBeGreaterThan(0.005);
    expect(c.tail!).toBeLessThan(0.01);
    expect(c.adjusted!).toBeGreaterThan(0.0024);
    expect(c.status).toBe('ok');
  });
});
