import { anyConfigPresent, DEFAULT_CONFIG_PATHS, loadConfigLazily } from '../config/locate.js';
import type { Config } from '../config/types.js';
import type { CommandContext } from './context.js';

/** Where a config is looked for without --config (src/config/locate.ts). */
export const LOOKED_UP_CONFIGS: readonly string[] = DEFAULT_CONFIG_PATHS;

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
