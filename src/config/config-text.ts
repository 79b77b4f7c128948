import { explainSchemaErrors } from './explain-schema-errors.js';
import { exactMatcher, type GlobCompiler } from './name-matchers.js';
import { problemsError, type ConfigProblem } from './problems.js';
import { schemaErrors } from './schema.js';
import { globList, toConfig } from './to-config.js';
import type { Config } from './types.js';
import type { YamlTree } from './tree.js';

type Data = Record<string, unknown>;

/**
 * The text a config reader parses: a leading byte-order mark dropped (editors on Windows write one).
 * @example configBody('\uFEFFkeep: 9\n') // 'keep: 9\n'
 */
export function configBody(text: string): string {
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

/**
 * The second step of reading a config, after the YAML was read (readYamlTree in yaml-tree.ts, or
 * readPlainYaml in plain-yaml.ts for plain text): its problems, then the JSON Schema
 * (bellgate.schema.json). Returns the tree, or undefined when the file is empty or holds only
 * comments (the defaults apply). Imports no YAML code, so the lazy reader can skip the library.
 * @throws InputError listing every problem, at the "source:line:col" of the first.
 * @example checkedConfigTree(readYamlTree('cutoff: 2\n'), 'b.yml') // throws InputError at b.yml:1:1 (unknown key)
 */
export function checkedConfigTree(
  read: { tree?: YamlTree; problems: ConfigProblem[] },
  source: string,
): YamlTree | undefined {
  const { tree, problems } = read;
  if (!tree || problems.length > 0) throw problemsError(problems, source);
  if (tree.value === undefined || tree.value === null) return undefined;
  const schemaProblems = explainSchemaErrors(schemaErrors(tree.value), tree);
  if (schemaProblems.length > 0) throw problemsError(schemaProblems, source);
  return tree;
}

/**
 * The last step: the Config from a checked tree (to-config.ts), with the rules' globs compiled by
 * `globs`. @throws InputError for what the schema cannot say (a bad glob, window < min-runs, ...).
 * @example configFromTree(checkedConfigTree(readYamlTree('keep: 900\n'), 'b.yml')!, 'b.yml', exactNameCompiler).keep // 900
 */
export function configFromTree(tree: YamlTree, source: string, globs: GlobCompiler): Config {
  const built = toConfig(tree.value, tree, source, globs);
  if (built.problems.length > 0) throw problemsError(built.problems, source);
  return built.config;
}

/**
 * Whether any `metrics:` rule or `groups:` entry of a checked tree has a glob that is more than a
 * plain name (a group without `match` means "name/**"), so the glob library must be loaded.
 * @example needsGlobLibrary({ metrics: [{ match: 'latency/render' }] }) // false
 */
export function needsGlobLibrary(value: unknown): boolean {
  const root = (value ?? {}) as Data;
  const rules = (root.metrics ?? []) as Data[];
  const groups = (root.groups ?? []) as Data[];
  return (
    rules.some((rule) => !exactMatcher(globList(rule.match))) ||
    groups.some((group) => group.match === undefined || !exactMatcher(globList(group.match)))
  );
}
