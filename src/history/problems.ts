import { InputError } from '../errors/input-error.js';

/**
 * Where decoding a history document reports a problem: the place ("12" for line 12, "12:5" for a
 * column of it), what is wrong, and optionally how to fix it. parseHistory passes a sink that
 * throws on the first problem; verifyHistory passes one that collects them all and goes on.
 */
export type ProblemSink = (where: string, problem: string, fix?: string) => void;

/** One finding of verifyHistory: `where` is "LINE" or "LINE:COL" of the document. */
export interface HistoryProblem {
  where: string;
  problem: string;
}

/** The fix a reader of a broken document is given. */
export const REPAIR_FIX =
  'repair that line (run `bellgate verify --history FILE` to list every problem) or restore the file from a backup';

/**
 * A sink that throws InputError at the first problem, located as "source:LINE[:COL]".
 *
 * @example throwingSink('h.jsonl')('3', 'run "7-1": "time" is a number') // throws InputError at h.jsonl:3
 */
export function throwingSink(source: string): ProblemSink {
  return (where, problem, fix) => {
    throw new InputError(problem, { where: where === '' ? source : `${source}:${where}`, fix: fix ?? REPAIR_FIX });
  };
}

/**
 * A sink that collects problems into `into`, keeping at most `limit` of them and then one line
 * saying how many more there were: a document with a million bad values stays readable.
 */
export function collectingSink(into: HistoryProblem[], limit = 200): { sink: ProblemSink; finish(): void } {
  let extra = 0;
  return {
    sink: (where, problem) => {
      if (into.length < limit) into.push({ where, problem });
      else extra += 1;
    },
    finish: () => {
      if (extra > 0) into.push({ where: '', problem: `${extra} more problems not listed` });
    },
  };
}

/** A JSON object (not null, not an array). */
export function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Short description of a JSON value's type for messages ("a string", "null"). */
export function typeName(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'number' && !Number.isFinite(value)) return `the non-finite number ${value}`;
  return `a ${typeof value}`;
}
