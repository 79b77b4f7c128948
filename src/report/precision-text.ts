/**
 * `String(Number(x.toPrecision(digits)))`: x rounded to `digits` significant digits, without
 * trailing zeros. When toPrecision writes plain decimals (no exponent) and digits <= 15, the
 * zeros are cut from its string instead of parsing it back and printing the double again: a
 * decimal of at most 15 significant digits reads back to a double whose shortest form is that
 * decimal (DBL_DIG = 15, IEEE 754), and both forms then use plain notation (ECMA-262
 * Number::toString and Number.prototype.toPrecision switch to exponents at the same exponents).
 * Anything else takes the round trip. Every report formats several numbers per metric, so this is
 * a visible part of a report on a thousand metrics.
 * @example precisionText(412.50001, 4) // '412.5'
 * @example precisionText(1.0004, 4) // '1'
 */
export function precisionText(x: number, digits: number): string {
  const fixed = x.toPrecision(digits);
  if (digits > 15 || fixed.includes('e')) return String(Number(fixed));
  if (!fixed.includes('.')) return fixed;
  let end = fixed.length;
  while (fixed.charCodeAt(end - 1) === 48) end--; // '0'
  if (fixed.charCodeAt(end - 1) === 46) end--; // '.'
  return fixed.slice(0, end);
}
