/**
 * Number formatting shared by every renderer. Pure and locale-free (CI logs and PR comments are
 * read everywhere; a decimal comma would break copy-paste into other tools). Non-finite numbers
 * print as "n/a", never "NaN".
 */
import { precisionText } from './precision-text.js';

export const NOT_AVAILABLE = 'n/a';

/**
 * A value with `digits` significant digits, but never rounding away integer digits (40211 stays
 * 40211) and switching to exponent form outside [1e-3, 1e9).
 * @example formatNumber(412.5) // '412.5'
 * @example formatNumber(0.000012345) // '1.235e-5'
 */
export function formatNumber(x: number | undefined, digits = 4): string {
  if (x === undefined || !Number.isFinite(x)) return NOT_AVAILABLE;
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs < 1e-3 || abs >= 1e9)
    return x
      .toExponential(digits - 1)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'e');
  if (abs >= 10 ** digits) return String(Math.round(x));
  return precisionText(x, digits);
}

/** A value with its unit ("412.5 ns"); the unit must already be escaped for the target format. */
export function formatValue(x: number | undefined, unit?: string): string {
  const n = formatNumber(x);
  return unit && n !== NOT_AVAILABLE ? `${n} ${unit}` : n;
}

/**
 * A relative change as a signed percentage with two significant digits below 10%.
 * @example formatChange(0.217) // '+21.7%'
 * @example formatChange(-0.0042) // '-0.42%'
 */
export function formatChange(change: number | undefined): string {
  if (change === undefined || !Number.isFinite(change)) return NOT_AVAILABLE;
  // A change near the largest double would overflow to Infinity when turned into percent.
  const pct = Math.max(-Number.MAX_VALUE, Math.min(Number.MAX_VALUE, change * 100));
  const abs = Math.abs(pct);
  const body =
    abs === 0
      ? '0'
      : abs >= 1e6
        ? formatNumber(abs, 3)
        : abs >= 10
          ? abs.toFixed(1)
          : abs >= 1
            ? abs.toFixed(2)
            : formatNumber(abs, 2);
  return `${pct > 0 ? '+' : pct < 0 ? '-' : '±'}${body}%`;
}

/** How many standard deviations from the baseline mean, signed. @example formatSigma(4.12) // '+4.1 sd' */
export function formatSigma(z: number | undefined): string {
  if (z === undefined || !Number.isFinite(z)) return NOT_AVAILABLE;
  const r = Math.abs(z) >= 100 ? Math.round(z).toString() : z.toFixed(1);
  return `${z >= 0 ? '+' : ''}${r === '-0.0' ? '0.0' : r} sd`;
}

/**
 * A relative density (in (0, 1]): two significant digits, in scientific notation below 0.001
 * where a decimal would be all zeros.
 * @example formatDensity(2.6e-7) // '2.6e-7'
 * @example formatDensity(0.0342) // '0.034'
 */
export function formatDensity(r: number | undefined): string {
  if (r === undefined || !Number.isFinite(r)) return NOT_AVAILABLE;
  if (r === 0) return '0';
  if (r >= 1e-3) return formatNumber(r, 2);
  return r.toExponential(1).replace('e+', 'e');
}

/** "2.6e-7 < 0.01": the relative density against the cutoff, the comparison the gate made. */
export function formatAgainstCutoff(r: number | undefined, cutoff: number): string {
  if (r === undefined || !Number.isFinite(r)) return NOT_AVAILABLE;
  return `${formatDensity(r)} ${r < cutoff ? '<' : '≥'} ${formatDensity(cutoff)}`;
}
