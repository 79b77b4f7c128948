/**
 * The lines of a history file read through an open file descriptor in blocks, from the start or
 * from the end, so a check reads the header and the newest lines without reading the rest.
 * Offsets are bytes; a line is decoded as UTF-8 only once it is whole, so a character split across
 * two blocks is never broken. Reads are synchronous: they are few, small and on a local disk.
 */
import { readSync } from 'node:fs';
import type { LineSource, RawLine } from './lines.js';

const FIRST_BLOCK = 64 * 1024;
const LARGEST_BLOCK = 8 * 1024 * 1024;
const NEWLINE = 0x0a;

/** A line longer than this is refused rather than gathered (a hostile file of one endless line). */
export const MAX_LINE_BYTES = 256 * 1024 * 1024;

/** Thrown when a line passes MAX_LINE_BYTES; the store turns it into a StoreError. */
export class LineTooLongError extends Error {
  override name = 'LineTooLongError';
}

function readAt(fd: number, position: number, length: number): Buffer {
  const buffer = Buffer.allocUnsafe(length);
  let done = 0;
  while (done < length) {
    const n = readSync(fd, buffer, done, length - done, position + done);
    if (n === 0) break;
    done += n;
  }
  return done === length ? buffer : buffer.subarray(0, done);
}

/**
 * The lines of the file open as `fd`, whose size is `size` (taken once: bytes appended after it
 * are not seen, so a reader racing an append sees the file as it was).
 * @example [...fileLines(fd, fstatSync(fd).size).backward(0)][0]?.text // the last line
 */
export function fileLines(fd: number, size: number): LineSource {
  return {
    *forward() {
      let pending: Buffer[] = [];
      let pendingBytes = 0;
      let lineStart = 0;
      let number = 1;
      let block = FIRST_BLOCK;
      for (let position = 0; position < size;) {
        const chunk = readAt(fd, position, Math.min(block, size - position));
        if (chunk.length === 0) break;
        let from = 0;
        for (let nl = chunk.indexOf(NEWLINE, from); nl >= 0; nl = chunk.indexOf(NEWLINE, from)) {
          const bytes =
            pendingBytes === 0 ? chunk.subarray(from, nl) : Buffer.concat([...pending, chunk.subarray(from, nl)]);
          yield { text: bytes.toString('utf8'), offset: lineStart, complete: true, number: number++ } satisfies RawLine;
          pending = [];
          pendingBytes = 0;
          lineStart = position + nl + 1;
          from = nl + 1;
        }
        if (from < chunk.length) {
          pending.push(chunk.subarray(from));
          pendingBytes += chunk.length - from;
          if (pendingBytes > MAX_LINE_BYTES)
            throw new LineTooLongError(`a line is longer than ${MAX_LINE_BYTES} bytes`);
        }
        position += chunk.length;
        block = Math.min(LARGEST_BLOCK, block * 2);
      }
      if (pendingBytes > 0)
        yield { text: Buffer.concat(pending).toString('utf8'), offset: lineStart, complete: false, number };
    },
    *backward(stop) {
      if (stop >= size) return;
      const lastComplete = readAt(fd, size - 1, 1)[0] === NEWLINE;
      // [from, end) is read next; `tail` holds the bytes after it that belong to the line being
      // gathered (no newline among them); `first` is true until the file's last line is given.
      let end = lastComplete ? size - 1 : size;
      let tail: Buffer = Buffer.alloc(0);
      let first = true;
      let block = FIRST_BLOCK;
      const line = (bytes: Buffer, offset: number): RawLine => {
        const complete = first ? lastComplete : true;
        first = false;
        return { text: bytes.toString('utf8'), offset, complete };
      };
      for (;;) {
        const from = Math.max(stop, end - block);
        const chunk = readAt(fd, from, end - from);
        const data = tail.length > 0 ? Buffer.concat([chunk, tail]) : chunk;
        let cut = data.length;
        let nl = cut > 0 ? data.lastIndexOf(NEWLINE, cut - 1) : -1;
        while (nl >= 0) {
          yield line(data.subarray(nl + 1, cut), from + nl + 1);
          cut = nl;
          nl = cut > 0 ? data.lastIndexOf(NEWLINE, cut - 1) : -1;
        }
        if (from === stop) {
          yield line(data.subarray(0, cut), stop);
          return;
        }
        tail = data.subarray(0, cut);
        if (tail.length > MAX_LINE_BYTES) throw new LineTooLongError(`a line is longer than ${MAX_LINE_BYTES} bytes`);
        end = from;
        block = Math.min(LARGEST_BLOCK, block * 2);
      }
    },
    lineNumber(offset) {
      let n = 1;
      for (let position = 0; position < Math.min(offset, size); position += LARGEST_BLOCK) {
        const chunk = readAt(fd, position, Math.min(LARGEST_BLOCK, offset - position));
        for (let i = chunk.indexOf(NEWLINE); i >= 0; i = chunk.indexOf(NEWLINE, i + 1)) n += 1;
      }
      return n;
    },
  };
}
