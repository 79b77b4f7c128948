import { InputError } from '../errors/input-error.js';
import { readUserFile } from '../files/read-user-file.js';
import { defaultConfig } from './defaults.js';
import { explainSchemaErrors } from './explain-schema-errors.js';
import { problemsError } from './problems.js';
import { schemaErrors } from './schema.js';
import { toConfig } from './to-config.js';
import type { Config } from './types.js';
import { MAX_CONFIG_CHARS } from './yaml-limits.js';
import { readYamlTree } from './yaml-tree.js';

export { defaultConfig };

/** Where a config is looked for when none is named, relative to the working folder. */
export const DEFAULT_CONFIG_PATHS: readonly string[] = ['.github/bellgate.yml', '.github/bellgate.yaml'];

/**
 * The config of a run, for the CLI (`--config`) and the action (the `config` input). A named path
 * must exist; without one, `.github/bellgate.yml` (then `.yaml`) in `cwd` is read when present,
 * else the defaults are used. Relative paths start at `cwd`, the workspace: a config there may not
 * be a symbolic link out of it or into .git, and must be a regular UTF-8 file of at most 1 MiB
 * (readUserFile). Messages name the path as given, so "file:line:col" points where the user looks.
 * @throws InputError for a missing named file, a refused file or an invalid config (file:line:col).
 * @example await loadConfig(undefined, '/repo') // the defaults in a folder without .github/bellgate.yml
 */
export async function loadConfig(path: string | undefined, cwd: string): Promise<Config> {
  for (const candidate of path === undefined ? DEFAULT_CONFIG_PATHS : [path]) {
    const text = await readUserFile(candidate, {
      cwd,
      what: 'config file',
      maxBytes: MAX_CONFIG_CHARS,
      tooLarge: (bytes) =>
        new InputError(`config file ${candidate} is ${bytes} bytes; the limit is ${MAX_CONFIG_CHARS} (1 MiB)`, {
          where: candidate,
          fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
        }),
      confined: true,
    });
    if (text !== undefined) return parseConfig(text, candidate);
  }
  if (path !== undefined) {
    throw new InputError(`config file ${path} does not exist`, {
      where: path,
      fix: 'check the path (it is relative to the working folder), or leave the config out to use the defaults',
    });
  }
  return defaultConfig();
}

/**
 * Reads the text of a Bellgate config (YAML) into a Config, in three steps: the YAML under hard
 * limits (1 MiB, 32 levels, 16 KiB scalars, 100 aliases, 10,000 values; yaml-tree.ts), the JSON
 * Schema (bellgate.schema.json), then what the schema cannot express (to-config.ts). A leading
 * byte-order mark is dropped; an empty file, or one of only comments, gives the defaults.
 * @throws InputError for any problem: where = "source:line:col" of the first one, fix = what to
 *   write instead; every problem found is listed in the message, in reading order.
 * @example parseConfig('defaults:\n  tolerance: 2%\n', 'bellgate.yml').defaults.tolerance // { kind: 'percent', amount: 0.02 }
 * @example parseConfig('defaults:\n  cuttoff: 0.05\n', 'bellgate.yml') // throws InputError at bellgate.yml:2:3, fix 'did you mean "cutoff"?'
 */
export function parseConfig(text: string, source: string): Config {
  const { tree, problems } = readYamlTree(text.startsWith('\uFEFF') ? text.slice(1) : text);
  if (!tree || problems.length > 0) throw problemsError(problems, source);
  if (tree.value === undefined || tree.value === null) return { ...defaultConfig(), source };
  const schemaProblems = explainSchemaErrors(schemaErrors(tree.value), tree);
  if (schemaProblems.length > 0) throw problemsError(schemaProblems, source);
  const built = toConfig(tree.value, tree, source);
  if (built.problems.length > 0) throw problemsError(built.problems, source);
  return built.config;
}
