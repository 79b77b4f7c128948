import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { detectFormat } from './detect.js';
import { metricFormat, type MetricFormat } from './formats.js';
import { readGoBench } from './gobench.js';
import { readJsonMetrics } from './json.js';
import { readJsonLines } from './jsonl.js';
import { DEFAULT_LIMITS } from './limits.js';
import { readOpenMetrics } from './openmetrics.js';
import type { ReadResult } from './run.js';

/** One format's reader. */
type Reader = (text: string, file: string, limits: InputLimits) => ReadResult;

/**
 * The readers by format. CSV and JUnit XML load their parser libraries (csv-parse, fast-xml-parser:
 * about a tenth of the action's bundle) only when a run has such a file, which most runs do not.
 */
const READERS: Record<MetricFormat, () => Promise<Reader>> = {
  json: async () => readJsonMetrics,
  jsonl: async () => readJsonLines,
  csv: async () => (await import('./csv.js')).readCsvMetrics,
  openmetrics: async () => readOpenMetrics,
  gobench: async () => readGoBench,
  junit: async () => (await import('./junit.js')).readJunit,
};

/**
 * Reads one metric file's text in the given format, or in the format detected from its content
 * (detect.ts). A leading byte-order mark is dropped. A file that yields no metric at all is refused:
 * it is almost always a step that failed to write it.
 * @throws InputError for an unknown format name, an undetectable format, a limit passed, or any
 *   problem the reader finds; never anything else.
 * @example (await parseMetricText('{"a": 1}', 'm.json')).readings.length // 1
 */
export async function parseMetricText(
  text: string,
  file: string,
  format?: string,
  limits: InputLimits = DEFAULT_LIMITS,
): Promise<ReadResult> {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const chosen = format === undefined || format === '' ? detectFormat(body, file) : metricFormat(format);
  const read = await READERS[chosen]();
  let result: ReadResult;
  try {
    result = read(body, file, limits);
  } catch (error) {
    if (error instanceof InputError) throw error;
    // A library failing in a way it does not document must still reach the user as bad input.
    throw new InputError(
      `cannot read the file as ${chosen}: ${error instanceof Error ? error.message : String(error)}`,
      { where: file, fix: 'check the file, or choose another format with --input-format', cause: error },
    );
  }
  if (result.readings.length === 0 && result.notFitted.size === 0) {
    throw new InputError(`no metrics found in the file (read as ${chosen})`, {
      where: file,
      fix: 'check the step that writes this file, or choose another format with --input-format',
    });
  }
  return result;
}
