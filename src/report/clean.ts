/**
 * Text from metric files (names, units) is untrusted: it may carry terminal escape sequences,
 * bidirectional overrides that make a name read differently from what it is (the "Trojan Source"
 * trick, CVE-2021-42574), line breaks that split a table row, or be 10 KB long. `cleanText` removes
 * all of that before any renderer adds its own escaping on top.
 */

/** Default cap on shown names: long enough for real paths, short enough for a table row. */
export const MAX_SHOWN_LENGTH = 200;

// C0 and C1 controls (ESC starts terminal sequences), DEL, bidi embeddings/overrides U+202A-202E,
// isolates U+2066-2069, and the implicit marks U+200E/U+200F/U+061C that can also reorder text.
const UNSAFE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/g;
const LINE_BREAKS = /[\t\n\r\u2028\u2029\u0085]+/g;

/**
 * Strip control and bidi-override characters, turn line breaks and tabs into single spaces and cap
 * the length at `max` code points with an ellipsis. Never throws.
 * @example cleanText('a\u202Eb\nc') // 'ab c'
 * @example cleanText('x'.repeat(300)).length // 200
 */
export function cleanText(s: string, max: number = MAX_SHOWN_LENGTH): string {
  const flat = String(s).replace(LINE_BREAKS, ' ').replace(UNSAFE, '');
  if (flat.length <= max) return flat; // UTF-16 length bounds the code-point count
  const points = Array.from(flat);
  if (points.length <= max) return flat;
  return points.slice(0, Math.max(0, max - 1)).join('') + '…';
}
