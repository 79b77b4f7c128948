import type { Tolerance } from './types.js';

const PERCENT = /^((?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)) ?%$/;

/**
 * Reads a `tolerance:` value: a number is absolute (in the metric's unit), a string "N%" is a
 * share of the baseline mean. Returns undefined for anything else (the schema has refused it).
 * @example parseTolerance('1%') // { kind: 'percent', amount: 0.01 }
 * @example parseTolerance(512) // { kind: 'absolute', amount: 512 }
 */
export function parseTolerance(value: unknown): Tolerance | undefined {
  if (typeof value === 'number' && Number.isFinite(value) && value >= 0) return { kind: 'absolute', amount: value };
  if (typeof value !== 'string') return undefined;
  const found = PERCENT.exec(value);
  return found ? { kind: 'percent', amount: Number(found[1]) / 100 } : undefined;
}
