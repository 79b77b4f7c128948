import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { defaultConfig } from './defaults.js';
import type { Config } from './types.js';

/** Where a config is looked for when none is named, relative to the working folder. */
export const DEFAULT_CONFIG_PATHS: string[] = ['.github/bellgate.yml', '.github/bellgate.yaml'];

/**
 * Whether any of the paths might hold a config: true unless every one is plainly absent (ENOENT,
 * ENOTDIR), so a folder or an unreadable file still reaches readConfigFile and its clear refusal.
 */
export async function anyConfigPresent(cwd: string, paths: readonly string[] = DEFAULT_CONFIG_PATHS): Promise<boolean> {
  for (const p of paths) {
    try {
      await stat(resolve(cwd, p));
      return true;
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      if (code !== 'ENOENT' && code !== 'ENOTDIR') return true;
    }
  }
  return false;
}

/**
 * The config for a run: a named file must exist (unless `required` is false); without a name,
 * `.github/bellgate.yml` (or `.yaml`) is read when present, else the defaults are used. The reader
 * (the YAML library, ~290 KB, and the generated schema validator) is imported only when there is
 * a file to read, picomatch only when its rules hold real globs; this module itself loads none.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadConfigLazily(undefined, '/repo') // the defaults in a folder without a config file
 */
export async function loadConfigLazily(
  path: string | undefined,
  cwd: string,
  required = path !== undefined,
): Promise<Config> {
  if (path === undefined && !(await anyConfigPresent(cwd))) return defaultConfig();
  const { readConfigFile } = await import('./read.js');
  return readConfigFile(path, { cwd, required });
}
