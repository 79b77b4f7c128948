import { whereAt } from '../errors/json-text.js';

/**
 * "file:line:col" of the value at a path inside JSON text, found only when an error needs it.
 * Falls back to "file (path)" when the path is not in the text.
 * @example whereInJson('{\n  "a": [1, "x"]\n}', 'm.json', ['a', 1]) // 'm.json:2:12 (a[1])'
 */
export function whereInJson(text: string, file: string, path: (string | number)[]): string {
  const label = path
    .map((p) => (typeof p === 'number' ? `[${p}]` : `.${p}`))
    .join('')
    .replace(/^\./, '');
  const offset = jsonValueOffset(text, path);
  return offset === undefined ? `${file} (${label})` : `${whereAt(file, text, offset)} (${label})`;
}

// JSON's own whitespace (RFC 8259, section 2): space, tab, line feed, carriage return.
const SPACE = new Set([0x20, 0x09, 0x0a, 0x0d]);

/**
 * Offset of the value at `path` (object keys and array indices) in text that JSON.parse has
 * accepted, or undefined when the path is not there. One pass over the text that steps over the
 * values it does not enter; of a key written twice, the last (the one JSON.parse keeps). JSON.parse
 * keeps no positions; a second, full parse by a library that does would cost a large file far
 * more time and memory than this linear scan.
 * @example jsonValueOffset('{"a": [1, 2]}', ['a', 1]) // 10
 */
export function jsonValueOffset(text: string, path: readonly (string | number)[]): number | undefined {
  let at = skipSpace(text, 0);
  for (const step of path) {
    const open = text.charCodeAt(at);
    let found: number | undefined;
    if (open === 0x7b && typeof step === 'string') {
      at = skipSpace(text, at + 1);
      while (text.charCodeAt(at) === 0x22) {
        const keyEnd = skipString(text, at);
        const valueAt = skipSpace(text, skipSpace(text, keyEnd) + 1); // past the ':'
        if (JSON.parse(text.slice(at, keyEnd)) === step) found = valueAt;
        at = skipSpace(text, skipValue(text, valueAt));
        if (text.charCodeAt(at) === 0x2c) at = skipSpace(text, at + 1);
      }
    } else if (open === 0x5b && typeof step === 'number' && Number.isInteger(step) && step >= 0) {
      at = skipSpace(text, at + 1);
      for (let index = 0; text.charCodeAt(at) !== 0x5d && at < text.length; index++) {
        if (index === step) {
          found = at;
          break;
        }
        at = skipSpace(text, skipValue(text, at));
        if (text.charCodeAt(at) === 0x2c) at = skipSpace(text, at + 1);
      }
    }
    if (found === undefined) return undefined;
    at = found;
  }
  return at;
}

function skipSpace(text: string, at: number): number {
  while (SPACE.has(text.charCodeAt(at))) at++;
  return at;
}

/** From an opening quote to just after the closing one ('\' escapes the next character). */
function skipString(text: string, at: number): number {
  for (let i = at + 1; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x5c) i++;
    else if (c === 0x22) return i + 1;
  }
  return text.length;
}

/** From the first character of a value to just after it. */
function skipValue(text: string, at: number): number {
  const first = text.charCodeAt(at);
  if (first === 0x22) return skipString(text, at);
  if (first !== 0x7b && first !== 0x5b) {
    let i = at; // a number, true, false or null: up to the next delimiter
    while (i < text.length && !SPACE.has(text.charCodeAt(i)) && !',]}'.includes(text[i]!)) i++;
    return i;
  }
  let depth = 0;
  for (let i = at; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22) i = skipString(text, i) - 1;
    else if (c === 0x7b || c === 0x5b) depth++;
    else if ((c === 0x7d || c === 0x5d) && --depth === 0) return i + 1;
  }
  return text.length;
}
