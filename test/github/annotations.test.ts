// Annotations: one error per regression, one notice per improvement, names cleaned. The bidi
// override characters (U+202A-202E, U+2066-2069) are those of Unicode's bidirectional algorithm
// (UAX #9); a name carrying them must not reach the run page raw.
import { describe, expect, it } from 'vitest';
import { annotate } from '../../src/github/annotations.js';
import { REPORT_SCHEMA, type MetricResult, type Report } from '../../src/gate/report.js';

function metric(over: Partial<MetricResult>): MetricResult {
  return { name: 'route/match', status: 'ok', cutoff: 0.01, worse: 'higher', ...over };
}

function report(metrics: MetricResult[]): Report {
  return {
    schema: REPORT_SCHEMA,
    verdict: 'regressed',
    series: 'bench',
    blocks: true,
    family: 'none',
    budget: 0.01,
    unsettled: 'pass',
    metrics,
    shared: [],
  };
}

describe('annotate', () => {
  it('writes one error per regression and one notice per improvement, with the numbers formatted', () => {
    const seen: { kind: string; text: string; title?: string }[] = [];
    const sink = {
      error: (text: string, p?: { title?: string }) => void seen.push({ kind: 'error', text, title: p?.title }),
      notice: (text: string, p?: { title?: string }) => void seen.push({ kind: 'notice', text, title: p?.title }),
    };
    const counts = annotate(
      report([
        // change (47.6 - 38.6) / 38.6 = 0.2332 -> "+23.3%" (computed by hand)
        metric({
          name: 'latency/p95',
          status: 'regressed',
          value: 47.6,
          unit: 'ms',
          change: (47.6 - 38.6) / 38.6,
          relativeDensity: 2.5e-6,
          baseline: { n: 60, mean: 38.6, sd: 1.2 },
        }),
        metric({ name: 'memory/peak', status: 'improved', value: 371, unit: 'MiB', change: -0.098 }),
        metric({ name: 'size/app', status: 'ok' }),
      ]),
      sink as never,
      'bench',
    );
    expect(counts).toEqual({ errors: 1, notices: 1 });
    expect(seen.map((s) => s.kind)).toEqual(['error', 'notice']);
    expect(seen[0]?.title).toBe('bellgate [bench]: latency/p95 regressed');
    expect(seen[0]?.text).toContain('+23.3%');
    expect(seen[0]?.text).toContain('47.6 ms');
    expect(seen[0]?.text).not.toMatch(/38\.6\d{6}/);
  });

  it('never passes control or bidirectional-override characters of a name or unit through', () => {
    const seen: string[] = [];
    const sink = {
      error: (text: string, p?: { title?: string }) => void seen.push(text, p?.title ?? ''),
      notice: () => undefined,
    };
    annotate(
      report([
        metric({
          name: 'evil\u202Egnp.exe\u0007',
          status: 'regressed',
          value: 1,
          unit: 'ms\u2066',
          note: { kind: 'no-reference', reference: 'moved\u001b[31m' },
        }),
      ]),
      sink as never,
      'se\u202Eries',
    );
    for (const s of seen) expect(s).not.toMatch(/[\u0000-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
    expect(seen.join(' ')).toContain('evil');
  });
});
