import type { InputLimits } from '../config/types.js';
import { InputError } from '../errors/input-error.js';
import { isRecord, readEntry, readNumbers, describeJson } from './json-entry.js';
import { parseJsonText } from '../errors/json-text.js';
import { whereInJson } from './json-where.js';
import { DEFAULT_LIMITS } from './limits.js';
import { ReadingSink } from './reading-sink.js';
import type { ReadResult } from './run.js';

/**
 * Reads Bellgate's own metric file (README "Metric files"), in either form:
 * - list form `{"metrics": [{"name", "value", "unit"?} | {"name", "samples": [...], "unit"?}]}`;
 *   a name may appear once per file (repeat measurements go in `samples`);
 * - flat form `{"name": 412.5, "other": [1, 2]}` (a number, or an array of samples; no units).
 * An object whose "metrics" key holds an array is the list form; anything else is the flat form.
 * @throws InputError with file:line:col for malformed JSON, non-numbers, non-finite values, empty
 *   names, duplicate names, and entries without a value.
 * @example readJsonMetrics('{"a": 1}', 'm.json').readings // [{ name: 'a', value: 1, where: 'm.json (a)' }]
 */
export function readJsonMetrics(text: string, file: string, limits: InputLimits = DEFAULT_LIMITS): ReadResult {
  const doc = parseJsonText(text, file);
  if (!isRecord(doc)) {
    throw new InputError(`the metric file must hold a JSON object, found ${describeJson(doc)}`, {
      where: file,
      fix: 'write {"metrics": [{"name": "...", "value": 1}]} or {"name": 1}',
    });
  }
  const sink = new ReadingSink(file, limits);
  if (Array.isArray(doc.metrics)) readListForm(doc.metrics, text, file, sink);
  else readFlatForm(doc, text, file, sink);
  return sink.result;
}

function readListForm(entries: unknown[], text: string, file: string, sink: ReadingSink): void {
  const seen = new Map<string, number>();
  entries.forEach((entry, i) => {
    const where = (): string => whereInJson(text, file, ['metrics', i]);
    const name = readEntry(entry, sink, `${file} (metrics[${i}])`, where);
    const first = seen.get(name);
    if (first !== undefined) {
      throw new InputError(`metric ${JSON.stringify(name)} appears twice (metrics[${first}] and metrics[${i}])`, {
        where: where(),
        fix: 'give repeated measurements of one metric as "samples": [...] in a single entry',
      });
    }
    seen.set(name, i);
  });
}

function readFlatForm(doc: Record<string, unknown>, text: string, file: string, sink: ReadingSink): void {
  const keys = Object.keys(doc);
  for (const name of keys) {
    const value = doc[name];
    const where = (): string => whereInJson(text, file, [name]);
    const values = Array.isArray(value) ? value : [value];
    if (values.length === 0) {
      throw new InputError(`metric ${JSON.stringify(name)} has an empty array of samples`, {
        where: where(),
        fix: 'give at least one number, or leave the metric out',
      });
    }
    readNumbers(name, values, undefined, sink, `${file} (${name})`, where);
  }
  const duplicate = findDuplicateKey(text, keys.length);
  if (duplicate !== undefined) {
    throw new InputError(`metric ${JSON.stringify(duplicate)} appears twice; JSON keeps only the last value`, {
      where: file,
      fix: 'give repeated measurements as an array of samples under one key',
    });
  }
}

/**
 * JSON.parse silently keeps the last of two equal keys, which would lose a measurement. Once the
 * flat form is known to hold only numbers and arrays of numbers, every string literal in the text
 * is a key, so counting them finds duplicates in one pass.
 */
function findDuplicateKey(text: string, distinct: number): string | undefined {
  const literal = /"(?:[^"\\]|\\.)*"/g;
  const seen = new Set<string>();
  let count = 0;
  let duplicate: string | undefined;
  for (let m = literal.exec(text); m; m = literal.exec(text)) {
    const key = JSON.parse(m[0]) as string;
    count++;
    if (seen.has(key)) duplicate ??= key;
    seen.add(key);
  }
  return count > distinct ? duplicate : undefined;
}
