import { describe, expect, it } from 'vitest';
import type { MetricResult } from '../../src/gate/report.js';
import { renderExplain } from '../../src/report/explain.js';
import { jStat } from '../model/jstat.js';
import { expectClose } from '../helpers/close.js';

const result: MetricResult = {
  name: 'build/time',
  status: 'regressed',
  value: 14,
  unit: 's',
  baseline: { n: 20, mean: 10, sd: 1 },
  z: 4,
  change: 0.4,
  relativeDensity: 3.4e-4,
  cutoff: 0.01,
  worse: 'higher',
};
const values = [8.6, 9, 9.3, 9.5, 9.7, 9.8, 9.9, 10, 10, 10, 10.1, 10.2, 10.3, 10.5, 10.6, 10.8, 11, 11.2, 11.4, 9.1];

describe('renderExplain', () => {
  const out = renderExplain({ result, baselineValues: values, cutoff: 0.01, color: false, width: 72 });
  const lines = out.split('\n');

  it('draws the density peaking at the mean, the band edges and this run on one rule', () => {
    const rule = lines.find((l) => /^[─|▲]+$/.test(l)) ?? '';
    expect(rule.length).toBe(72);
    const edges = [...rule].flatMap((ch, i) => (ch === '|' ? [i] : []));
    expect(edges.length).toBe(2);
    const run = rule.indexOf('▲');
    expect(run).toBeGreaterThan(edges[1] ?? Infinity);
    // The top row of the curve is centred between the edges (the mean is midway in a Gaussian band).
    const top = lines[1] ?? '';
    const filled = [...top].flatMap((ch, i) => (ch !== ' ' ? [i] : []));
    const centre = ((filled[0] ?? 0) + (filled.at(-1) ?? 0)) / 2;
    expect(Math.abs(centre - ((edges[0] ?? 0) + (edges[1] ?? 0)) / 2)).toBeLessThanOrEqual(1.5);
    expect(out).not.toContain('\u001b');
  });

  it('puts one dot per baseline run under the curve', () => {
    const dots =
      lines
        .filter((l) => /^[ •+]+$/.test(l))
        .join('')
        .match(/[•+]/g) ?? [];
    // '+' stands for "more than three" in a column, so there are at most as many marks as runs.
    expect(dots.length).toBeGreaterThan(10);
    expect(dots.length).toBeLessThanOrEqual(values.length);
  });

  it('states the band whose edges have relative density equal to the cutoff', () => {
    const m = /band where the fitted Gaussian's density stays above the cutoff: ([\d.]+) s to ([\d.]+) s/.exec(out);
    expect(m).not.toBeNull();
    const [lo, hi] = [Number(m?.[1]), Number(m?.[2])];
    // Second opinion from jstat: the Gaussian's density at each edge over its density at the mean.
    // The edges are printed to 4 significant digits (13.03 for 13.0349), which moves the ratio by
    // up to about 2% at 3 sd (d ln r / dx = -z), hence the tolerance.
    const peak = jStat.normal.pdf(10, 10, 1);
    expectClose(jStat.normal.pdf(lo, 10, 1) / peak, 0.01, 2e-2);
    expectClose(jStat.normal.pdf(hi, 10, 1) / peak, 0.01, 2e-2);
    expect(out).toContain('mean ± 3.03 sd');
    expect(out).toContain('relative density vs cutoff: 3.4e-4 < 0.01');
    expect(out).toContain('verdict for this metric: regressed');
  });

  it('says when the decision used the predictive Student-t (jstat second opinion for its density ratio)', () => {
    // n = 21 runs, s = 1: a run at t = 3.2 predictive scales has relative density f(t)/f(0) under
    // Student-t with 20 degrees of freedom, above exp(-z^2/2) for the same run.
    const n = 21;
    const scale = Math.sqrt(1 + 1 / n);
    const sd = Math.sqrt((n - 1) / n); // the 1/m sd of a sample whose n-1 sd is 1
    const t = 3.2;
    const z = (t * scale) / sd;
    const r = jStat.studentt.pdf(t, n - 1) / jStat.studentt.pdf(0, n - 1);
    expect(r).toBeGreaterThan(Math.exp(-0.5 * z * z));
    const predictive = { ...result, status: 'ok' as const, z, relativeDensity: r, baseline: { n, mean: 10, sd } };
    expect(renderExplain({ result: predictive, baselineValues: values, cutoff: 0.01, color: false })).toContain(
      'predictive Student-t',
    );
  });

  it('says so in words when there is no fit', () => {
    const text = renderExplain({
      result: { ...result, status: 'learning', baseline: undefined, note: { kind: 'learning', runs: 3, minRuns: 8 } },
      baselineValues: [1, 2],
      cutoff: 0.01,
      color: false,
    });
    expect(text).toContain('no fitted baseline: only 3 baseline runs; min-runs is 8');
  });

  it('labels a log-scale fit by its geometric mean', () => {
    const text = renderExplain({
      result: { ...result, baseline: { n: 20, mean: Math.log(10), sd: 0.1, scale: 'log' } },
      baselineValues: values,
      cutoff: 0.01,
      color: true,
    });
    expect(text).toContain('geometric mean 10 s');
    expect(text).toContain('\u001b');
  });
});
