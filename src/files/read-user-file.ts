import { constants } from 'node:fs';
import { open, realpath, type FileHandle } from 'node:fs/promises';
import { join, resolve, sep } from 'node:path';
import { InputError } from '../errors/input-error.js';

export interface UserFileOptions {
  /** The working folder: relative paths start here, and it is the workspace `confined` keeps to. */
  cwd: string;
  /** What the file is, for messages: "config file", "metric file", "--labels file". */
  what: string;
  /** How messages name the file (default: the path as given). */
  shown?: string;
  /** Largest size read, in bytes. */
  maxBytes: number;
  /** The refusal of a file over maxBytes (default: a message naming the limit). */
  tooLarge?: (bytes: number) => InputError;
  /**
   * A path inside the workspace may not lead out of it through a symbolic link, nor into its .git
   * folder (where actions/checkout keeps the token). For files the repository's content chooses:
   * config, metric and labels files. A path named outside the workspace is read as named.
   */
  confined: boolean;
}

/**
 * Reads a file the user named as UTF-8 text, refusing what is not an ordinary file at once: a
 * folder, a device such as /dev/zero, a FIFO (opened without blocking, so a pipe nobody writes to
 * cannot hang the run) or a socket; a file over `maxBytes` (a file that grows while it is read
 * stops at the limit); text that is not UTF-8. Refusals never quote the file's content.
 * Returns undefined when nothing exists at the path. Messages name the path as the user wrote it.
 * @throws InputError for every refusal, with a fix.
 * @example await readUserFile('.github/bellgate.yml', { cwd: '/repo', what: 'config file', maxBytes: 1 << 20, confined: true })
 */
export async function readUserFile(given: string, options: UserFileOptions): Promise<string | undefined> {
  const { what } = options;
  const shown = options.shown ?? given;
  const full = resolve(options.cwd, given);
  let real: string;
  try {
    real = await realpath(full);
  } catch (error) {
    const code = errorCode(error);
    if (code === 'ENOENT' || code === 'ENOTDIR') return undefined;
    throw cannotRead(what, shown, error);
  }
  if (options.confined) await checkConfined(full, real, options.cwd, what, shown);

  let handle: FileHandle;
  try {
    handle = await open(real, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  } catch (error) {
    throw cannotRead(what, shown, error);
  }
  try {
    const info = await handle.stat();
    if (!info.isFile()) {
      const kind = info.isDirectory()
        ? 'a folder'
        : info.isFIFO()
          ? 'a named pipe'
          : info.isCharacterDevice() || info.isBlockDevice()
            ? 'a device'
            : 'not a regular file';
      throw new InputError(`${what} ${shown} is ${kind}, not a regular file`, {
        where: shown,
        fix: `name the ${what} itself (a regular file)`,
      });
    }
    const tooLarge =
      options.tooLarge ??
      ((bytes: number) =>
        new InputError(`${what} ${shown} is over ${options.maxBytes} bytes (${bytes} read)`, {
          where: shown,
          fix: 'check that the right file is named',
        }));
    if (info.size > options.maxBytes) throw tooLarge(info.size);
    const bytes = await readAtMost(handle, options.maxBytes + 1);
    if (bytes.length > options.maxBytes) throw tooLarge(bytes.length);
    try {
      return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    } catch (error) {
      throw new InputError(`${what} ${shown} is not UTF-8 text`, {
        where: shown,
        fix: 'save it as UTF-8',
        cause: error,
      });
    }
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw cannotRead(what, shown, error);
  } finally {
    await handle.close();
  }
}

async function checkConfined(full: string, real: string, cwd: string, what: string, shown: string): Promise<void> {
  const root = resolve(cwd);
  if (!within(full, root)) return;
  const realRoot = await realpath(root).catch(() => root);
  if (!within(real, realRoot)) {
    throw new InputError(`${what} ${shown} is a symbolic link that leads out of the workspace (${root})`, {
      where: shown,
      fix: `keep the ${what} itself in the workspace; a link there may not point outside it`,
    });
  }
  if (within(real, join(realRoot, '.git'))) {
    throw new InputError(`${what} ${shown} lies in the repository's .git folder, which Bellgate never reads`, {
      where: shown,
      fix: `name a ${what} of the checkout itself`,
    });
  }
}

function within(path: string, folder: string): boolean {
  return path === folder || path.startsWith(folder.endsWith(sep) ? folder : folder + sep);
}

/** Up to `limit` bytes from the start of the file; fewer when it ends first. */
async function readAtMost(handle: FileHandle, limit: number): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let total = 0;
  while (total < limit) {
    const chunk = Buffer.alloc(Math.min(limit - total, 1 << 20));
    const { bytesRead } = await handle.read(chunk, 0, chunk.length, total);
    if (bytesRead === 0) break;
    chunks.push(chunk.subarray(0, bytesRead));
    total += bytesRead;
  }
  return Buffer.concat(chunks, total);
}

function cannotRead(what: string, shown: string, error: unknown): InputError {
  const code = errorCode(error);
  const reason =
    code === 'EACCES' || code === 'EPERM'
      ? 'permission denied'
      : code === 'ELOOP'
        ? 'too many symbolic links'
        : (code ?? (error instanceof Error ? error.message : String(error)));
  return new InputError(`cannot read ${what} ${shown} (${reason})`, {
    where: shown,
    fix: 'check that the file exists and is readable',
    cause: error,
  });
}

function errorCode(error: unknown): string | undefined {
  const code = (error as { code?: unknown } | null)?.code;
  return typeof code === 'string' ? code : undefined;
}
