import { precisionText } from './precision-text.js';

/**
 * Short numbers for reason sentences: 3 significant digits, exponent form below 1e-3.
 * @example formatNumber(0.000321) // '3.21e-4'
 */
export function formatNumber(x: number): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  if (a < 1e-3 || a >= 1e6)
    return x
      .toExponential(2)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'e');
  return precisionText(x, 3);
}

/** A share as a percent with one decimal. @example formatPercent(0.0512) // '5.1%' */
export function formatPercent(share: number): string {
  return `${Number((share * 100).toFixed(1))}%`;
}
