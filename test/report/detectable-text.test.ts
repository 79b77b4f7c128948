import { describe, expect, it } from 'vitest';
import type { MetricResult } from '../../src/gate/report.js';
import { detectableText } from '../../src/report/reason.js';

function metric(unit: string | undefined, worse: MetricResult['worse']): MetricResult {
  return { name: 'm', status: 'ok', ...(unit ? { unit } : {}), worse, detectable: 0.07 } as MetricResult;
}

// The word follows what the metric measures: only a timing slows down (common practice in wording).
describe('detectableText names the worse move in the metric’s own terms', () => {
  it('a timing that gets worse upward: a slowdown', () => {
    expect(detectableText(metric('ms', 'higher'))).toMatch(/^can see a slowdown of 7(\.0+)?% or more/);
  });
  it('a size or a memory peak: a rise', () => {
    expect(detectableText(metric('MiB', 'higher'))).toMatch(/^can see a rise of 7/);
    expect(detectableText(metric('B', 'higher'))).toMatch(/^can see a rise of 7/);
    expect(detectableText(metric(undefined, 'higher'))).toMatch(/^can see a rise of 7/);
  });
  it('a throughput: a drop; either side: a move', () => {
    expect(detectableText(metric('req/s', 'lower'))).toMatch(/^can see a drop of 7/);
    expect(detectableText(metric('ms', 'both'))).toMatch(/^can see a move of 7/);
  });
});
