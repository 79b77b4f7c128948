import { readConfigFile } from '../config/read.js';
import type { Config } from '../config/types.js';
import type { CommandContext } from './context.js';
import { resolvePath } from './paths.js';

/** Where the config is looked for when `--config` is not given (DESIGN: the action's default too). */
export const DEFAULT_CONFIG_PATH = '.github/bellgate.yml';

/**
 * The config for this invocation: `--config FILE` must exist (InputError naming it otherwise);
 * without it, `.github/bellgate.yml` in the working folder is used when present, else the defaults.
 * @throws InputError for a missing explicit file or an invalid config (with file:line:col).
 */
export async function loadConfig(ctx: CommandContext, path: string | undefined): Promise<Config> {
  if (path !== undefined) return readConfigFile(resolvePath(ctx, path), { required: true });
  return readConfigFile(resolvePath(ctx, DEFAULT_CONFIG_PATH), { required: false });
}
