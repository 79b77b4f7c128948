import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { defaultConfig } from '../config/defaults.js';
import type { Config } from '../config/types.js';

/**
 * Where a config is looked for when the `config` input is left at its default: the same list as
 * DEFAULT_CONFIG_PATHS in src/config/read.ts (test/github/load-config.test.ts keeps them equal),
 * repeated here because importing read.ts loads the YAML parser and the schema validator.
 */
export const LOOKED_UP_CONFIGS: readonly string[] = ['.github/bellgate.yml', '.github/bellgate.yaml'];

/**
 * The action's config: a named file must exist; left at the default, `.github/bellgate.yml` (or
 * `.yaml`) is read when present, else the defaults are used without loading the config reader
 * (YAML and schema validation, ~40 ms of a PR check's start-up).
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadActionConfig(undefined, '/home/runner/work/repo') // defaults without a config file
 */
export async function loadActionConfig(path: string | undefined, cwd: string): Promise<Config> {
  if (path === undefined && !(await anyPresent(cwd))) return defaultConfig();
  const { readConfigFile } = await import('../config/read.js');
  return readConfigFile(path, { cwd });
}

/** True unless every looked-up path is plainly absent (ENOENT, ENOTDIR): anything else goes to readConfigFile's refusal. */
async function anyPresent(cwd: string): Promise<boolean> {
  for (const p of LOOKED_UP_CONFIGS) {
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
