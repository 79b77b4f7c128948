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
    const offset = at ? Number(at[1]) : locateJsonError(text);
    let where = file;
    if (offset !== undefined) {
      where = whereAt(file, text, offset);
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

/**
 * Offset of the first character that makes `text` invalid JSON, for the engine messages that give
 * none (Node 20: "Unexpected token 'N', ... is not valid JSON" for a NaN). Bisection on prefixes:
 * a prefix either could still grow into valid JSON (it fails only at its end) or already holds the
 * error, and once a prefix holds it every longer one does. O(n log n), on the error path only.
 */
export function locateJsonError(text: string): number | undefined {
  const broken = (length: number): boolean => {
    try {
      JSON.parse(text.slice(0, length));
      return false;
    } catch (error) {
      const message = error instanceof Error ? error.message : '';
      if (/end of JSON input/.test(message)) return false;
      const at = /at position (\d+)/.exec(message);
      return !(at && Number(at[1]) >= length);
    }
  };
  if (!broken(text.length)) return undefined;
  let low = 0; // not broken
  let high = text.length; // broken
  while (high - low > 1) {
    const mid = (low + high) >>> 1;
    if (broken(mid)) high = mid;
    else low = mid;
  }
  return high - 1;
}

function shiftLine(where: string, lineOffset: number): string {
  return where.replace(/:(\d+):(\d+)$/, (_m, line: string, col: string) => `:${Number(line) + lineOffset}:${col}`);
}
