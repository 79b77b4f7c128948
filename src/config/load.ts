import { checkedConfigTree, configBody, configFromTree } from './config-text.js';
import { defaultConfig } from './defaults.js';
import { picomatchCompiler } from './glob-matcher.js';
import type { Config } from './types.js';
import { readYamlTree } from './yaml-tree.js';

export { defaultConfig };

/**
 * Reads the text of a Bellgate config (YAML, `.github/bellgate.yml`) into a Config.
 * Steps: YAML under hard limits (1 MiB, 32 levels, 16 KiB scalars, 100 aliases, 10,000 values),
 * the JSON Schema (bellgate.schema.json), then the rules the schema cannot express.
 * An empty file, or one of only comments, gives the defaults.
 * Synchronous, so it loads picomatch with it; readConfigFile (parse-lazily.ts) loads it only for
 * configs that need it.
 * Throws InputError for any problem: where = "source:line:col" of the first one, fix = what to
 * write instead; every problem found is listed in the message, in reading order.
 * @example parseConfig('defaults:\n  tolerance: 2%\n', 'bellgate.yml').defaults.tolerance // { kind: 'percent', amount: 0.02 }
 * @example parseConfig('defaults:\n  cuttoff: 0.05\n', 'bellgate.yml') // throws InputError at bellgate.yml:2:3, fix 'did you mean "cutoff"?'
 */
export function parseConfig(text: string, source: string): Config {
  const tree = checkedConfigTree(readYamlTree(configBody(text)), source);
  if (tree === undefined) return { ...defaultConfig(), source };
  return configFromTree(tree, source, picomatchCompiler);
}
