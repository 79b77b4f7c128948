import { existsSync } from 'node:fs';
import { stat } from 'node:fs/promises';
import path from 'node:path';
import { glob } from 'tinyglobby';
import type { Aggregate, InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { readUserFile } from '../files/read-user-file.js';
import { collectRun } from './collect.js';
import { DEFAULT_LIMITS, limitError } from './limits.js';
import { parseMetricText } from './parse.js';
import { normalizePrefix, prefixed, splitPattern } from './pattern.js';
import type { ReadResult, Run } from './run.js';

export interface ReadFilesOptions {
  /** Force one format for every file (`--input-format`); detected per file when absent. */
  format?: string;
  limits: InputLimits;
  aggregateFor: (name: string) => Aggregate;
  /**
   * Name prefix per file pattern (`--prefix PATTERN=PREFIX`): each metric file found whose path
   * (relative to cwd, with `/`) the glob PATTERN matches gets PREFIX. `pattern => prefix` in a
   * metrics line also works, for every file that line finds.
   */
  prefixes?: Map<string, string>;
  cwd?: string;
}

/**
 * Reads every metric file the patterns name and folds them into one Run (collectRun).
 * - A pattern is a path or a glob (tinyglobby: `**`, `*`, `{a,b}`), optionally `pattern => prefix`
 *   (pattern.ts). An existing file path is taken literally even if it holds glob characters.
 *   A pattern that matches no file is an error: a silent empty run would pass every gate.
 * - Each file is read by readUserFile: a regular file (not a folder, device or FIFO), at most
 *   `limits.maxFileBytes`, and, inside the workspace (`cwd`), no symbolic link out of it or into .git.
 *   Line length, metrics and samples are checked while parsing, the run's totals after each file.
 * - A file matched by two patterns with the same prefix is read once.
 * - Backslashes are path separators, as a Windows runner writes paths: `out\bench\*.json` is
 *   `out/bench/*.json` (a literal `*` in a file name is matched by `[*]`).
 * - A `prefixes` pattern is matched against each file found, not the metrics text: so
 *   `pkgs/{a,b}/bench.json` with `--prefix pkgs/a/*=pkg-a` prefixes only package a's metrics.
 * @throws InputError for no match, a limit passed (naming `limits.max-file-bytes` etc.), a refused
 *   file, a file that is not UTF-8 text, a file two `prefixes` patterns with different prefixes match, a
 *   `prefixes` pattern that matches none of the files, or any problem in a file.
 * @example await readMetricFiles(['bench/*.txt'], { limits: DEFAULT_LIMITS, aggregateFor: () => 'median' })
 */
export async function readMetricFiles(patterns: string[], options: ReadFilesOptions): Promise<Run> {
  const limits = { ...DEFAULT_LIMITS, ...options.limits };
  const cwd = path.resolve(options.cwd ?? process.cwd());
  if (patterns.length === 0) {
    throw new InputError('no metric files given', { fix: 'name at least one metric file or glob' });
  }
  const done = new Set<string>();
  const results: ReadResult[] = [];
  const prefixFor = await filePrefixes(options.prefixes, cwd);
  let samples = 0;
  for (const text of patterns) {
    const { pattern, prefix: arrowPrefix } = splitPattern(text);
    for (const file of await expand(pattern, cwd)) {
      const prefix = arrowPrefix ?? prefixFor.of(file);
      const key = `${prefix ?? ''}\u0000${file}`;
      if (done.has(key)) continue;
      done.add(key);
      const shown = path.relative(cwd, file).startsWith('..') ? file : path.relative(cwd, file);
      const result = await readOne(file, shown, options.format, limits, cwd);
      samples += result.readings.length;
      if (samples > limits.maxSamples) {
        const what = `the metric files hold more than ${limits.maxSamples} samples`;
        throw limitError('maxSamples', limits.maxSamples, shown, what);
      }
      results.push(prefix === undefined ? result : withPrefix(result, prefix));
    }
  }
  prefixFor.checkAllUsed();
  const run = collectRun(results, options.aggregateFor);
  if (run.metrics.size > limits.maxMetrics) {
    throw limitError(
      'maxMetrics',
      limits.maxMetrics,
      patterns.join(', '),
      `the metric files hold ${run.metrics.size} metrics`,
    );
  }
  return run;
}

/** A path or glob with Windows separators written as `/`, the only separator globs know. */
export function slashes(pattern: string): string {
  return pattern.replace(/\\/g, '/');
}

/** A file's path relative to cwd with `/` separators, as `prefixes` patterns see it. */
function relativeWithSlashes(cwd: string, file: string): string {
  return slashes(path.relative(cwd, file));
}

/**
 * The prefix each file gets from `--prefix PATTERN=PREFIX` pairs, by matching every pattern
 * against the file's own path (picomatch loads only when there are pairs).
 */
async function filePrefixes(
  pairs: Map<string, string> | undefined,
  cwd: string,
): Promise<{ of(file: string): string | undefined; checkAllUsed(): void }> {
  if (pairs === undefined || pairs.size === 0) return { of: () => undefined, checkAllUsed: () => undefined };
  const { default: picomatch } = await import('picomatch');
  const rules = [...pairs].map(([pattern, prefix]) => {
    const glob = slashes(pattern).replace(/^\.\//, '');
    return {
      pattern,
      prefix: normalizePrefix(prefix, `--prefix ${pattern}=${prefix}`),
      matches: picomatch(glob, { dot: true }),
      literal: path.resolve(cwd, slashes(pattern)),
      used: false,
    };
  });
  const seen: string[] = [];
  return {
    of(file) {
      const relative = relativeWithSlashes(cwd, file);
      seen.push(relative);
      const hits = rules.filter((r) => r.literal === file || r.matches(relative));
      for (const r of hits) r.used = true;
      const distinct = new Set(hits.map((r) => r.prefix));
      if (distinct.size > 1) {
        throw new InputError(
          `${relative} is matched by --prefix patterns with different prefixes: ${hits.map((r) => `${r.pattern}=${r.prefix}`).join(', ')}`,
          { where: '--prefix', fix: 'make the patterns match different files' },
        );
      }
      return hits[0]?.prefix;
    },
    checkAllUsed() {
      const unused = rules.filter((r) => !r.used);
      if (unused.length === 0) return;
      const shown = seen.slice(0, 5).join(', ') + (seen.length > 5 ? ', ...' : '');
      throw new InputError(
        `--prefix ${unused.map((r) => JSON.stringify(r.pattern)).join(', ')} matches none of the metric files found (${shown})`,
        {
          where: '--prefix',
          fix: 'write PATTERN as a path or glob of the files themselves, relative to the working directory (e.g. "pkgs/a/*.json=pkg-a")',
        },
      );
    },
  };
}

async function expand(given: string, cwd: string): Promise<string[]> {
  // A file whose name holds a backslash is taken as it is; otherwise a backslash separates.
  const pattern = existsSync(path.resolve(cwd, given)) ? given : slashes(given);
  const literal = path.resolve(cwd, pattern);
  const info = await stat(literal).catch(() => undefined);
  if (info?.isDirectory()) {
    throw new InputError(`${pattern} is a directory`, {
      fix: `name files in it, such as ${path.join(pattern, '*.json')}`,
    });
  }
  // Anything else that exists is taken literally; readUserFile refuses what is not a regular file.
  if (info) return [literal];
  const files = await glob([pattern], { cwd, absolute: true, onlyFiles: true, dot: true, expandDirectories: false });
  if (files.length === 0) {
    throw new InputError(`no metric file matches ${JSON.stringify(pattern)} (looked in ${cwd})`, {
      fix: 'check the path (relative to the working directory) and that the step writing the metrics ran',
    });
  }
  return files.sort();
}

async function readOne(
  file: string,
  shown: string,
  format: string | undefined,
  limits: InputLimits,
  cwd: string,
): Promise<ReadResult> {
  const text = await readUserFile(file, {
    cwd,
    what: 'metric file',
    shown,
    maxBytes: limits.maxFileBytes,
    tooLarge: (bytes) => limitError('maxFileBytes', limits.maxFileBytes, shown, `the file is ${bytes} bytes`),
    confined: true,
  });
  if (text === undefined) {
    throw new InputError(`metric file ${shown} disappeared while it was being read`, { where: shown });
  }
  return await parseMetricText(text, shown, format, limits);
}

function withPrefix(result: ReadResult, prefix: string): ReadResult {
  return {
    readings: result.readings.map((r) => ({ ...r, name: prefixed(prefix, r.name, r.where) })),
    notFitted: new Map([...result.notFitted].map(([name, reason]) => [prefixed(prefix, name), reason])),
    meta: result.meta,
  };
}
