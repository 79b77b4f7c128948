import { loadConfigLazily } from '../config/locate.js';
import type { Config } from '../config/types.js';
import type { CommandContext } from './context.js';

/**
 * The config for this invocation: `--config FILE` must exist (InputError naming it otherwise);
 * without it, `.github/bellgate.yml` (or `.yaml`) in the working folder is used when present, else
 * the defaults. The path goes in as the user wrote it, resolved against our cwd by readConfigFile,
 * so its "file:line:col" messages point where the user looks.
 * @throws InputError for a missing explicit file or an invalid config (with file:line:col).
 * @example await loadConfig(ctx, undefined) // the defaults in a folder without .github/bellgate.yml
 */
export async function loadConfig(ctx: CommandContext, path: string | undefined): Promise<Config> {
  return loadConfigLazily(path, ctx.io.cwd);
}
