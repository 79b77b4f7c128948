import type { InputLimits } from '../config/types.js';
import type { MetricFormat } from './formats.js';
import { DEFAULT_LIMITS } from './limits.js';
import { chooseFormat, runReader, type Reader } from './parse-core.js';
import type { ReadResult } from './run.js';

// Each reader (and its parser library: csv-parse, fast-xml-parser) loads only when a file of that
// format turns up, which keeps them out of the start-up of a run that reads plain JSON.
const LOADERS: Record<MetricFormat, () => Promise<Reader>> = {
  json: async () => (await import('./json.js')).readJsonMetrics,
  jsonl: async () => (await import('./jsonl.js')).readJsonLines,
  csv: async () => (await import('./csv.js')).readCsvMetrics,
  openmetrics: async () => (await import('./openmetrics.js')).readOpenMetrics,
  gobench: async () => (await import('./gobench.js')).readGoBench,
  junit: async () => (await import('./junit.js')).readJunit,
};

/**
 * parseMetricText (parse.ts), loading only the reader the format needs.
 * @throws InputError as parseMetricText.
 * @example (await parseMetricTextLazily('{"a": 1}', 'm.json')).readings.length // 1
 */
export async function parseMetricTextLazily(
  text: string,
  file: string,
  format?: string,
  limits: InputLimits = DEFAULT_LIMITS,
): Promise<ReadResult> {
  const { body, chosen } = chooseFormat(text, file, format);
  return runReader(await LOADERS[chosen](), chosen, body, file, limits);
}
