import { readMetricFiles } from '../inputs/read-files.js';
import { settingsFor } from '../config/rules.js';
import type { Config } from '../config/types.js';
import type { Run } from '../inputs/run.js';
import { InputError } from '../errors/input-error.js';
import type { CommandContext } from './context.js';

/** The metric-file flags shared by check, record, explain and report. */
export interface MetricFileOptions {
  metrics: string[];
  inputFormat?: string;
  prefix?: string[];
}

/**
 * Reads this run's metric files (globs allowed) into one Run, aggregating repeated samples of a
 * metric by the aggregate its config rule names. `--input-format` beats the config's `input-format`.
 * @throws InputError for unreadable or malformed files, a pattern matching nothing, or a bad --prefix.
 */
export async function loadRun(ctx: CommandContext, config: Config, options: MetricFileOptions): Promise<Run> {
  const format = options.inputFormat ?? config.inputFormat;
  return readMetricFiles(options.metrics, {
    ...(format === undefined ? {} : { format }),
    limits: config.limits,
    aggregateFor: (name) => settingsFor(config, name).aggregate,
    prefixes: parsePrefixes(options.prefix ?? []),
    cwd: ctx.io.cwd,
  });
}

/**
 * `--prefix PATTERN=PREFIX` pairs into the map readMetricFiles takes: the metrics read from each
 * file found whose own path PATTERN matches get `PREFIX/` in front of their names. Split at the last '=' (globs rarely
 * hold one; prefixes never should).
 * @example parsePrefixes(['bench/*.json=api']) // Map { 'bench/*.json' => 'api' }
 * @throws InputError when a value has no '=' or an empty side.
 */
export function parsePrefixes(values: string[]): Map<string, string> {
  const prefixes = new Map<string, string>();
  for (const value of values) {
    const at = value.lastIndexOf('=');
    const pattern = at > 0 ? value.slice(0, at) : '';
    const prefix = at > 0 ? value.slice(at + 1) : '';
    if (pattern === '' || prefix === '') {
      throw new InputError(`--prefix "${value}" is not PATTERN=PREFIX`, {
        where: '--prefix',
        fix: 'write it as --prefix "bench/*.json=api" (the files the pattern matches get "api/" before each metric name)',
      });
    }
    prefixes.set(pattern, prefix);
  }
  return prefixes;
}
