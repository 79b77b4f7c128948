import { randomBytes } from 'node:crypto';
import { mkdir, open, readFile, rename, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../model/input-error.js';
import { parseHistory, serializeHistory } from './document.js';
import { emptyHistory, type History } from './history.js';
import { healConcurrent } from './merge.js';
import { guardAgainstLoss, StoreError, type HistoryStore } from './store.js';

/**
 * A history kept in one local file (any version readable, version 2 written).
 * - load: a missing file is an empty history; a file that cannot be read, is not a history
 *   document, or holds another series is a StoreError — and it is never overwritten.
 * - save: refuses a shrink no trim explains (guardAgainstLoss), re-reads the file (it must still
 *   be a readable history of this series) and keeps the runs another writer added since the load
 *   (healConcurrent; the window between re-read and rename is left to the caller to keep single-
 *   writer, e.g. one CI job per series), then writes atomically: a temp file in the same
 *   folder (so rename stays on one file system), fsync, rename over the old file, fsync the folder.
 *   A crash leaves either the old or the new document, never half of one. Creates the folder.
 *
 * @example const store = createFileStore('.bellgate/history.json', 'linux-x64');
 * await store.save(appendRun(await store.load(), info, run), readCount);
 */
export function createFileStore(path: string, series: string): HistoryStore {
  const where = `file ${path}`;

  async function readExisting(): Promise<History | undefined> {
    let text: string;
    try {
      text = await readFile(path, 'utf8');
    } catch (cause) {
      if ((cause as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw new StoreError(`cannot read the history file: ${messageOf(cause)}`, {
        where,
        fix: 'check that the path names a readable file',
        cause,
      });
    }
    let history: History;
    try {
      history = parseHistory(text, path);
    } catch (cause) {
      if (!(cause instanceof InputError)) throw cause;
      throw new StoreError(`the history file is not a readable history document (${cause.where ?? path}: ${cause.message}); it was left as it is`, {
        where,
        fix: `${cause.fix ?? 'repair it'}; \`bellgate verify --history ${path}\` lists every problem`,
        cause,
      });
    }
    if (history.series !== series) {
      throw new StoreError(`the file holds the history of series ${JSON.stringify(history.series)}, not ${JSON.stringify(series)}`, {
        where,
        fix: `use one file per series, or pass --series ${JSON.stringify(history.series)}`,
      });
    }
    return history;
  }

  return {
    describe: () => where,
    async load(): Promise<History> {
      return (await readExisting()) ?? emptyHistory(series);
    },
    async save(h: History, readCount: number): Promise<void> {
      if (h.series !== series) {
        throw new StoreError(`refusing to save series ${JSON.stringify(h.series)} into the history of ${JSON.stringify(series)}`, { where });
      }
      guardAgainstLoss(where, h, readCount);
      const stored = await readExisting();
      let text: string;
      try {
        text = serializeHistory(stored ? healConcurrent(h, stored) : h);
      } catch (cause) {
        throw new StoreError(`the history cannot be written: ${messageOf(cause)}`, { where, cause });
      }
      await writeAtomically(path, text, where);
    },
  };
}

async function writeAtomically(path: string, text: string, where: string): Promise<void> {
  const folder = dirname(path);
  // Short enough that a file name near the 255-byte limit still has room for its temp file.
  const temp = join(folder, `.${basename(path).slice(0, 32)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    await mkdir(folder, { recursive: true });
    const mode = await stat(path).then((s) => s.mode & 0o777, () => 0o644);
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

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
