import { describe, expect, it } from 'vitest';
import { judgeMetric } from '../../src/gate/judge-metric.js';
import { InputError } from '../../src/errors/input-error.js';
import { expectClose } from '../helpers/close.js';
import { jStat } from '../model/jstat.js';
import { settingsWith } from './helpers/scenario.js';

// A small baseline checked by hand: 9, 10, 11, 10, 10, 9, 11, 10.
// n = 8, sum = 80, mean = 10; deviations -1 0 1 0 0 -1 1 0, sum of squares = 4;
// MLE variance 4/8 = 0.5 (sd 0.70711), n-1 variance 4/7 (s = 0.75593).
const BASELINE = [9, 10, 11, 10, 10, 9, 11, 10];
const MEAN = 10;
const MLE_VAR = 0.5;
const S = Math.sqrt(4 / 7);

describe('judgeMetric: the figures of DESIGN.md "Statistics", checked by hand', () => {
  const settings = settingsWith({ uncertainty: 'plug-in' });
  const result = judgeMetric('build/compile', settings, BASELINE, 12.5);

  it('fits mean and the 1/m sd (fit: mle)', () => {
    expect(result.baseline?.n).toBe(8);
    expectClose(result.baseline!.mean, MEAN, 1e-15);
    expectClose(result.baseline!.sd, Math.sqrt(MLE_VAR), 1e-15);
  });

  it('z = (x - mean) / sd and change = (x - mean) / mean', () => {
    // z = 2.5 / 0.70711 = 3.5355
    expectClose(result.z!, 2.5 / Math.sqrt(0.5), 1e-14);
    expectClose(result.change!, 0.25, 1e-15);
  });

  it('density from the Gaussian formula exp(-(x-mu)^2/(2 sigma^2)) / sqrt(2 pi sigma^2)', () => {
    // exp(-6.25) / sqrt(pi) = 0.0019305 / 1.7725 = 0.0010892
    const byFormula = Math.exp(-(2.5 ** 2) / (2 * MLE_VAR)) / Math.sqrt(2 * Math.PI * MLE_VAR);
    expectClose(result.density!, byFormula, 1e-12);
    expectClose(result.density!, jStat.normal.pdf(12.5, MEAN, Math.sqrt(MLE_VAR)), 1e-12); // jstat, second opinion
  });

  it('plug-in relative density exp(-z^2/2) = exp(-6.25) is below the cutoff: regressed', () => {
    expectClose(result.relativeDensity!, Math.exp(-6.25), 1e-12);
    expect(result.status).toBe('regressed');
    expect(result.reason).toMatch(/3\.54 sd above the baseline mean; relative density 0\.00193 < cutoff 0\.01/);
    // plug-in tail: two-sided normal tail of z, second opinion from jstat
    expectClose(result.tail!, 2 * (1 - jStat.normal.cdf(2.5 / Math.sqrt(0.5), 0, 1)), 1e-6);
  });

  it('predictive relative density: Student-t (nu = 7) pdf ratio at t = 2.5 / (s sqrt(1 + 1/8)), above the cutoff', () => {
    const predictive = judgeMetric('build/compile', settingsWith({ uncertainty: 'predictive' }), BASELINE, 12.5);
    const t = 2.5 / (S * Math.sqrt(1 + 1 / 8)); // 3.1180
    // jstat second opinion: f(t) / f(0)
    expectClose(predictive.relativeDensity!, jStat.studentt.pdf(t, 7) / jStat.studentt.pdf(0, 7), 1e-9);
    // closed form (1 + t^2/nu)^(-(nu+1)/2) = (1 + 9.722/7)^-4 = 0.0307
    expectClose(predictive.relativeDensity!, (1 + (t * t) / 7) ** -4, 1e-12);
    expectClose(predictive.tail!, 2 * (1 - jStat.studentt.cdf(t, 7)), 1e-8);
    // a short history makes the gate less jumpy: the same value is ok under the predictive form
    expect(predictive.status).toBe('ok');
    expect(predictive.reason).toMatch(/relative density 0\.0307 ≥ cutoff 0\.01/);
  });

  it('the predictive tail at the t-table value t(0.01 one-sided, 7 dof) = 2.998 is 0.02 two-sided', () => {
    // Student-t table (e.g. NIST/SEMATECH e-Handbook 1.3.6.7.2): t_{0.99, 7} = 2.998
    const x = MEAN + 2.998 * S * Math.sqrt(1 + 1 / 8);
    const r = judgeMetric('m', settingsWith(), BASELINE, x);
    expectClose(r.tail!, 0.02, 1e-3);
  });
});

