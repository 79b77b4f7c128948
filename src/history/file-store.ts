/**
 * The `file` history store: one JSON Lines document (document.ts) in a local file.
 *
 * - read: a missing file is an empty history. Anything but a regular file (a folder, a FIFO, a
 *   device such as /dev/zero) is refused before a byte is read; so is a file that is not a readable
 *   history of this series — and it is never written over. With `newest`, only the header, the
 *   tombstones after it and the newest lines are read, in blocks from the end (file-lines.ts).
 * - update: under an exclusive lock beside the file (file-lock.ts; a killed writer's lock is
 *   recovered), and after removing temp files killed writers left. A record whose metrics the
 *   header already lists appends one line (fsync'd); a torn last line a killed writer left is cut
 *   off first (or, when it is a whole line that lacks only its newline, given one). Everything else
 *   — new metrics, a unit the header lacks, a trim once the history passes keep + trimSlack(keep),
 *   a drop, a rename, a merge — reads the whole document, applies the change (applyChange) and
 *   writes it atomically: a temp file in the same folder, fsync, rename over the old file, fsync
 *   of the folder. A mark is checked against the whole document and appended as a mark line.
 *   A crash leaves the old document, or the old one plus a torn line the next writer cuts off.
 *
 * @example const store = createFileStore('.bellgate/history.jsonl', 'linux-x64');
 * await store.update({ kind: 'record', info, run, keep: 4000 });
 * const recent = await store.read({ newest: 130 });
 */
