/**
 * 1-based line and column of a UTF-16 offset in a text, as editors count them (a "\r\n" ends one line).
 * O(offset).
 * @example lineColumnAt('{\n  "a": x}', 9) // { line: 2, column: 8 }
 */
export function lineColumnAt(text: string, offset: number): { line: number; column: number } {
  const end = Math.max(0, Math.min(offset, text.length));
  let line = 1;
  let lineStart = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) {
    line++;
    lineStart = i + 1;
  }
  return { line, column: end - lineStart + 1 };
}

/** "file:line:col" for an offset. */
export function whereAt(file: string, text: string, offset: number): string {
  const { line, column } = lineColumnAt(text, offset);
  return `${file}:${line}:${column}`;
}
