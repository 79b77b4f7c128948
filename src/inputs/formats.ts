import { InputError } from '../errors/input-error.js';

/** The metric file formats Bellgate reads; the names `--input-format` and `input-format` accept. */
export const METRIC_FORMATS = ['json', 'jsonl', 'csv', 'openmetrics', 'gobench', 'junit'] as const;
export type MetricFormat = (typeof METRIC_FORMATS)[number];

// Other spellings users are likely to type.
const ALIASES = new Map<string, MetricFormat>([
  ['ndjson', 'jsonl'],
  ['json-lines', 'jsonl'],
  ['prometheus', 'openmetrics'],
  ['go', 'gobench'],
  ['xml', 'junit'],
]);

/**
 * The canonical format for a name given by a user (case-insensitive; a few aliases such as
 * `prometheus` and `ndjson`).
 * @throws InputError listing the accepted names.
 * @example metricFormat('Prometheus') // 'openmetrics'
 */
export function metricFormat(name: string): MetricFormat {
  const key = name.trim().toLowerCase();
  const found = (METRIC_FORMATS as readonly string[]).includes(key) ? (key as MetricFormat) : ALIASES.get(key);
  if (found) return found;
  throw new InputError(`unknown input format ${JSON.stringify(name)}`, {
    fix: `use one of ${METRIC_FORMATS.join(', ')}`,
  });
}
