import { readConfigFile } from '../config/read.js';
import type { Config } from '../config/types.js';
import type { CommandContext } from './context.js';

/**
 * The config for this invocation: `--config FILE` must exist (InputError naming it otherwise);
 * without it, `.github/bellgate.yml` (or `.yaml`) in the working folder is used when present, else the defaults.
 * @throws InputError for a missing explicit file or an invalid config (with file:line:col).
 */
export async function loadConfig(ctx: CommandContext, path: string | undefined): Promise<Config> {
  // The path goes in as the user wrote it, resolved against our cwd by readConfigFile, so its
  // "file:line:col" messages point where the user looks.
  return readConfigFile(path, { cwd: ctx.io.cwd, required: path !== undefined });
}
