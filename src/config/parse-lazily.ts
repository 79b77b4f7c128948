import { checkedConfigTree, configBody, configFromTree, needsGlobLibrary } from './config-text.js';
import { defaultConfig } from './defaults.js';
import { exactNameCompiler } from './name-matchers.js';
import { readPlainYaml } from './plain-yaml.js';
import type { Config } from './types.js';

/**
 * parseConfig (load.ts), loading libraries only when the config needs them: the YAML library
 * (~170 KB, 10-25 ms to load and warm) only when the text is not plain (readPlainYaml declines:
 * lists, quotes, ...), the glob library (picomatch, ~60 KB) only when a rule or group has a glob
 * that is more than a plain name. Same Config, same InputError for every input.
 * @throws InputError as parseConfig.
 * @example (await parseConfigLazily('keep: 900\n', 'bellgate.yml')).keep // 900
 */
export async function parseConfigLazily(text: string, source: string): Promise<Config> {
  const body = configBody(text);
  const plain = readPlainYaml(body);
  const read =
    plain !== undefined ? { tree: plain, problems: [] } : (await import('./yaml-tree.js')).readYamlTree(body);
  const tree = checkedConfigTree(read, source);
  if (tree === undefined) return { ...defaultConfig(), source };
  const globs = needsGlobLibrary(tree.value)
    ? (await import('./glob-matcher.js')).picomatchCompiler
    : exactNameCompiler;
  return configFromTree(tree, source, globs);
}
