import { describe, expect, it } from 'vitest';
import type { MetricResult } from '../../src/gate/report.js';
import { scaleLog } from 'd3-scale';
import { leftAxis } from '../../src/report/html-axis.js';
import { chartColumn, cutoffBand } from '../../src/report/html-data.js';
import { renderHtmlReport } from '../../src/report/html.js';
import { jStat } from '../model/jstat.js';
import { expectClose } from '../helpers/close.js';
import { HOSTILE, makeFixture } from './fixture.js';

const base: MetricResult = {
  name: 'm',
  status: 'ok',
  cutoff: 0.01,
  worse: 'higher',
  baseline: { n: 30, mean: 10, sd: 2 },
};

describe('cutoffBand', () => {
  it("has edges where the fitted Gaussian's relative density equals the cutoff (jstat second opinion)", () => {
    for (const cutoff of [0.1, 0.01, 0.001]) {
      const band = cutoffBand(base, cutoff);
      if (!band) throw new Error('no band');
      const peak = jStat.normal.pdf(10, 10, 2);
      expectClose(jStat.normal.pdf(band.low, 10, 2) / peak, cutoff, 1e-9);
      expectClose(jStat.normal.pdf(band.high, 10, 2) / peak, cutoff, 1e-9);
    }
    // From memory: the 0.01 cutoff sits at about 3.03 sd.
    expectClose(cutoffBand(base, 0.01)?.high ?? 0, 10 + 2 * 3.0349, 1e-4);
  });

  it("is asymmetric on the metric's own scale when the fit is on the log scale", () => {
    const band = cutoffBand({ ...base, baseline: { n: 30, mean: Math.log(100), sd: 0.1, scale: 'log' } }, 0.01);
    if (!band) throw new Error('no band');
    expectClose(band.mean, 100, 1e-12);
    // exp is convex: the upper edge is farther from the geometric mean than the lower one.
    expect(band.high - band.mean).toBeGreaterThan(band.mean - band.low);
    const peak = jStat.normal.pdf(Math.log(100), Math.log(100), 0.1);
    expectClose(jStat.normal.pdf(Math.log(band.high), Math.log(100), 0.1) / peak, 0.01, 1e-9);
  });

  it('draws no band without a baseline or with a cutoff outside (0, 1)', () => {
    expect(cutoffBand({ ...base, baseline: undefined }, 0.01)).toBeUndefined();
    expect(cutoffBand(base, 1)).toBeUndefined();
    expect(cutoffBand(base, 0)).toBeUndefined();
  });

  it('charts ratios to the reference metric for relative-to fits', () => {
    const history = {
      series: 's',
      runs: [{ id: 'a' }, { id: 'b' }, { id: 'c' }],
      columns: new Map([
        ['m', { values: [10, 12, NaN] }],
        ['calib', { values: [2, 0, 4] }],
      ]),
    };
    const col = chartColumn(history, { ...base, baseline: { n: 3, mean: 5, sd: 1, relativeTo: 'calib' } });
    expect(col?.values[0]).toBe(5);
    expect(col?.values.slice(1).every((v) => Number.isNaN(v))).toBe(true);
    expect(chartColumn(history, base)?.values).toEqual([10, 12, NaN]);
  });
});

describe('renderHtmlReport', () => {
  const hostile = Object.values(HOSTILE).map((name, k) => ({
    name,
    unit: '<b>u</b>',
    centre: 10 + k,
    spread: 0.5,
    now: 30,
    status: 'regressed' as const,
  }));
  const { report, history } = makeFixture(hostile);
  const html = renderHtmlReport({ report, history, title: '<i>t</i>', generatedAt: '2026-12-01T12:00:00Z' });

  it('is one self-contained document: no external URL, a CSP that forbids the network', () => {
    expect(html.startsWith('<!doctype html>')).toBe(true);
    expect(html).not.toMatch(/https?:|\/\/[a-z]/i);
    expect(html).not.toMatch(/<(link|img|iframe|object|embed)\b/i);
    expect(html).toContain(`content="default-src 'none'`);
    expect((html.match(/<script>/g) ?? []).length).toBe(1);
  });

  it('escapes every hostile name, unit and the title', () => {
    expect(html).not.toMatch(/<img|<b>|<i>|\u202E|\u001b/);
    // A javascript: text may appear as inert text, never as an attribute's value start.
    expect(html).not.toMatch(/="\s*javascript:/i);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).not.toContain('href="javascript');
    // Anchors are by position, never by (untrusted) name.
    expect(
      [...html.matchAll(/id="([^"]*)"/g)]
        .map((m) => m[1])
        .filter((id) => id !== 'summary')
        .every((id) => /^m\d+$/.test(id ?? '')),
    ).toBe(true);
  });

  it('lists every metric once in the summary, regressions first in the markup', () => {
    const rows = html.split('<tbody>')[1]?.split('</tbody>')[0]?.match(/<tr /g) ?? [];
    expect(rows.length).toBe(report.metrics.length);
    const firstRow = html.split('<tbody>')[1] ?? '';
    expect(firstRow.startsWith('<tr class="s-regressed">')).toBe(true);
    expect(html.indexOf('s-ok"><td')).toBeGreaterThan(html.lastIndexOf('s-regressed"><td'));
  });

  it("labels every tick of a log axis narrower than a decade, with the tick's own value", () => {
    // d3's log tickFormat alone labels only "36" and "38" of this domain's ticks 36..48.
    const y = scaleLog().domain([35.4, 48.3]).range([200, 0]);
    const axis = leftAxis(y, 72, 'ms');
    const labels = [...axis.matchAll(/text-anchor="end">([^<]+)</g)].map((m) => m[1] ?? '');
    expect(labels.map(Number)).toEqual(y.ticks(5));
  });

  it('draws history and histogram SVGs for fitted metrics, and has print styles', () => {
    const svgs = html.match(/<svg /g) ?? [];
    // Each judged metric with history has two charts; 'new' has none, learning/ignored only a history.
    expect(svgs.length).toBeGreaterThanOrEqual(2 * 14);
    expect(html).toContain('@media print');
  });
});
