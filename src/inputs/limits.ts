import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';

/** Limits used when the config gives none: 64 MiB per file, 1 MiB per line, 100000 metrics. */
export const DEFAULT_LIMITS: Readonly<InputLimits> = Object.freeze({
  maxFileBytes: 64 * 1024 * 1024,
  maxLineLength: 1024 * 1024,
  maxMetrics: 100_000,
});

/** The config key that raises each limit, for refusal messages. */
export const LIMIT_KEYS: Readonly<Record<keyof InputLimits, string>> = Object.freeze({
  maxFileBytes: 'limits.max-file-bytes',
  maxLineLength: 'limits.max-line-length',
  maxMetrics: 'limits.max-metrics',
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
