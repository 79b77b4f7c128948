import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  formatAgainstCutoff,
  formatChange,
  formatDensity,
  formatNumber,
  formatSigma,
} from '../../src/report/format.js';

// Reference: ECMA-402 Intl.NumberFormat with maximumSignificantDigits (the platform's own
// implementation of significant-digit rounding), grouping off.
const intl = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4, useGrouping: false });

describe('number formats', () => {
  it('agrees with Intl.NumberFormat on 4 significant digits in [0.001, 1000)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 999.9, noNaN: true }), fc.boolean(), (x, neg) => {
        const v = neg ? -x : x;
        expect(formatNumber(v)).toBe(intl.format(v).replace('−', '-'));
      }),
      { numRuns: 500 },
    );
  });

  it('keeps every integer digit of large values and uses exponents outside [1e-3, 1e9)', () => {
    expect(formatNumber(40211)).toBe('40211');
    expect(formatNumber(0.00001234567)).toBe('1.235e-5');
    expect(formatNumber(2.5e12)).toBe('2.5e12');
    expect(formatNumber(NaN)).toBe('n/a');
    expect(formatNumber(Infinity)).toBe('n/a');
  });

  it('writes the change 0.217 as +21.7% and signs both ways', () => {
    // Value 12.3 against baseline mean 10.1: change 2.2 / 10.1 = 0.2178..., by hand.
    expect(formatChange(0.217)).toBe('+21.7%');
    expect(formatChange(-0.0042)).toBe('-0.42%');
    expect(formatChange(0)).toBe('±0%');
    expect(formatSigma(5.5)).toBe('+5.5 sd');
    expect(formatSigma(-4.12)).toBe('-4.1 sd');
  });

  it('shows relative densities (2.6e-7 against 0.01)', () => {
    expect(formatDensity(2.6e-7)).toBe('2.6e-7');
    expect(formatDensity(0.0342)).toBe('0.034');
    expect(formatAgainstCutoff(2.6e-7, 0.01)).toBe('2.6e-7 < 0.01');
    expect(formatAgainstCutoff(0.5, 0.01)).toBe('0.5 ≥ 0.01');
    // Exponent form is JavaScript's own Number.prototype.toExponential (ECMA-262) with "e+" shortened.
    expect(formatDensity(1.23456e-9)).toBe((1.23456e-9).toExponential(1));
  });
});
