import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { checkLineLengths, DEFAULT_LIMITS, eachLine } from './limits.js';
import { parseDecimal, truncate } from './numbers.js';
import { foldLabels } from './openmetrics-labels.js';
import { parseSampleLine } from './openmetrics-line.js';
import { ReadingSink } from './reading-sink.js';
import type { ReadResult } from './run.js';

// Sample-name suffixes of each family type (OpenMetrics 1.0, "Metric types").
const SUFFIXES = ['_total', '_created', '_bucket', '_count', '_sum', '_gcount', '_gsum', '_info'];
// Suffixes whose values are counts, not amounts in the family's unit.
const COUNT_SUFFIXES = new Set(['_bucket', '_count', '_gcount']);
const STATE_TYPES = new Set(['info', 'stateset']);
const NON_FINITE = /^[+-]?(?:inf|infinity|nan)$/i;

/**
 * Reads the OpenMetrics text format and the Prometheus text exposition format.
 * - `# TYPE`, `# UNIT`, `# HELP` are honoured (HELP is only checked); other comments are skipped.
 * - gauge, counter and untyped/unknown samples are read as they are; histogram and summary
 *   families as their series: `_bucket{le=...}`, `{quantile=...}`, `_sum`, `_count` (gauge
 *   histograms: `_gsum`, `_gcount`). Labels fold into the name (openmetrics-labels.ts).
 * - The family's UNIT is given to amounts (gauge, counter, `_sum`, quantiles), not to counts
 *   (`_bucket`, `_count`).
 * - `_created` samples (creation timestamps) are skipped; info and stateset samples, and samples
 *   whose value is NaN or infinite, go to `notFitted` with the reason.
 * - Timestamps and exemplars are ignored; `# EOF` ends the input, and only blank lines may follow.
 * @throws InputError naming file:line for a line that is neither a comment nor a valid sample.
 * @example readOpenMetrics('# TYPE q gauge\nq{b="2",a="1"} 3\n# EOF\n', 'm.prom').readings[0].name // 'q/a=1,b=2'
 */
export function readOpenMetrics(text: string, file: string, limits: InputLimits = DEFAULT_LIMITS): ReadResult {
  checkLineLengths(text, file, limits);
  const sink = new ReadingSink(file, limits);
  const types = new Map<string, string>();
  const units = new Map<string, string>();
  let ended = false;
  eachLine(text, (raw, number) => {
    const line = raw.replace(/\r$/, '');
    const where = `${file}:${number}`;
    if (line.trim() === '') return;
    if (ended) {
      throw new InputError('text after "# EOF"', { where, fix: 'end the exposition with "# EOF" as its last line' });
    }
    if (line.startsWith('#')) {
      ended = readComment(line, where, types, units);
      return;
    }
    const sample = parseSampleLine(line, where);
    const family = familyOf(sample.name, types);
    const type = types.get(family.name) ?? 'unknown';
    if (family.suffix === '_created') return;
    const name = foldLabels(sample.name, sample.labels);
    if (STATE_TYPES.has(type)) {
      sink.skip(name, `${type} metric: a state, not a measurement`, where);
      return;
    }
    if (NON_FINITE.test(sample.value)) {
      sink.skip(name, `value is ${sample.value} at ${where}`, where);
      return;
    }
    const value = parseDecimal(sample.value, where, `value of ${truncate(name)}`);
    const unit = COUNT_SUFFIXES.has(family.suffix) ? undefined : units.get(family.name);
    sink.add(name, value, unit, where);
  });
  return sink.result;
}

/** Reads a `#` line into the type and unit maps; returns true for `# EOF`. */
function readComment(line: string, where: string, types: Map<string, string>, units: Map<string, string>): boolean {
  if (/^#\s*EOF\s*$/.test(line)) return true;
  const m = /^#\s+(TYPE|UNIT|HELP)\s+(\S+)(?:\s+(.*))?$/.exec(line);
  if (!m) return false; // a free comment (Prometheus allows them)
  const [, keyword, family, rest = ''] = m;
  if (keyword === 'TYPE') {
    const type = rest.trim().toLowerCase();
    if (!/^(counter|gauge|histogram|gaugehistogram|summary|info|stateset|unknown|untyped)$/.test(type)) {
      throw new InputError(`unknown metric type ${JSON.stringify(truncate(rest.trim()))} for ${family}`, {
        where,
        fix: 'use one of counter, gauge, histogram, gaugehistogram, summary, info, stateset, unknown',
      });
    }
    types.set(family!, type);
  } else if (keyword === 'UNIT' && rest.trim() !== '') {
    units.set(family!, rest.trim());
  }
  return false;
}

/** The family a sample belongs to: its own name if declared, else its name minus a type suffix. */
function familyOf(name: string, types: Map<string, string>): { name: string; suffix: string } {
  if (types.has(name)) return { name, suffix: '' };
  for (const suffix of SUFFIXES) {
    if (name.endsWith(suffix)) {
      const base = name.slice(0, -suffix.length);
      if (types.has(base)) return { name: base, suffix };
    }
  }
  return { name, suffix: '' };
}
