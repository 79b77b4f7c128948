import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { defaultConfig } from '../config/defaults.js';
import type { Config } from '../config/types.js';
import type { CommandContext } from './context.js';

/**
 * Where a config is looked for without --config: the same list as DEFAULT_CONFIG_PATHS in
 * src/config/read.ts (test/cli/load-config.test.ts keeps them equal), repeated here because
 * importing read.ts loads the YAML parser and the schema validator.
 */
export const LOOKED_UP_CONFIGS: readonly string[] = ['.github/bellgate.yml', '.github/bellgate.yaml'];

/**
 * The config for this invocation: `--config FILE` must exist (InputError naming it otherwise);
 * without it, `.github/bellgate.yml` (or `.yaml`) in the working folder is used when present, else the defaults.
 * The config reader (YAML, schema validation: ~40 ms of start-up) is imported only when there is a file to read.
 * @throws InputError for a missing explicit file or an invalid config (with file:line:col).
 * @example await loadConfig(ctx, undefined) // the defaults in a folder without .github/bellgate.yml
 */
export async function loadConfig(ctx: CommandContext, path: string | undefined): Promise<Config> {
  if (path === undefined && !(await anyPresent(ctx.io.cwd, LOOKED_UP_CONFIGS))) return defaultConfig();
  const { readConfigFile } = await import('../config/read.js');
  // The path goes in as the user wrote it, resolved against our cwd by readConfigFile, so its
  // "file:line:col" messages point where the user looks.
  return readConfigFile(path, { cwd: ctx.io.cwd, required: path !== undefined });
}

/**
 * Whether any of the paths might hold a config: true unless every one is plainly absent (ENOENT,
 * ENOTDIR), so a folder or an unreadable file still reaches readConfigFile and its clear refusal.
 */
export async function anyPresent(cwd: string, paths: readonly string[]): Promise<boolean> {
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