describe('judgeMetric: statuses and keys', () => {
  it('new with no baseline, learning below min-runs', () => {
    expect(judgeMetric('m', settingsWith(), [], 5).status).toBe('new');
    const learning = judgeMetric('m', settingsWith({ minRuns: 10 }), BASELINE, 50);
    expect(learning.status).toBe('learning');
    expect(learning.reason).toBe('only 8 baseline runs; min-runs is 10');
    expect(judgeMetric('m', settingsWith({ minRuns: 8 }), BASELINE, 50).status).toBe('regressed');
  });

  it('improved on the better side, never regressed; worse: lower flips the sides; both has no better side', () => {
    const plug = { uncertainty: 'plug-in' as const };
    expect(judgeMetric('m', settingsWith(plug), BASELINE, 7.5).status).toBe('improved');
    expect(judgeMetric('m', settingsWith(plug), BASELINE, 7.5).reason).toMatch(
      /below the baseline mean \(the better side\)/,
    );
    expect(judgeMetric('m', settingsWith({ ...plug, worse: 'lower' }), BASELINE, 7.5).status).toBe('regressed');
    expect(judgeMetric('m', settingsWith({ ...plug, worse: 'lower' }), BASELINE, 12.5).status).toBe('improved');
    expect(judgeMetric('m', settingsWith({ ...plug, worse: 'both' }), BASELINE, 7.5).status).toBe('regressed');
    expect(judgeMetric('m', settingsWith({ ...plug, worse: 'both' }), BASELINE, 12.5).status).toBe('regressed');
  });

  it('cutoff: the same value is ok at a stricter cutoff', () => {
    // plug-in r = exp(-6.25) = 1.93e-3: below 0.01, above 0.001
    expect(judgeMetric('m', settingsWith({ uncertainty: 'plug-in', cutoff: 0.001 }), BASELINE, 12.5).status).toBe('ok');
    expect(judgeMetric('m', settingsWith({ uncertainty: 'plug-in', cutoff: 0.01 }), BASELINE, 12.5).status).toBe(
      'regressed',
    );
  });

  it('tolerance, absolute and percent of the baseline mean: an improbable but small move is ok', () => {
    const plug = { uncertainty: 'plug-in' as const };
    const abs = judgeMetric('m', settingsWith({ ...plug, tolerance: { kind: 'absolute', amount: 3 } }), BASELINE, 12.5);
    expect(abs.status).toBe('ok');
    expect(abs.reason).toMatch(/but the change 25% is within the tolerance 3$/);
    expect(
      judgeMetric('m', settingsWith({ ...plug, tolerance: { kind: 'absolute', amount: 2 } }), BASELINE, 12.5).status,
    ).toBe('regressed');
    // 30% of mean 10 = 3 > 2.5; 20% = 2 < 2.5
    expect(
      judgeMetric('m', settingsWith({ ...plug, tolerance: { kind: 'percent', amount: 0.3 } }), BASELINE, 12.5).status,
    ).toBe('ok');
    expect(
      judgeMetric('m', settingsWith({ ...plug, tolerance: { kind: 'percent', amount: 0.2 } }), BASELINE, 12.5).status,
    ).toBe('regressed');
  });

  it('fit: unbiased divides by n - 1; fit: robust uses median and 1.4826 MAD', () => {
    expectClose(judgeMetric('m', settingsWith({ fit: 'unbiased' }), BASELINE, 12).baseline!.sd, S, 1e-14);
    // past regression inside the baseline: 10 10.2 9.8 10.1 9.9 10 25 10
    // median 10; |deviations| sorted 0 0 0 .1 .1 .2 .2 15 -> MAD 0.1 -> sd 0.14826 (Rousseeuw & Croux 1993)
    const polluted = [10, 10.2, 9.8, 10.1, 9.9, 10, 25, 10];
    const robust = judgeMetric('m', settingsWith({ fit: 'robust', uncertainty: 'plug-in' }), polluted, 10.6);
    expectClose(robust.baseline!.mean, 10, 1e-12);
    expectClose(robust.baseline!.sd, 0.14826, 1e-9);
    expect(robust.status).toBe('regressed');
    // the MLE fit is dragged by the 25: sd ~ 4.9, and the same 6% slowdown passes unnoticed
    expect(judgeMetric('m', settingsWith({ fit: 'mle', uncertainty: 'plug-in' }), polluted, 10.6).status).toBe('ok');
  });

  it('resolution floors sigma, so a constant history is handled', () => {
    const constant = Array<number>(10).fill(100);
    const same = judgeMetric('size/app', settingsWith({ tolerance: { kind: 'absolute', amount: 0 } }), constant, 100);
    expect(same.status).toBe('ok');
    expect(same.relativeDensity).toBe(1);
    const moved = judgeMetric('size/app', settingsWith({ tolerance: { kind: 'absolute', amount: 0 } }), constant, 101);
    expect(moved.status).toBe('regressed');
    expect(moved.z).toBeUndefined();
    expect(moved.reason).toMatch(/constant baseline 100 \(sd 0; set `resolution`/);
    // resolution 2: sd = s = 2; plug-in z = 1 -> r = exp(-1/2) = 0.607
    const floored = judgeMetric(
      'size/app',
      settingsWith({ resolution: 2, uncertainty: 'plug-in', tolerance: { kind: 'absolute', amount: 0 } }),
      constant,
      102,
    );
    expectClose(floored.baseline!.sd, 2, 1e-15);
    expectClose(floored.relativeDensity!, Math.exp(-0.5), 1e-12);
    expect(floored.status).toBe('ok');
    expect(judgeMetric('size/app', settingsWith({ resolution: 2, uncertainty: 'plug-in' }), constant, 110).status).toBe(
      'regressed',
    );
  });

  it('transform: log fits the logs and reports the log scale; change stays on the own scale', () => {
    // logs 4 4.1 3.9 4 4 4.1 3.9 4: mean 4, squares 4 x 0.01 = 0.04, MLE sd sqrt(0.005) = 0.070711
    const logs = [4, 4.1, 3.9, 4, 4, 4.1, 3.9, 4];
    const r = judgeMetric('time/parse', settingsWith({ transform: 'log' }), logs, Math.exp(4.5));
    expect(r.baseline!.scale).toBe('log');
    expectClose(r.baseline!.mean, 4, 1e-14);
    expectClose(r.baseline!.sd, Math.sqrt(0.005), 1e-12);
    expectClose(r.z!, 0.5 / Math.sqrt(0.005), 1e-12);
    expectClose(r.change!, Math.exp(0.5) - 1, 1e-12); // (e^4.5 - e^4) / e^4
    expectClose(r.recent![0]!, Math.exp(4), 1e-12);
    expect(r.status).toBe('regressed');
  });

  it('transform: log turns the resolution into resolution / centre on the log scale', () => {
    // constant 100 with resolution 1: floor ln-scale 1/100 = 0.01; value 103 -> z = ln(1.03) / 0.01 = 2.956
    const r = judgeMetric(
      'time/x',
      settingsWith({ transform: 'log', resolution: 1 }),
      Array(10).fill(Math.log(100)),
      103,
    );
    expectClose(r.baseline!.sd, 0.01, 1e-12);
    expectClose(r.z!, Math.log(1.03) / 0.01, 1e-9);
  });

  it('recent holds the newest 30 baseline values, oldest first', () => {
    const long = Array.from({ length: 45 }, (_, i) => 100 + (i % 5));
    const r = judgeMetric('m', settingsWith(), long, 101);
    expect(r.recent).toEqual(long.slice(-30));
  });

  it('bad values get an InputError naming the metric, never NaN', () => {
    expect(() => judgeMetric('time/x', settingsWith({ transform: 'log' }), [1, 2, 3], 0)).toThrow(InputError);
    expect(() => judgeMetric('time/x', settingsWith(), BASELINE, Number.NaN)).toThrow(/time\/x is not a finite number/);
  });
});
