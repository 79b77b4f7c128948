import type { InputLimits } from '../config/types.js';
import { readCsvMetrics } from './csv.js';
import type { MetricFormat } from './formats.js';
import { readGoBench } from './gobench.js';
import { readJsonMetrics } from './json.js';
import { readJsonLines } from './jsonl.js';
import { readJunit } from './junit.js';
import { DEFAULT_LIMITS } from './limits.js';
import { readOpenMetrics } from './openmetrics.js';
import { chooseFormat, runReader, type Reader } from './parse-core.js';
import type { ReadResult } from './run.js';

const READERS: Record<MetricFormat, Reader> = {
  json: readJsonMetrics,
  jsonl: readJsonLines,
  csv: readCsvMetrics,
  openmetrics: readOpenMetrics,
  gobench: readGoBench,
  junit: readJunit,
};

/**
 * Reads one metric file's text in the given format, or in the format detected from its content
 * (detect.ts). A leading byte-order mark is dropped. A file that yields no metric at all is refused:
 * it is almost always a step that failed to write it. (parse-lazy.ts is the same, loading only the
 * reader it needs; the CLI and the action use that one.)
 * @throws InputError for an unknown format name, an undetectable format, a limit passed, or any
 *   problem the reader finds; never anything else.
 * @example parseMetricText('{"a": 1}', 'm.json').readings.length // 1
 */
export function parseMetricText(
  text: string,
  file: string,
  format?: string,
  limits: InputLimits = DEFAULT_LIMITS,
): ReadResult {
  const { body, chosen } = chooseFormat(text, file, format);
  return runReader(READERS[chosen], chosen, body, file, limits);
}
