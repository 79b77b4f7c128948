import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { MetricResult, Report, Status } from '../../src/gate/report.js';
import type { History } from '../../src/history/history.js';
import { renderExplain } from '../../src/report/explain.js';
import { renderHtmlReport } from '../../src/report/html.js';
import { renderJson } from '../../src/report/json.js';
import { renderMarkdown } from '../../src/report/markdown.js';
import { renderText } from '../../src/report/text.js';

// Whatever numbers reach a renderer (the gate floors sd and never emits NaN, but a hand-edited
// JSON report or a future field might), no output may show "NaN"/"Infinity" or throw. Common practice.
const odd = fc.oneof(
  fc.constantFrom(
    NaN,
    Infinity,
    -Infinity,
    0,
    -0,
    Number.MIN_VALUE,
    Number.MAX_VALUE,
    -Number.MAX_VALUE,
    1e-300,
    1e300,
  ),
  fc.double({ noNaN: false }),
);
const statuses: Status[] = ['ok', 'regressed', 'improved', 'learning', 'new', 'missing', 'ignored'];

const metricArb = fc.record({
  name: fc.string({ maxLength: 20 }),
  status: fc.constantFrom(...statuses),
  value: fc.option(odd, { nil: undefined }),
  baseline: fc.option(fc.record({ n: fc.integer({ min: 0, max: 100 }), mean: odd, sd: odd, log: fc.boolean() }), {
    nil: undefined,
  }),
  z: fc.option(odd, { nil: undefined }),
  change: fc.option(odd, { nil: undefined }),
  relativeDensity: fc.option(odd, { nil: undefined }),
  recent: fc.array(odd, { maxLength: 8 }),
  history: fc.array(odd, { maxLength: 8 }),
});

describe('renderers with odd numbers', () => {
  it('never print NaN or Infinity and never throw', () => {
    fc.assert(
      fc.property(fc.array(metricArb, { minLength: 1, maxLength: 4 }), (specs) => {
        const history: History = {
          series: 's',
          runs: Array.from({ length: 8 }, (_, i) => ({ id: `r${i}` })),
          columns: new Map(),
        };
        const metrics: MetricResult[] = specs.map((s, i) => {
          const name = `${i}:${s.name}`;
          history.columns.set(name, { values: Array.from({ length: 8 }, (_, k) => s.history[k] ?? NaN) });
          const m: MetricResult = {
            name,
            status: s.status,
            cutoff: 0.01,
            worse: 'higher',
            recent: s.recent,
          };
          if (s.value !== undefined) m.value = s.value;
          if (s.baseline)
            m.baseline = {
              n: s.baseline.n,
              mean: s.baseline.mean,
              sd: s.baseline.sd,
              ...(s.baseline.log ? { scale: 'log' as const } : {}),
            };
          if (s.z !== undefined) m.z = s.z;
          if (s.change !== undefined) m.change = s.change;
          if (s.relativeDensity !== undefined) m.relativeDensity = s.relativeDensity;
          return m;
        });
        const report: Report = {
          schema: 'bellgate.report/1',
          verdict: 'pass',
          series: 's',
          family: 'none',
          metrics,
          blocks: false,
          budget: 0.01,
          unsettled: 'pass',
          shared: [],
        };
        const outputs = [
          renderText(report, { color: false }),
          renderMarkdown(report),
          renderJson(report),
          renderHtmlReport({ report, history }),
        ];
        for (const m of metrics)
          outputs.push(
            renderExplain({
              result: m,
              baselineValues: history.columns.get(m.name)?.values ?? [],
              cutoff: 0.01,
              color: false,
            }),
          );
        // \b keeps the sort script's own isNaN out of the check.
        for (const out of outputs) expect(out).not.toMatch(/\bNaN\b|Infinity/);
      }),
      { numRuns: 300 },
    );
  });
});
