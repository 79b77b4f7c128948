import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rememberLast } from '../../src/gate/remember-last.js';

describe('rememberLast', () => {
  it('always answers what the function answers, computing again only when the argument changes', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(0.01, 0.05, -0, 0, NaN, 1e-300)), (xs) => {
        let calls = 0;
        const compute = (x: number): string => {
          calls++;
          return Object.is(x, -0) ? 'minus zero' : String(x);
        };
        const remembered = rememberLast(compute);
        let changes = 0;
        xs.forEach((x, i) => {
          if (i === 0 || !Object.is(x, xs[i - 1])) changes++;
          expect(remembered(x)).toBe(compute(x));
          calls--; // the direct call above is not the wrapper's
        });
        expect(calls).toBe(changes);
      }),
    );
  });
});
