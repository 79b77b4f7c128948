import { InputError } from './input-error.js';

/**
 * JSON.parse with an error a user can act on: an InputError at "source:line:col" of the first
 * character that makes the text invalid. `line` is given when the text is one line of a larger
 * file (JSON Lines): the position is then on that line of the file. A leading byte-order mark is
 * ignored. The one JSON-text helper of every reader (metric files, history documents).
 * @throws InputError for malformed JSON.
 * @example parseJsonText('{"a": 1}', 'm.json') // { a: 1 }
 * @example parseJsonText('{"a": 1,}', 'm.json') // throws InputError at m.json:1:9
 */
export function parseJsonText(text: string, source: string, line?: number): unknown {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    return JSON.parse(body);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const { line: at, column } = lineColumn(body, jsonErrorOffset(body, message));
    throw new InputError(`malformed JSON: ${message.replace(/ in JSON at position \d+.*$/s, '')}`, {
      where: `${source}:${at + (line ?? 1) - 1}:${column}`,
      fix:
        body.trim() === ''
          ? 'the file is empty; write a complete JSON document'
          : 'repair the JSON at that spot (a truncated or hand-edited file?)',
      cause: error,
    });
  }
}

/**
 * "file:line:col" of a UTF-16 offset in a text, as editors count them (a "\r\n" ends one line).
 * @example whereAt('m.json', '{\n  "a": x}', 9) // 'm.json:2:8'
 */
export function whereAt(file: string, text: string, offset: number): string {
  const { line, column } = lineColumn(text, offset);
  return `${file}:${line}:${column}`;
}

/**
 * Offset of the character where JSON.parse stopped on `text`, from its error message or, when
 * the engine states no position, by search.
 * @example jsonErrorOffset('{"a": 1 x}', 'Unexpected token ... at position 8') // 8
 */
export function jsonErrorOffset(text: string, message: string): number {
  const stated = /at position (\d+)/.exec(message);
  return stated ? Number(stated[1]) : locateJsonError(text);
}

/** 1-based line and column of a UTF-16 offset (columns count characters of that line). */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  const end = Math.max(0, Math.min(offset, text.length));
  let line = 1;
  let lineStart = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
    line++;
    lineStart = i + 1;
  }
  return { line, column: end - lineStart + 1 };
}

/**
 * Offset of the first character that makes `text` invalid JSON, for the engine messages that state
 * none (V8: "Unexpected token 'N', ... is not valid JSON" for a NaN). Bisection on prefixes: a
 * prefix either could still grow into valid JSON (it fails only at its end) or already holds the
 * error, and once a prefix holds it every longer one does. O(n log n), on the error path only.
 */
function locateJsonError(text: string): number {
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
  if (!broken(text.length)) return text.length; // only the end is missing
  let low = 0; // not broken
  let high = text.length; // broken
  while (high - low > 1) {
    const mid = (low + high) >>> 1;
    if (broken(mid)) high = mid;
    else low = mid;
  }
  return high - 1;
}
