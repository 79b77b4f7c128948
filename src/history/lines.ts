/**
 * The lines of a history document, read from the start or from the end. A document is JSON
 * Lines: every line a writer finished ends with "\n", so a last line without one is where a
 * writer was interrupted (see document.ts for what is done with it). Two sources implement it:
 * a string (textLines, here) and a file read in blocks (file-lines.ts).
 */

/** One line: its text without the newline, where it starts, and whether a newline ended it. */
export interface RawLine {
  text: string;
  /** Offset of the line's first character (string) or byte (file). */
  offset: number;
  complete: boolean;
  /** Its 1-based line number, when the source knows it without counting (reading forward). */
  number?: number;
}

export interface LineSource {
  /** Every line from the first (the header) on, in order. */
  forward(): Iterable<RawLine>;
  /** The lines that start at `stop` or later, the last line first. */
  backward(stop: number): Iterable<RawLine>;
  /** The 1-based line number of the line that starts at `offset` (messages only). */
  lineNumber(offset: number): number;
}

/**
 * The lines of a document held as a string. A leading byte-order mark is skipped.
 *
 * @example [...textLines('a\nb\n').forward()].map((l) => l.text) // ['a', 'b']
 */
export function textLines(text: string): LineSource {
  const start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const line = (from: number, to: number): RawLine => ({
    text: text.slice(from, to),
    offset: from,
    complete: to < text.length,
  });
  return {
    *forward() {
      let from = start;
      for (let number = 1; from < text.length; number++) {
        const nl = text.indexOf('\n', from);
        const to = nl < 0 ? text.length : nl;
        yield { ...line(from, to), number };
        from = to + 1;
      }
    },
    *backward(stop) {
      const floor = Math.max(stop, start);
      if (floor >= text.length) return;
      // The exclusive end of the last line: a complete last line's newline is the final character.
      let end = text.endsWith('\n') ? text.length - 1 : text.length;
      for (;;) {
        const nl = end > floor ? text.lastIndexOf('\n', end - 1) : -1;
        const from = nl < floor ? floor : nl + 1;
        yield line(from, end);
        if (from === floor) return;
        end = from - 1;
      }
    },
    lineNumber(offset) {
      let n = 1;
      for (let i = text.indexOf('\n', start); i >= 0 && i < offset; i = text.indexOf('\n', i + 1)) n += 1;
      return n;
    },
  };
}
