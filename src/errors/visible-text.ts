/**
 * Text quoted from untrusted input (metric names, file content) inside a message printed to a
 * terminal or a log: every character that could move the cursor, ring, recolour or reorder the
 * line (C0 controls but tab and line feed, DEL, C1 controls, the bidi marks, embeddings, overrides
 * and isolates of "Trojan Source", CVE-2021-42574, and the Unicode line separators) is shown as
 * its code point, \u{XXXX}. Pure; never throws.
 * @example visibleText('a\u202Eb') // 'a\\u{202E}b'
 */
export function visibleText(text: string): string {
  return text.replace(INVISIBLE, (c) => `\\u{${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}}`);
}

const INVISIBLE = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u061C\u200E\u200F\u2028\u2029\u202A-\u202E\u2066-\u2069]/g;
