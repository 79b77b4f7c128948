import { loadConfigLazily } from '../config/locate.js';
import type { Config } from '../config/types.js';

/**
 * The action's config: a named file must exist; left at the default, `.github/bellgate.yml` (or
 * `.yaml`) is read when present, else the defaults are used without loading the config reader.
 * @throws InputError for a missing named file or an invalid config (with file:line:col).
 * @example await loadActionConfig(undefined, '/home/runner/work/repo') // defaults without a config file
 */
export async function loadActionConfig(path: string | undefined, cwd: string): Promise<Config> {
  return loadConfigLazily(path, cwd);
}
