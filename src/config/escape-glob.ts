import { compileGlobs } from './glob-matcher.js';

/**
 * A glob that matches exactly this metric name: picomatch's special characters are escaped with
 * a backslash, so "cache[hit]" or "!legacy" are read literally. Returns undefined when the escaped
 * glob still does not match the name alone (then no rule is written for it).
 * @example literalGlob('latency/p95{eu}') // 'latency/p95\\{eu\\}'
 */
export function literalGlob(name: string): string | undefined {
  const glob = name.replace(/[\\*?[\]{}()!+@|^$]/g, '\\$&');
  return compileGlobs([glob])(name) ? glob : undefined;
}
