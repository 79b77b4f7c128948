import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { precisionText } from '../../src/report/precision-text.js';

/** The reference: the JavaScript built-ins themselves (ECMA-262 toPrecision, Number, String). */
const roundTrip = (x: number, digits: number): string => String(Number(x.toPrecision(digits)));

describe('precisionText', () => {
  it('cuts trailing zeros as a round trip through Number would (values worked by hand)', () => {
    expect(precisionText(412.50001, 4)).toBe('412.5');
    expect(precisionText(1.0004, 4)).toBe('1');
    expect(precisionText(-0.0012004, 3)).toBe('-0.0012');
    expect(precisionText(100.04, 4)).toBe('100');
    // toPrecision switches to an exponent here (e >= digits): the round trip writes it out
    expect(precisionText(9999.6, 4)).toBe('10000');
    expect(precisionText(1.5e-7, 2)).toBe('1.5e-7');
  });

  it('property: equals String(Number(x.toPrecision(digits))) for any finite double and 1..21 digits', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 21 }), (x, digits) => {
        expect(precisionText(x, digits)).toBe(roundTrip(x, digits));
      }),
      { numRuns: 3000 },
    );
  });

  it('property: equals the round trip on report-sized values (1e-4 .. 1e10, 1..6 digits)', () => {
    const sized = fc.tuple(fc.double({ min: 1, max: 10, noNaN: true }), fc.integer({ min: -4, max: 10 }), fc.boolean());
    fc.assert(
      fc.property(sized, fc.integer({ min: 1, max: 6 }), ([m, e, negative], digits) => {
        const x = (negative ? -1 : 1) * m * 10 ** e;
        expect(precisionText(x, digits)).toBe(roundTrip(x, digits));
      }),
      { numRuns: 5000 },
    );
  });
});
