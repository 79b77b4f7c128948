import { DEFAULT_LIMITS } from '../config/defaults.js';
import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';

/** Limits used when the config gives none (config/defaults.ts). */
export { DEFAULT_LIMITS };

/** The config key that raises each limit, for refusal messages. */
export const LIMIT_KEYS: Readonly<Record<keyof InputLimits, string>> = Object.freeze({
  maxFileBytes: 'limits.max-file-bytes',
  maxLineLength: 'limits.max-line-length',
  maxMetrics: 'limits.max-metrics',
  maxSamples: 'limits.max-samples',
});

/**
 * The refusal for a limit that was passed: names the limit, its value and the key that raises it.
 * @example limitError('maxMetrics', 100000, 'run.json', 'more than 100000 metrics')
 */
export function limitError(limit: keyof InputLimits, value: number, where: string, what: string): InputError {
  return new InputError(`${what} (limit ${LIMIT_KEYS[limit]} = ${value})`, {
    where,
    fix: `raise ${LIMIT_KEYS[limit]} in the config file if this input is expected`,
  });
}

/**
 * The refusal for a file or run past `limits.max-samples`, at the sample that passed it.
 * @example samplesError('run.csv', 1000, 'run.csv:1002')
 */
export function samplesError(file: string, max: number, where: string): InputError {
  return limitError('maxSamples', max, where, `${file} has more than ${max} samples`);
}

/**
 * Calls `each` with every line of the text (without its "\n") and its 1-based number, in order,
 * without splitting the whole text first, so a reader that throws part-way (at a limit) stops
 * there instead of holding every line of a large file. The same lines as text.split('\n').
 * @example eachLine('a\nb', (line, n) => console.log(n, line)) // 1 a, then 2 b
 */
export function eachLine(text: string, each: (line: string, number: number) => void): void {
  for (let start = 0, number = 1; start <= text.length; number++) {
    const newline = text.indexOf('\n', start);
    const end = newline < 0 ? text.length : newline;
    each(text.slice(start, end), number);
    start = end + 1;
  }
}

/**
 * Refuses text with a line longer than `limits.maxLineLength` characters. O(n), no copies.
 * Applied by the line-oriented readers (JSON Lines, CSV, OpenMetrics, Go benchmark format), whose
 * work is per line; whole-document formats (own JSON, JUnit XML) are often written on one line and
 * are bounded by `limits.max-file-bytes` instead.
 * @throws InputError naming the line and `limits.max-line-length`.
 */
export function checkLineLengths(text: string, file: string, limits: InputLimits): void {
  const max = limits.maxLineLength;
  if (text.length <= max) return;
  let start = 0;
  let line = 1;
  while (start <= text.length) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    if (end - start > max) {
      throw limitError('maxLineLength', max, `${file}:${line}`, `line ${line} is ${end - start} characters long`);
    }
    start = end + 1;
    line++;
  }
}
