import { checkedConfigTree, configFromTree, needsGlobLibrary } from './config-text.js';
import { defaultConfig } from './defaults.js';
import { exactNameCompiler } from './name-matchers.js';
import type { Config } from './types.js';

/**
 * parseConfig (load.ts), loading the glob library (picomatch, ~60 KB) only when a rule or group
 * has a glob that is more than a plain name: a config without rules, or with rules over exact
 * metric names, is read without it. Same Config, same InputError for every input.
 * @throws InputError as parseConfig.
 * @example (await parseConfigLazily('keep: 900\n', 'bellgate.yml')).keep // 900
 */
export async function parseConfigLazily(text: string, source: string): Promise<Config> {
  const tree = checkedConfigTree(text, source);
  if (tree === undefined) return { ...defaultConfig(), source };
  const globs = needsGlobLibrary(tree.value) ? (await import('./glob-matcher.js')).picomatchCompiler : exactNameCompiler;
  return configFromTree(tree, source, globs);
}
