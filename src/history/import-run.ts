import { checkMetricName } from '../inputs/names.js';
import { InputError } from '../errors/input-error.js';
import type { RunInfo } from './history.js';
import { lacksZone, normalizeIsoTime } from './iso-time.js';

/** One past run to import: who produced it and its metric values (finite numbers only). */
export interface ImportedRun {
  info: RunInfo;
  metrics: Map<string, number>;
  units: Map<string, string>;
  /** Where each metric's value was read ("file:line"), for a refusal that names it. */
  places?: Map<string, string>;
}

/** A line, row or value left out of an import, and why. `where` is "file:line". */
export interface SkippedEntry {
  where: string;
  reason: string;
}

export interface ImportParse {
  runs: ImportedRun[];
  skipped: SkippedEntry[];
}

/**
 * Builds the RunInfo of an imported run from its raw fields, or says why it cannot be imported:
 * an id is required (a string, or a whole number such as a CI run id); a time is required and
 * must be ISO-8601 with a zone when it has a time of day (stored normalised to UTC, since import
 * order is time order); sha, ref and
 * event are optional strings. Returns the reason as a string when the run must be skipped.
 *
 * @example runInfoFrom({ id: 81, time: '2026-03-01 10:00Z' }) // { id: '81', time: '2026-03-01T10:00:00.000Z' }
 */
export function runInfoFrom(fields: {
  id?: unknown;
  time?: unknown;
  sha?: unknown;
  ref?: unknown;
  event?: unknown;
}): RunInfo | string {
  const { id, time } = fields;
  let runId: string;
  if (typeof id === 'string' && id.trim() !== '') runId = id.trim();
  else if (typeof id === 'number' && Number.isSafeInteger(id)) runId = String(id);
  else return 'no id: every run needs a non-empty "id" (the CI run id and attempt, e.g. 1234-1)';
  if (time === undefined || time === null || time === '')
    return `run ${JSON.stringify(runId)} has no time: imported runs are ordered by time`;
  if (typeof time === 'string' && lacksZone(time))
    return `run ${JSON.stringify(runId)} has a time without a zone, ${JSON.stringify(time)}, which means another instant on every machine: add Z for UTC or the offset it was taken in, e.g. ${JSON.stringify(`${time.trim().replace(' ', 'T')}Z`)}`;
  const iso = typeof time === 'string' ? normalizeIsoTime(time) : undefined;
  if (iso === undefined)
    return `run ${JSON.stringify(runId)} has a bad time ${JSON.stringify(time)}: write ISO-8601, e.g. 2026-03-01T10:00:00Z`;
  const info: RunInfo = { id: runId, time: iso };
  for (const field of ['sha', 'ref', 'event'] as const) {
    const text = fields[field];
    if (text === undefined || text === null || text === '') continue;
    if (typeof text !== 'string') return `run ${JSON.stringify(runId)}: ${field} must be a string`;
    info[field] = text;
  }
  return info;
}

/**
 * The reason a metric name cannot be imported, or undefined: the same rule as every metric file
 * reader (checkMetricName: not blank, at most 512 characters, no control or bidi characters), so a
 * name refused in a metric file cannot enter the history through an import instead.
 * @example nameProblem('a\u202Eb') // 'metric name "a\u202Eb" contains a bidirectional override character (U+202E)'
 */
export function nameProblem(name: string): string | undefined {
  try {
    checkMetricName(name);
    return undefined;
  } catch (error) {
    if (error instanceof InputError) return error.message;
    throw error;
  }
}

/**
 * Reads one metric value: a finite JSON number, or decimal text when `text` is allowed (CSV
 * cells). Returns the reason when it is not one — "NaN", "Infinity", 1e999, hex and empty text
 * are all refused; in JSON a quoted number is refused too, since the writer meant something else.
 *
 * @example valueFrom('1.5e3', true) // 1500
 */
export function valueFrom(raw: unknown, text = false): number | string {
  let v: number;
  if (typeof raw === 'number') v = raw;
  else if (typeof raw === 'string' && text && /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(raw.trim()))
    v = Number(raw.trim());
  else if (typeof raw === 'string' && !text) return `value ${JSON.stringify(raw)} is text, not a number`;
  else return `value ${JSON.stringify(raw) ?? String(raw)} is not a number`;
  return Number.isFinite(v) ? v : `value ${String(raw)} is not a finite number`;
}
