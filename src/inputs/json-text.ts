import { parseDocument } from 'yaml';
import { InputError } from '../model/input-error.js';
import { whereAt } from './position.js';

/**
 * JSON.parse with errors a user can act on: the message names the file and, where the engine tells
 * the offset ("... at position 12"), the line and column. `line` is given when the text is one
 * line of a larger file (JSON Lines).
 * @throws InputError for malformed JSON.
 * @example parseJsonText('{"a": 1}', 'm.json') // { a: 1 }
 */
export function parseJsonText(text: string, file: string, line?: number): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const at = /at position (\d+)/.exec(message);
    let where = file;
    if (at) {
      where = whereAt(file, text, Number(at[1]));
      if (line !== undefined) where = shiftLine(where, line - 1);
    } else if (line !== undefined) {
      where = `${file}:${line}`;
    }
    throw new InputError(`malformed JSON: ${message.replace(/ in JSON at position \d+.*$/, '')}`, {
      where,
      fix: 'check the file with a JSON validator; the metric file must be one JSON document',
      cause: error,
    });
  }
}

/**
 * "file:line:col" of the value at a path inside JSON text, found only when an error needs it (a
 * second, position-keeping parse through the YAML parser, of which JSON is a subset). Falls back
 * to "file (path)" when the position cannot be found.
 */
export function whereInJson(text: string, file: string, path: (string | number)[]): string {
  const label = path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${p}`)).join('');
  try {
    const doc = parseDocument(text, { uniqueKeys: false, strict: false });
    const node = doc.getIn(path, true) as { range?: [number, number, number] } | undefined;
    if (node?.range) return `${whereAt(file, text, node.range[0])} (${label.replace(/^\./, '')})`;
  } catch {
    // The position is a courtesy; the message still names the path.
  }
  return `${file} (${label.replace(/^\./, '')})`;
}

function shiftLine(where: string, lineOffset: number): string {
  return where.replace(/:(\d+):(\d+)$/, (_m, line: string, col: string) => `:${Number(line) + lineOffset}:${col}`);
}
