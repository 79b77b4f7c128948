import { InputError } from '../errors/input-error.js';

/**
 * Where decoding a history document reports a problem: a JSON path ("metrics.values[3][17]"), what
 * is wrong, and optionally how to fix it. parseHistory passes a sink that throws on the first
 * problem; verifyHistory passes one that collects them all and lets decoding carry on.
 */
export type ProblemSink = (path: string, problem: string, fix?: string) => void;

/** One finding of verifyHistory. `where` is a JSON path, or "line:col" for a syntax error. */
export interface HistoryProblem {
  where: string;
  problem: string;
}

/**
 * A sink that throws InputError at the first problem, located as "source at path".
 *
 * @example throwingSink('h.json')('runs.id[2]', 'run id "7-1" appears twice') // throws InputError
 */
export function throwingSink(source: string): ProblemSink {
  return (path, problem, fix) => {
    throw new InputError(problem, {
      where: path === '' ? source : `${source} at ${path}`,
      fix: fix ?? 'repair the document (run `bellgate verify` to list every problem) or restore it from a backup',
    });
  };
}

/**
 * A sink that collects problems into `into`, keeping at most `limit` of them and then one line
 * saying how many more there were — a document with a million bad values stays readable.
 */
export function collectingSink(into: HistoryProblem[], limit = 200): { sink: ProblemSink; finish(): void } {
  let extra = 0;
  return {
    sink: (path, problem) => {
      if (into.length < limit) into.push({ where: path, problem });
      else extra += 1;
    },
    finish: () => {
      if (extra > 0) into.push({ where: '', problem: `${extra} more problems not listed` });
    },
  };
}

/** `metrics.values[3]`-style path step for an array index. */
export const at = (path: string, index: number): string => `${path}[${index}]`;

/** Path step for an object key; quoted because metric names hold dots, slashes and brackets. */
export const key = (path: string, name: string): string => `${path}[${JSON.stringify(name)}]`;

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
