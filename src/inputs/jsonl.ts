import type { InputLimits } from '../config/types.js';
import { readEntry } from './json-entry.js';
import { parseJsonText } from '../errors/json-text.js';
import { checkLineLengths, DEFAULT_LIMITS, eachLine } from './limits.js';
import { ReadingSink } from './reading-sink.js';
import type { ReadResult } from './run.js';

/**
 * Reads JSON Lines: one `{"name", "value", "unit"?}` object per line (a `"samples"` array is also
 * accepted, as in the own JSON form). Blank lines are skipped. A name on several lines is several
 * samples of one metric.
 * @throws InputError naming file:line (and column, where the JSON engine gives one) for a line that
 *   is not JSON or not a valid entry.
 * @example readJsonLines('{"name":"a","value":1}\n', 'm.jsonl').readings[0] // { name: 'a', value: 1, where: 'm.jsonl:1' }
 */
export function readJsonLines(text: string, file: string, limits: InputLimits = DEFAULT_LIMITS): ReadResult {
  checkLineLengths(text, file, limits);
  const sink = new ReadingSink(file, limits);
  eachLine(text, (line, number) => {
    if (line.trim() === '') return;
    const place = `${file}:${number}`;
    const entry = parseJsonText(line, file, number);
    readEntry(entry, sink, place, () => place);
  });
  return sink.result;
}
