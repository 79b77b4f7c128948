import { mkdir, open, readFile, rename, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../errors/input-error.js';
import { parseHistoryBytes, serializeHistory } from './document.js';
import { emptyHistory, type History, type RunInfo } from './history.js';
import { spliceHistory, writtenHistory, type WrittenHistory } from './splice-append.js';
import { guardAgainstLoss, StoreError, type HistoryStore } from './store.js';
import { primeScan, SCAN_FROM } from './values-scan.js';

/**
 * The largest history file the file store reads or writes: 500 MiB. The file is read into one
 * string, and V8 (Node 20) cannot make a string longer than 2^29 - 24 UTF-16 units (just under
 * 512 MiB); a UTF-8 file never has more characters than bytes, so a byte limit below it is safe.
 * At 5 significant digits that is about 14,000 runs x 5,000 metrics; `keep` bounds it.
 */
export const HISTORY_FILE_LIMIT = 500 * 1024 * 1024;

/**
 * A history kept in one local file (any version readable, version 2 written).
 * - load: a missing file is an empty history; a file that cannot be read, is larger than
 *   HISTORY_FILE_LIMIT, is not a history document, or holds another series is a StoreError — and
 *   it is never overwritten. save refuses to write a document over the limit the same way.
 * - save: refuses a shrink no trim explains (guardAgainstLoss), re-reads the file (it must still
 *   be a readable history of this series) and keeps the runs another writer added since the load
 *   (healConcurrent; parsed again only when its bytes differ from every loaded document's, or h
 *   lacks some of their runs; the window between re-read and rename is left to the caller to keep
 *   single-writer, e.g. one CI job per series), then writes: when h is the loaded document plus
 *   appended runs (and perhaps trimmed), by splicing the loaded rows' bytes (spliceHistory, same
 *   meaning as serializeHistory, which writes anything else), and atomically: a temp file in the same
 *   folder (so rename stays on one file system), fsync, rename over the old file, fsync the folder.
 *   A crash leaves either the old or the new document, never half of one. Creates the folder.
 *
 * @example const store = createFileStore('.bellgate/history.json', 'linux-x64');
 * await store.save(appendRun(await store.load(), info, run), readCount);
 */
export function createFileStore(path: string, series: string): HistoryStore {
  const where = `file ${path}`;

  /** The file's bytes; undefined when it does not exist. Refuses a file over the limit unread. */
  async function readBytes(): Promise<Buffer | undefined> {
    try {
      // Stat first: past the limit, reading would fail with V8's unexplained "Invalid string length".
      const size = (await stat(path)).size;
      if (size > HISTORY_FILE_LIMIT) throw tooLarge(size, where, 'the history file is');
      const reading = readFile(path);
      // While the bytes of a large file arrive, the byte reader's hot loop is run on a few rows
      // and V8 starts optimizing it in the background (primeScan), instead of during the first
      // real rows. A small file is read by JSON.parse (parseBytes).
      if (size >= SCAN_FROM) primeScan();
      const bytes = await reading;
      if (bytes.length > HISTORY_FILE_LIMIT) throw tooLarge(bytes.length, where, 'the history file is');
      return bytes;
    } catch (cause) {
      if (cause instanceof StoreError) throw cause;
      if ((cause as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw new StoreError(`cannot read the history file: ${messageOf(cause)}`, {
        where,
        fix: 'check that the path names a readable file',
        cause,
      });
    }
  }

  /**
   * The bytes read as a history of this series (parseHistoryBytes: by the byte reader from
   * SCAN_FROM on, which also gives the rows an append splices), or the StoreError why not.
   */
  function parseBytes(bytes: Uint8Array): ReturnType<typeof parseHistoryBytes> {
    let read: ReturnType<typeof parseHistoryBytes>;
    try {
      read = parseHistoryBytes(bytes, path, bytes.length >= SCAN_FROM);
    } catch (cause) {
      if (!(cause instanceof InputError)) throw cause;
      throw new StoreError(
        `the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`,
        {
          where,
          fix: `${cause.fix ?? 'repair it'}; \`bellgate verify --history ${path}\` lists every problem`,
          cause,
        },
      );
    }
    const found = read.history.series;
    if (found !== series) {
      throw new StoreError(
        `the file holds the history of series ${JSON.stringify(found)}, not ${JSON.stringify(series)}`,
        {
          where,
          fix: `use one file per series, or pass --series ${JSON.stringify(found)}`,
        },
      );
    }
    return read;
  }

  // Every document load() parsed, its bytes and runs: when save() finds the same bytes on disk it
  // knows their runs without parsing them again (the costliest step at scale). Comparing the bytes
  // (a memcmp) costs less than hashing them twice; they are kept for the splice anyway.
  const loaded: { bytes: Buffer; runs: RunInfo[] }[] = [];
  // The newest document load() read, kept with its bytes so save() can splice an append into its
  // rows instead of writing every number again (spliceHistory checks that h still agrees with it).
  let written: WrittenHistory | undefined;

  return {
    describe: () => where,
    async load(): Promise<History> {
      written = undefined;
      const bytes = await readBytes();
      if (bytes === undefined) return emptyHistory(series);
      const { history, rows } = parseBytes(bytes);
      if (!loaded.some((d) => d.bytes.equals(bytes))) {
        loaded.push({
          bytes,
          runs: history.runs.map((r) => (r.time === undefined ? { id: r.id } : { id: r.id, time: r.time })),
        });
      }
      // What an append can splice into: a scanned document, with its rows, or one read whole
      // (below SCAN_FROM), whose rows the first splice looks for. A large document the scan
      // declined is not scanned again on save.
      if (rows !== undefined || bytes.length < SCAN_FROM) written = writtenHistory(bytes, rows, history);
      return history;
    },
    async save(h: History, readCount: number): Promise<void> {
      if (h.series !== series) {
        throw new StoreError(
          `refusing to save series ${JSON.stringify(h.series)} into the history of ${JSON.stringify(series)}`,
          { where },
        );
      }
      guardAgainstLoss(where, h, readCount);
      const healed = await healFromDisk(h);
      let text: string | Buffer;
      try {
        text =
          (healed === h && written !== undefined ? spliceHistory(h, written) : undefined) ?? serializeHistory(healed);
      } catch (cause) {
        // A document past V8's longest string fails inside serializeHistory with a RangeError.
        if (cause instanceof RangeError) throw tooLarge(undefined, where, 'the history to write would be');
        throw new StoreError(`the history cannot be written: ${messageOf(cause)}`, { where, cause });
      }
      // Characters <= UTF-8 bytes <= 3 x characters: count the bytes only when the bound is unclear.
      if (typeof text !== 'string' || text.length * 3 > HISTORY_FILE_LIMIT) {
        const bytes = typeof text === 'string' ? Buffer.byteLength(text, 'utf8') : text.length;
        if (bytes > HISTORY_FILE_LIMIT) throw tooLarge(bytes, where, 'the history to write would be');
      }
      await writeAtomically(path, text, where);
    },
  };

  /**
   * h plus the runs another writer added since the load (healConcurrent). The file must still be a
   * readable history of this series. When its bytes are those of a loaded document whose runs add
   * nothing to h (the usual case: nobody else wrote), healing is known to return h: no parse.
   */
  async function healFromDisk(h: History): Promise<History> {
    // Loaded on save, as node:crypto is below: a check only reads.
    const { concurrentRuns, healConcurrent } = await import('./merge.js');
    let bytes = await readBytes();
    if (bytes === undefined) return h;
    const disk = bytes;
    const runs = loaded.find((d) => d.bytes.equals(disk))?.runs;
    if (runs !== undefined && concurrentRuns(h, runs).length === 0) return h;
    const stored = parseBytes(bytes).history;
    bytes = undefined;
    return healConcurrent(h, stored);
  }
}

async function writeAtomically(path: string, text: string | Uint8Array, where: string): Promise<void> {
  const folder = dirname(path);
  // node:crypto loads here, on write, not at start-up: a check only reads.
  const { randomBytes } = await import('node:crypto');
  // Short enough that a file name near the 255-byte limit still has room for its temp file.
  const temp = join(folder, `.${basename(path).slice(0, 32)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    await mkdir(folder, { recursive: true });
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
      fix: 'check that the folder exists or can be created and is writable, and that the disk has room',
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

/** The refusal of a history past HISTORY_FILE_LIMIT: the size, the limit and what to do. */
function tooLarge(size: number | undefined, where: string, what: string): StoreError {
  const mib = (n: number) => `${(n / 1024 / 1024).toFixed(1)} MiB`;
  const amount = size === undefined ? 'larger than' : `${mib(size)} (${size} bytes), over`;
  return new StoreError(
    `${what} ${amount} the limit of ${mib(HISTORY_FILE_LIMIT)} a history file may hold; it was left as it is`,
    {
      where,
      fix: 'lower `keep` (fewer runs per history), or split the series into several (one per group of metrics)',
    },
  );
}

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
