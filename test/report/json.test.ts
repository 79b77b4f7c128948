import { describe, expect, it } from 'vitest';
import { renderJson } from '../../src/report/json.js';
import { makeFixture } from './fixture.js';

// The JSON report's documented shape (schema bellgate.report/1: these field names are stable), written out by hand.
const DOCUMENTED = {
  schema: 'bellgate.report/1',
  verdict: 'regressed',
  series: '...',
  metrics: [
    {
      name: '...',
      status: 'regressed',
      value: 12.3,
      unit: 'ms',
      baseline: { n: 60, mean: 10.1, sd: 0.4 },
      z: 5.5,
      change: 0.217,
      density: 1.2e-7,
      relativeDensity: 2.6e-7,
      cutoff: 0.01,
    },
  ],
};

describe('renderJson', () => {
  const { report } = makeFixture();
  const doc = JSON.parse(renderJson(report)) as { metrics: Record<string, unknown>[] } & Record<string, unknown>;

  it('uses the documented field names in their order, extras after', () => {
    expect(Object.keys(doc).slice(0, 3)).toEqual(Object.keys(DOCUMENTED).slice(0, 3));
    expect(Object.keys(doc)).toContain('metrics');
    const designKeys = Object.keys(DOCUMENTED.metrics[0] ?? {});
    for (const m of doc.metrics) {
      expect(Object.keys(m).slice(0, designKeys.length)).toEqual(designKeys);
      if (m.baseline !== null) expect(Object.keys(m.baseline as object).slice(0, 3)).toEqual(['n', 'mean', 'sd']);
    }
    expect(doc.schema).toBe(DOCUMENTED.schema);
  });

  it('writes numbers that are not finite as null, keeps 2-space indent and a final newline', () => {
    const m0 = report.metrics[0];
    if (!m0) throw new Error('fixture');
    const text = renderJson({
      ...report,
      metrics: [{ ...m0, z: Infinity, density: NaN, recent: [1, NaN, -Infinity] }],
    });
    const parsed = JSON.parse(text) as { metrics: { z: unknown; density: unknown; recent: unknown[] }[] };
    expect(parsed.metrics[0]?.z).toBeNull();
    expect(parsed.metrics[0]?.density).toBeNull();
    expect(parsed.metrics[0]?.recent).toEqual([1, null, null]);
    expect(text).not.toMatch(/NaN|Infinity/);
    expect(text.split('\n')[1]).toBe('  "schema": "bellgate.report/1",');
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('is stable: the same report gives the same text, whatever order optional fields were set in', () => {
    const m0 = report.metrics[0];
    if (!m0) throw new Error('fixture');
    const { cutoff, name, ...rest } = m0;
    const reordered = { cutoff, ...rest, name };
    expect(renderJson({ ...report, metrics: [reordered] })).toBe(renderJson({ ...report, metrics: [m0] }));
  });

  it('keeps a metric named __proto__ as plain data', () => {
    const m0 = report.metrics[0];
    if (!m0) throw new Error('fixture');
    const parsed = JSON.parse(renderJson({ ...report, metrics: [{ ...m0, name: '__proto__' }] })) as {
      metrics: { name: string }[];
    };
    expect(parsed.metrics[0]?.name).toBe('__proto__');
  });
});
