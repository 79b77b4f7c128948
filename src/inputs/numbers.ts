import { InputError } from '../errors/input-error.js';

// A plain decimal number: optional sign, digits with an optional fraction, optional exponent.
// Stricter than Number(): no hex, no "", no surrounding spaces, no "Infinity".
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(?:inf|infinity|nan)$/i;

/**
 * Parses a metric value written as text. Returns the number, or throws a clear InputError.
 * Readers of text formats share it so that "1,5", "0x10" or "NaN" are refused the same way everywhere.
 * @throws InputError for text that is not a decimal number and for NaN/Inf.
 * @example parseDecimal('4.125e2', 'bench.csv:3', 'value') // 412.5
 */
export function parseDecimal(text: string, where: string | undefined, what: string): number {
  const trimmed = text.trim();
  if (DECIMAL.test(trimmed)) {
    const value = Number(trimmed);
    if (Number.isFinite(value)) return value;
    throw nonFinite(trimmed, where, what);
  }
  if (NON_FINITE.test(trimmed)) throw nonFinite(trimmed, where, what);
  throw new InputError(`${what} ${JSON.stringify(truncate(trimmed))} is not a number`, {
    where,
    fix: 'write the value as a plain decimal number such as 412.5 or 1.2e-3',
  });
}

/** The error for NaN, infinities and overflowing numbers, shared by all readers. */
export function nonFinite(text: string, where: string | undefined, what: string): InputError {
  return new InputError(`${what} ${truncate(text)} is not a finite number`, {
    where,
    fix: 'leave out metrics that were not measured instead of writing NaN or Infinity',
  });
}

/** Shortens untrusted text for a message. */
export function truncate(text: string, max = 60): string {
  return text.length > max ? `${text.slice(0, max)}...` : text;
}
