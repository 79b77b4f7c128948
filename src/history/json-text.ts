import { InputError } from '../errors/input-error.js';

/**
 * Parses JSON text, turning a syntax error into an InputError that points at "source:line:col".
 * V8 states the offset for most errors ("... in JSON at position 17"); for an unexpected token it
 * quotes about ten characters either side instead, so the quote is searched for in the text.
 * A leading byte-order mark is ignored.
 * Throws InputError (where = "source:line:col") on malformed JSON.
 *
 * @example parseJsonText('{"a": 1}', 'h.json') // { a: 1 }
 */
export function parseJsonText(text: string, source: string): unknown {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  try {
    return JSON.parse(body);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = syntaxErrorOffset(body, message);
    const { line, column } = lineColumn(body, offset);
    throw new InputError(`not valid JSON (${message.replace(/, ".*" is not valid JSON$/s, '')})`, {
      where: `${source}:${line}:${column}`,
      fix:
        body.trim() === ''
          ? 'the file is empty; remove it or write a complete document'
          : 'repair the JSON at that spot (a truncated or hand-edited file?)',
      cause: error,
    });
  }
}

/** Best estimate of where V8's JSON parser stopped, as an offset into `text`. */
export function syntaxErrorOffset(text: string, message: string): number {
  const stated = /at position (\d+)/.exec(message);
  if (stated) return Number(stated[1]);
  if (/end of JSON input/.test(message)) return text.length;
  // 'Unexpected token 'x', ..."context"... is not valid JSON': the token sits ten characters
  // into the quote when the quote is cut on the left, else at its first place in the quote.
  const quoted = /^Unexpected token '(.)', (\.\.\.)?"(.*?)"(\.\.\.)? is not valid JSON$/s.exec(message);
  if (quoted) {
    const [, token = '', cutLeft, context = ''] = quoted;
    const at = text.indexOf(context);
    if (at >= 0) return at + (cutLeft ? 10 : Math.max(0, context.indexOf(token)));
  }
  return 0;
}

/** 1-based line and column of an offset (UTF-16 units; columns count characters of that line). */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  const end = Math.min(Math.max(offset, 0), text.length);
  let line = 1;
  let lineStart = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
    line += 1;
    lineStart = i + 1;
  }
  return { line, column: end - lineStart + 1 };
}
