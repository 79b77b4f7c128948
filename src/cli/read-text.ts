import { InputError } from '../errors/input-error.js';
import { readUserFile } from '../files/read-user-file.js';
import type { CommandContext } from './context.js';

/** Files the CLI reads whole for a flag (history, past runs, labels) are refused above this size (256 MiB). */
export const MAX_TEXT_BYTES = 256 * 1024 * 1024;

/**
 * The whole UTF-8 text of the file a flag names, read by readUserFile (a regular file, at most
 * MAX_TEXT_BYTES); `confined` for files the repository's content chooses (labels, config), so a
 * symbolic link there cannot lead out of the working folder or into .git.
 * @throws InputError when the file is missing or refused, naming the flag and the path as given.
 * @example await readFlagFile(ctx, '--labels', 'known.yml', true)
 */
export async function readFlagFile(
  ctx: CommandContext,
  flag: string,
  path: string,
  confined: boolean,
): Promise<string> {
  const text = await readFlagFileIfAny(ctx, flag, path, confined);
  if (text === undefined) {
    throw new InputError(`${flag} ${path} does not exist`, { where: path, fix: `check the path given to ${flag}` });
  }
  return text;
}

/** readFlagFile, but undefined when nothing exists at the path. */
export function readFlagFileIfAny(
  ctx: CommandContext,
  flag: string,
  path: string,
  confined: boolean,
): Promise<string | undefined> {
  return readUserFile(path, {
    cwd: ctx.io.cwd,
    what: `${flag} file`,
    maxBytes: MAX_TEXT_BYTES,
    tooLarge: (bytes) =>
      new InputError(`${flag} ${path} is ${bytes} bytes, over the ${MAX_TEXT_BYTES}-byte limit`, {
        where: path,
        fix: 'split the file, or trim old runs first',
      }),
    confined,
  });
}