import {
  closeSync,
  constants,
  fstatSync,
  fsyncSync,
  ftruncateSync,
  openSync,
  readdirSync,
  readSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import { mkdir, open, rename, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../errors/input-error.js';
import { applyChange, markRun, type HistoryChange } from './changes.js';
import { checkKeep } from './merge.js';
import { decodeHistory, markLine, replaces, runLine, serializeHistory, type Decoded } from './document.js';
import { fileLines, LineTooLongError } from './file-lines.js';
import { withFileLock, type LockOptions } from './file-lock.js';
import { emptyHistory, replacementKey, type History } from './history.js';
import { textLines } from './lines.js';
import { throwingSink } from './problems.js';
import { StoreError, trimSlack, type HistoryStore, type ReadOptions, type UpdateOutcome } from './store.js';
import { storedValue } from './units.js';

/**
 * The largest history file read whole or written: 500 MiB. The file is read into one string, and
 * V8 cannot make a string longer than 2^29 - 24 UTF-16 units (just under 512 MiB); a UTF-8 file
 * never has more characters than bytes, so a byte limit below it is safe. A read of the newest
 * runs has no such limit. At 5 significant digits that is about 14,000 runs x 5,000 metrics.
 */
export const HISTORY_FILE_LIMIT = 500 * 1024 * 1024;

export interface FileStoreOptions {
  /** Told about what was repaired or skipped (a torn last line, a killed writer's temp file). */
  warn?: (message: string) => void;
  lock?: Omit<LockOptions, 'where'>;
}

/**
 * The store of the file `path` for `series` (undefined: read whichever series the file holds; such
 * a store refuses to update).
 */
export function createFileStore(
  path: string,
  series: string | undefined,
  options: FileStoreOptions = {},
): HistoryStore {
  const where = `file ${path}`;
  const warn = options.warn ?? (() => undefined);
  const warnAt = (problem: string, at: string): void => warn(`${path}:${at}: ${problem}`);
  const folder = dirname(path);
  const stem = sideStem(path);
  const lockPath = lockPathOf(path);
  const tempPattern = new RegExp(`^${escapeRegExp(stem)}\\.[0-9a-z]+\\.tmp$`);

  function decode(lines: ReturnType<typeof textLines>, newest?: number): Decoded {
    let decoded: Decoded | undefined;
    try {
      decoded = decodeHistory(
        lines,
        throwingSink(path),
        newest === undefined ? { warn: warnAt } : { newest, warn: warnAt },
      );
    } catch (cause) {
      if (cause instanceof LineTooLongError) {
        throw new StoreError(
          `the history file is not a readable history document (${cause.message}); it was left as it is`,
          {
            where,
            fix: 'point the history at a file that Bellgate wrote',
            kind: 'not-a-history',
            cause,
          },
        );
      }
      if (!(cause instanceof InputError)) throw cause;
      throw new StoreError(
        `the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`,
        {
          where,
          fix: `${cause.fix ?? 'repair it'}; \`bellgate verify --history ${path}\` lists every problem`,
          kind: 'not-a-history',
          cause,
        },
      );
    }
    if (decoded === undefined)
      throw new StoreError('the history file is not a readable history document', { where, kind: 'not-a-history' });
    const found = decoded.history.series;
    if (series !== undefined && found !== series) {
      throw new StoreError(
        `the file holds the history of series ${JSON.stringify(found)}, not ${JSON.stringify(series)}`,
        {
          where,
          fix: `use one file per series, or pass --series ${JSON.stringify(found)}`,
          kind: 'other-series',
        },
      );
    }
    return decoded;
  }

  /** The whole document of the open file, decoded (the file's size must be within the limit). */
  function readWhole(fd: number, size: number): Decoded {
    if (size > HISTORY_FILE_LIMIT) throw tooLarge(size, where, 'the history file is');
    return decode(textLines(readAll(fd, size)));
  }

  async function read(readOptions: ReadOptions = {}): Promise<History> {
    const fd = openRegular(path, constants.O_RDONLY, where);
    if (fd === undefined) return emptyHistory(series ?? '');
    try {
      const size = fstatSync(fd).size;
      if (readOptions.newest === undefined) return readWhole(fd, size).history;
      return decode(fileLines(fd, size), readOptions.newest).history;
    } finally {
      closeSync(fd);
    }
  }

  /** Removes the temp files of writers that were killed (only writers holding the lock make them). */
  function removeLeftTemps(): void {
    let names: string[];
    try {
      names = readdirSync(folder);
    } catch {
      return;
    }
    for (const name of names) {
      if (!tempPattern.test(name)) continue;
      try {
        unlinkSync(join(folder, name));
        warn(`${where}: removed ${name}, left by a writer that was stopped`);
      } catch {
        // gone already
      }
    }
  }

  /** The append of a record, when the header already fits it; undefined when a rewrite is needed. */
  function tryAppend(
    fd: number,
    size: number,
    change: Extract<HistoryChange, { kind: 'record' }>,
  ): UpdateOutcome | undefined {
    const tail = decode(fileLines(fd, size), 1);
    const { header, history } = tail;
    if (history.dropped?.has(change.info.id)) return undefined; // applyChange says why
    const index = new Map(header.metrics.map((m, i) => [m.name, i]));
    const values = new Array<number>(header.metrics.length).fill(NaN);
    for (const [name, m] of change.run.metrics) {
      const i = index.get(name);
      const unit = header.metrics[i ?? -1]?.unit;
      // A new metric, or a unit the header lacks: the header changes, so the document is rewritten.
      if (i === undefined || (unit === undefined && m.unit !== undefined)) return undefined;
      values[i] = storedValue(name, m, unit);
    }
    const last = history.runs.at(-1);
    const sameRun = last !== undefined && replacementKey(last.id) === replacementKey(change.info.id);
    // A lower attempt than the one stored changes nothing; applyChange on the whole history says so.
    if (sameRun && !replaces(change.info.id, last.id)) return undefined;
    const replaced = sameRun ? last.id : undefined;
    const runs = replaced === undefined ? tail.countHint + 1 : Math.max(tail.countHint, 1);
    if (runs > change.keep + trimSlack(change.keep)) return undefined;
    appendLine(fd, size, runLine(change.info, values, runs));
    return replaced === undefined ? { runs, wrote: 'appended' } : { runs, replaced, wrote: 'appended' };
  }

  /** Writes `line` at the end, after cutting off (or ending) a torn last line. */
  function appendLine(fd: number, size: number, line: string): void {
    let at = size;
    let prefix = '';
    if (size > 0 && readByte(fd, size - 1) !== 0x0a) {
      const lastNewline = findLastNewline(fd, size);
      const torn = Buffer.alloc(size - lastNewline - 1);
      readSync(fd, torn, 0, torn.length, lastNewline + 1);
      if (isJson(torn.toString('utf8'))) prefix = '\n';
      else {
        ftruncateSync(fd, lastNewline + 1);
        at = lastNewline + 1;
        warn(`${where}: cut off an incomplete last line (${torn.length} bytes) that an interrupted write left`);
      }
    }
    const bytes = Buffer.from(`${prefix}${line}\n`, 'utf8');
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done, at + done);
    fsyncSync(fd);
  }

  async function update(change: HistoryChange): Promise<UpdateOutcome> {
    if (series === undefined) throw new StoreError('this store was opened to read only (no series given)', { where });
    const own = series;
    await mkdir(folder, { recursive: true }).catch((cause: unknown) => {
      throw new StoreError(`cannot create the folder of the history file: ${messageOf(cause)}`, {
        where,
        fix: 'check that the path names a writable folder',
        cause,
      });
    });
    if (change.kind === 'record') checkKeep(change.keep);
    return withFileLock(
      lockPath,
      async () => {
        removeLeftTemps();
        const fd = openRegular(path, constants.O_RDWR, where);
        let text: string;
        let outcome: UpdateOutcome;
        try {
          const size = fd === undefined ? 0 : fstatSync(fd).size;
          if (fd !== undefined && size > 0 && change.kind === 'record') {
            const appended = tryAppend(fd, size, change);
            if (appended !== undefined) return appended;
          }
          const stored = fd === undefined ? emptyHistory(own) : readWhole(fd, size).history;
          if (change.kind === 'mark' && fd !== undefined) {
            // Checked against the whole history (the run must exist), then written as one line.
            const marked = markRun(stored, change.id, change.mark);
            appendLine(fd, size, markLine(change.id, change.mark));
            return { runs: marked.runs.length, wrote: 'appended' };
          }
          const { history, replaced } = applyChange(stored, change);
          text = serializeHistory(history);
          outcome =
            replaced === undefined
              ? { runs: history.runs.length, wrote: 'rewritten' }
              : { runs: history.runs.length, replaced, wrote: 'rewritten' };
        } finally {
          if (fd !== undefined) closeSync(fd);
        }
        if (Buffer.byteLength(text, 'utf8') > HISTORY_FILE_LIMIT)
          throw tooLarge(Buffer.byteLength(text, 'utf8'), where, 'the history to write would be');
        await writeAtomically(text);
        return outcome;
      },
      { ...options.lock, where },
    );
  }

  async function writeAtomically(text: string): Promise<void> {
    const temp = tempPathOf(path, Math.random().toString(36).slice(2, 12));
    try {
      const mode = await stat(path).then(
        (s) => s.mode & 0o777,
        () => 0o644,
      );
      const handle = await open(temp, 'wx', mode);
      try {
        await handle.writeFile(text, 'utf8');
        await handle.sync();
      } finally {
        await handle.close();
      }
      await rename(temp, path);
    } catch (cause) {
      await unlink(temp).catch(() => undefined);
      throw new StoreError(`cannot write the history file: ${messageOf(cause)}`, {
        where,
        fix: 'check that the folder is writable and that the disk has room',
        cause,
      });
    }
    // The rename is durable only once the folder entry is on disk; some systems cannot fsync a folder.
    try {
      const dir = await open(folder, 'r');
      try {
        await dir.sync();
      } finally {
        await dir.close();
      }
    } catch {
      // best effort
    }
  }

  return { describe: () => where, read, update };
}

/**
 * The name stem of the files the store keeps beside the history (lock, temp files): hidden, short
 * enough that a file name near the 255-byte limit still has room, and with a hash of the whole
 * name, so two histories whose names share their first 32 characters never share them.
 */
function sideStem(path: string): string {
  const base = basename(path);
  return `.${base.slice(0, 32)}.${fnv1a(base)}`;
}

/**
 * The lock file of the history file `path`.
 * @example lockPathOf('/repo/.bellgate/history.jsonl') // '/repo/.bellgate/.history.jsonl.1a2b3c4d.lock'
 */
export function lockPathOf(path: string): string {
  return join(dirname(path), `${sideStem(path)}.lock`);
}

/** A temp file of the history file `path` (what a writer renames over it). */
export function tempPathOf(path: string, tag: string): string {
  return join(dirname(path), `${sideStem(path)}.${tag}.tmp`);
}

/**
 * The text of a history file, for tools that look at the document itself (`bellgate verify`):
 * refused like the store refuses it — not a regular file, over HISTORY_FILE_LIMIT — before a byte
 * is read. Undefined when the file does not exist.
 * @throws StoreError
 * @example readHistoryText('.bellgate/history.jsonl')?.split('\n')[0] // the header line
 */
export function readHistoryText(path: string): string | undefined {
  const where = `file ${path}`;
  const fd = openRegular(path, constants.O_RDONLY, where);
  if (fd === undefined) return undefined;
  try {
    const size = fstatSync(fd).size;
    if (size > HISTORY_FILE_LIMIT) throw tooLarge(size, where, 'the history file is');
    return readAll(fd, size);
  } finally {
    closeSync(fd);
  }
}

/**
 * Opens `path` (flags plus O_NONBLOCK, so a FIFO does not hang the open) and makes sure it is a
 * regular file; undefined when it does not exist.
 * @throws StoreError naming what it is instead (a folder, a FIFO, a device, a socket).
 */
export function openRegular(path: string, flags: number, where: string): number | undefined {
  let fd: number;
  try {
    fd = openSync(path, flags | constants.O_NONBLOCK);
  } catch (cause) {
    const code = (cause as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return undefined;
    if (code === 'EISDIR') throw notRegular(path, 'a folder', where);
    throw new StoreError(`cannot open the history file: ${messageOf(cause)}`, {
      where,
      fix: 'check that the path names a readable and writable file',
      cause,
    });
  }
  const info = fstatSync(fd);
  if (info.isFile()) return fd;
  closeSync(fd);
  const kind = info.isDirectory()
    ? 'a folder'
    : info.isFIFO()
      ? 'a FIFO (named pipe)'
      : info.isCharacterDevice()
        ? 'a character device'
        : info.isBlockDevice()
          ? 'a block device'
          : info.isSocket()
            ? 'a socket'
            : 'not a regular file';
  throw notRegular(path, kind, where);
}

function notRegular(path: string, kind: string, where: string): StoreError {
  return new StoreError(`${path} is ${kind}, not a regular file; a history is read only from a regular file`, {
    where,
    fix: 'name a history file (Bellgate creates it on the first record)',
  });
}

/** The first `size` bytes of the file as UTF-8 text. */
function readAll(fd: number, size: number): string {
  const bytes = Buffer.allocUnsafe(size);
  let done = 0;
  while (done < size) {
    const n = readSync(fd, bytes, done, size - done, done);
    if (n === 0) break;
    done += n;
  }
  return bytes.subarray(0, done).toString('utf8');
}

function readByte(fd: number, position: number): number | undefined {
  const one = Buffer.alloc(1);
  return readSync(fd, one, 0, 1, position) === 1 ? one[0] : undefined;
}

/** The offset of the last newline before `size` (-1 when there is none). */
function findLastNewline(fd: number, size: number): number {
  const block = 64 * 1024;
  for (let end = size; end > 0; end -= block) {
    const from = Math.max(0, end - block);
    const chunk = Buffer.alloc(end - from);
    readSync(fd, chunk, 0, chunk.length, from);
    const nl = chunk.lastIndexOf(0x0a);
    if (nl >= 0) return from + nl;
  }
  return -1;
}

function isJson(text: string): boolean {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}

/** 8 hex digits of FNV-1a over a name's UTF-16 units: distinct names, short and file-safe. */
function fnv1a(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** The refusal of a history past HISTORY_FILE_LIMIT: the size, the limit and what to do. */
function tooLarge(size: number, where: string, what: string): StoreError {
  const mib = (n: number) => `${(n / 1024 / 1024).toFixed(1)} MiB`;
  return new StoreError(
    `${what} ${mib(size)} (${size} bytes), over the limit of ${mib(HISTORY_FILE_LIMIT)} a history file may hold; it was left as it is`,
    {
      where,
      fix: 'lower `keep` (fewer runs per history), or split the series into several (one per group of metrics)',
    },
  );
}

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
