import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BLOCKS, sparkline } from '../../src/report/sparkline.js';

// The eight heights are Unicode's "Block Elements" U+2581 LOWER ONE EIGHTH BLOCK .. U+2588 FULL
// BLOCK (Unicode Standard, code chart 2580-259F).
describe('sparkline', () => {
  it('uses the Unicode lower-eighth blocks in height order', () => {
    expect(BLOCKS.map((b) => b.codePointAt(0))).toEqual([
      0x2581, 0x2582, 0x2583, 0x2584, 0x2585, 0x2586, 0x2587, 0x2588,
    ]);
    expect(sparkline([1, 2, 3, 4, 5, 6, 7, 8])).toBe('▁▂▃▄▅▆▇█');
    expect(sparkline([8, 1])).toBe('█▁');
  });

  it('marks this run after an arrow, scaled together with the history', () => {
    expect(sparkline([1, 1, 1], 2)).toBe('▁▁▁→█');
    expect(sparkline([0, 10], 5)).toBe('▁█→▅');
  });

  it('handles constant, missing and empty series', () => {
    expect(sparkline([3, 3, 3])).toBe('▄▄▄');
    expect(sparkline([1, NaN, 2])).toBe('▁ █');
    expect(sparkline([])).toBe('');
    expect(sparkline([NaN], NaN)).toBe('');
  });

  it('has one character per value and preserves order of heights (any series)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 60 }), (xs) => {
        const line = Array.from(sparkline(xs));
        expect(line.length).toBe(xs.length);
        const h = line.map((ch) => BLOCKS.indexOf(ch as (typeof BLOCKS)[number]));
        for (let i = 0; i < xs.length; i++) {
          for (let j = 0; j < xs.length; j++) {
            if ((xs[i] ?? 0) < (xs[j] ?? 0)) expect(h[i]).toBeLessThanOrEqual(h[j] ?? 0);
          }
        }
        // The extremes reach the bottom and top blocks unless the series is constant.
        if (Math.min(...xs) < Math.max(...xs)) expect([Math.min(...h), Math.max(...h)]).toEqual([0, 7]);
      }),
      { numRuns: 200 },
    );
  });
});
