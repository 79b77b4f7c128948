import { InputError } from '../errors/input-error.js';
import { checkMetricName } from './names.js';

/** A metric file pattern and the name prefix its metrics get. */
export interface FilePattern {
  pattern: string;
  prefix?: string;
}

/**
 * Splits `path-or-glob => prefix`: every metric read from the files the pattern matches is named
 * `<prefix>/<name>` (`bench/*.txt => server` turns `BenchmarkRoute/ns/op` into
 * `server/BenchmarkRoute/ns/op`). Slashes around the prefix are dropped; without `=>` there is
 * no prefix. The prefix follows the metric name rule (names.ts).
 * @throws InputError for an empty pattern or prefix.
 * @example splitPattern('out/*.json => api') // { pattern: 'out/*.json', prefix: 'api' }
 */
export function splitPattern(text: string): FilePattern {
  const arrow = text.indexOf('=>');
  const pattern = (arrow < 0 ? text : text.slice(0, arrow)).trim();
  if (pattern === '') {
    throw new InputError(`empty metric file pattern in ${JSON.stringify(text)}`, {
      fix: 'write a path or glob, optionally followed by "=> prefix"',
    });
  }
  if (arrow < 0) return { pattern };
  return { pattern, prefix: normalizePrefix(text.slice(arrow + 2), text) };
}

/**
 * A prefix as metric names will carry it: trimmed, without slashes at either end, following the
 * metric name rule. Shared by `pattern => prefix` and the `prefixes` option of readMetricFiles.
 * @throws InputError for an empty prefix or one the name rule refuses.
 * @example normalizePrefix(' /api/ ', 'x') // 'api'
 */
export function normalizePrefix(text: string, where: string): string {
  const prefix = trimSlashes(text.trim());
  if (prefix === '') {
    throw new InputError(`empty prefix in ${JSON.stringify(where)}`, {
      fix: 'write "path => prefix", or leave out the prefix',
    });
  }
  return checkMetricName(prefix, where);
}

/** `<prefix>/<name>`, or the name itself without a prefix; the result is checked again (length). */
export function prefixed(prefix: string | undefined, name: string, where?: string): string {
  return prefix === undefined ? name : checkMetricName(`${prefix}/${name}`, where);
}

function trimSlashes(text: string): string {
  let start = 0;
  let end = text.length;
  while (start < end && text[start] === '/') start++;
  while (end > start && text[end - 1] === '/') end--;
  return text.slice(start, end);
}
