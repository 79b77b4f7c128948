import { readFile, stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { InputError } from '../errors/input-error.js';
import { defaultConfig } from './defaults.js';
import { parseConfigLazily } from './parse-lazily.js';
import type { Config } from './types.js';

import { DEFAULT_CONFIG_PATHS } from './locate.js';

export { DEFAULT_CONFIG_PATHS };

/** Largest config file read, in bytes; a real one is a few kilobytes. */
export const MAX_CONFIG_FILE_BYTES = 1024 * 1024;

export interface ReadConfigOptions {
  /** A missing file is an error (default: true when a path is given, false when looked up). */
  required?: boolean;
  /** Folder that relative paths start from (default: process.cwd()). */
  cwd?: string;
}

/**
 * Reads and parses a config file. Without a path, looks for `.github/bellgate.yml` (then
 * `.yaml`) in the working folder and returns the defaults when there is none. A named path that
 * is missing is an InputError (unless `required: false`, as for the action's default input).
 * Refuses files over 1 MiB, folders and text that is not UTF-8. Messages name the path as given,
 * so "file:line:col" points where the user looks.
 * @example await readConfigFile() // defaults when the repository has no .github/bellgate.yml
 */
export async function readConfigFile(path?: string, options: ReadConfigOptions = {}): Promise<Config> {
  const cwd = options.cwd ?? process.cwd();
  const required = options.required ?? path !== undefined;
  const candidates = path === undefined ? DEFAULT_CONFIG_PATHS : [path];
  for (const candidate of candidates) {
    const text = await readText(candidate, resolve(cwd, candidate));
    if (text !== undefined) return parseConfigLazily(text, candidate);
  }
  if (required) {
    throw new InputError(`config file ${path ?? candidates[0]} does not exist`, {
      where: path,
      fix: 'check the path (it is relative to the working folder), or leave the config out to use the defaults',
    });
  }
  return defaultConfig();
}

/** The file's text, or undefined when it does not exist. */
async function readText(shown: string, full: string): Promise<string | undefined> {
  let size: number;
  try {
    const info = await stat(full);
    if (info.isDirectory()) {
      throw new InputError(`config path ${shown} is a folder, not a file`, {
        where: shown,
        fix: 'name the YAML file itself',
      });
    }
    size = info.size;
  } catch (err) {
    if (err instanceof InputError) throw err;
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') return undefined;
    throw new InputError(`cannot read config file ${shown} (${code ?? String(err)})`, {
      where: shown,
      fix: 'check that the file is readable',
      cause: err,
    });
  }
  if (size > MAX_CONFIG_FILE_BYTES) throw tooLarge(shown, size);
  let bytes: Buffer;
  try {
    bytes = await readFile(full);
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new InputError(`cannot read config file ${shown} (${code ?? String(err)})`, {
      where: shown,
      fix: 'check that the file is readable',
      cause: err,
    });
  }
  // The file may have grown since stat.
  if (bytes.length > MAX_CONFIG_FILE_BYTES) throw tooLarge(shown, bytes.length);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch (err) {
    throw new InputError(`config file ${shown} is not UTF-8 text`, {
      where: shown,
      fix: 'save the file as UTF-8',
      cause: err,
    });
  }
}

function tooLarge(shown: string, size: number): InputError {
  return new InputError(`config file ${shown} is ${size} bytes; the limit is ${MAX_CONFIG_FILE_BYTES} (1 MiB)`, {
    where: shown,
    fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
  });
}
