import { readFile, stat } from 'node:fs/promises';
import { InputError } from '../errors/input-error.js';

/** Files the CLI reads whole (history, import runs) are refused above this size (256 MiB). */
export const MAX_TEXT_BYTES = 256 * 1024 * 1024;

/**
 * Reads a whole UTF-8 text file the user named, with errors that say which flag and file.
 * @throws InputError when the file is missing, a folder, unreadable or too large.
 */
export async function readUserText(path: string, flag: string): Promise<string> {
  let size: number;
  try {
    const info = await stat(path);
    if (info.isDirectory())
      throw new InputError(`${flag} ${path} is a folder, not a file`, { where: path, fix: `name a file with ${flag}` });
    size = info.size;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`cannot read ${flag} ${path}: ${reason(error)}`, {
      where: path,
      fix: `check the path given to ${flag}`,
      cause: error,
    });
  }
  if (size > MAX_TEXT_BYTES) {
    throw new InputError(`${flag} ${path} is ${size} bytes, over the ${MAX_TEXT_BYTES}-byte limit`, {
      where: path,
      fix: 'split the file, or trim old runs first',
    });
  }
  try {
    return await readFile(path, 'utf8');
  } catch (error) {
    throw new InputError(`cannot read ${flag} ${path}: ${reason(error)}`, {
      where: path,
      fix: `check the path given to ${flag}`,
      cause: error,
    });
  }
}

function reason(error: unknown): string {
  const code = (error as { code?: unknown }).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return error instanceof Error ? error.message : String(error);
}
