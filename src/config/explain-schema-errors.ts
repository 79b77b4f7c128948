import type { ErrorObject } from 'ajv';
import { didYouMean } from './did-you-mean.js';
import type { ConfigProblem } from './problems.js';
import { configSchema } from './schema.js';
import { describeAllowed, describeValue } from './wording.js';
import { pointerSegment, type Position, type YamlTree } from './tree.js';

type SchemaNode = Record<string, unknown>;

const MAX_EXPLAINED = 200;

// The settings are one definition of the schema, used by `defaults` and by every rule.
const SETTING_KEYS = Object.keys(
  ((configSchema.definitions as SchemaNode).settings as SchemaNode).properties as SchemaNode,
);
const RULE_ONLY_KEYS = ['match', 'ignore', 'relative-to'];
const TOP_KEYS = Object.keys(configSchema.properties as SchemaNode);

function segments(pointer: string): string[] {
  return pointer === ''
    ? []
    : pointer
        .slice(1)
        .split('/')
        .map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}

/**
 * A human name for a place in the config: "cutoff (in defaults)", "worse (in metrics rule #2)",
 * "match item #1 (in metrics rule #3)". List positions are 1-based, as people count.
 * @example placeName('/metrics/1/worse') // 'worse (in metrics rule #2)'
 */
export function placeName(pointer: string): string {
  const parts = segments(pointer);
  if (parts.length === 0) return 'the config';
  const section = parts[0]!;
  const entry = section === 'metrics' ? 'metrics rule' : 'groups entry';
  let context = '';
  let rest = parts.slice(1);
  if ((section === 'metrics' || section === 'groups') && rest.length > 0) {
    context = `${entry} #${Number(rest[0]) + 1}`;
    rest = rest.slice(1);
  } else if (rest.length > 0) {
    context = section;
  }
  if (rest.length === 0) return context === '' ? section : context;
  let name = rest[0]!;
  if (rest.length > 1) name += ` item #${Number(rest[1]) + 1}`;
  return `${name} (in ${context})`;
}

function position(tree: YamlTree, pointer: string, key = false): Position {
  for (let p = pointer; ; p = p.slice(0, p.lastIndexOf('/'))) {
    const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
    if (found) return found;
    if (p === '') return { line: 1, col: 1 };
  }
}

function unknownKey(error: ErrorObject, tree: YamlTree): ConfigProblem {
  const key = String((error.params as { additionalProperty: string }).additionalProperty);
  const pointer = `${error.instancePath}/${pointerSegment(key)}`;
  const allowed = Object.keys((error.parentSchema as SchemaNode).properties as SchemaNode);
  const where = error.instancePath === '' ? 'at the top level' : `in ${placeName(error.instancePath)}`;
  const guess = didYouMean(key, allowed);
  let fix = guess ? `did you mean "${guess}"?` : `allowed here: ${allowed.join(', ')}`;
  if (!guess && error.instancePath === '' && SETTING_KEYS.includes(key))
    fix = `"${key}" is a metric setting: put it under defaults: or in a metrics rule`;
  if (!guess && error.instancePath !== '' && TOP_KEYS.includes(key))
    fix = `"${key}" is a top-level key: write it without indentation`;
  if (!guess && error.instancePath === '/defaults' && RULE_ONLY_KEYS.includes(key))
    fix = `"${key}" belongs in a metrics rule (under metrics:), not in defaults`;
  return { ...position(tree, pointer, true), message: `unknown key ${JSON.stringify(key)} ${where}`, fix };
}

function wrongValue(error: ErrorObject, tree: YamlTree): ConfigProblem {
  const node = error.parentSchema as SchemaNode;
  const name = placeName(error.instancePath);
  const allowed = describeAllowed(node);
  const message = `${name} must be ${allowed}; got ${describeValue(error.data)}`;
  let fix: string | undefined;
  if (Array.isArray(node.enum) && typeof error.data === 'string') {
    const values = node.enum.map(String);
    const typed = error.data.toLowerCase();
    // A value with a word added or cut ("holmes", "bonf") is as likely a slip as a typo.
    const guess =
      didYouMean(error.data, values) ??
      values.find((v) => v.length >= 3 && (typed.startsWith(v.toLowerCase()) || v.toLowerCase().startsWith(typed)));
    fix = guess ? `did you mean "${guess}"?` : `write one of ${values.join(', ')}`;
  }
  const data = error.data;
  const wantsNumber = node.type === 'number' || node.type === 'integer' || Array.isArray(node.anyOf);
  if (!fix && typeof data === 'string' && wantsNumber && data.trim() !== '' && Number.isFinite(Number(data))) {
    fix = `write the number without quotes: ${data.trim()}`;
  }
  if (!fix && typeof data === 'string' && node.type === 'boolean' && /^(yes|no|on|off|y|n)$/i.test(data)) {
    fix = `write true or false (YAML 1.2 reads ${data} as text)`;
  }
  if (!fix && Array.isArray(node.examples)) fix = `for example: ${JSON.stringify(node.examples[0])}`;
  if (!fix && node.type === 'array') fix = `write ${name} as a YAML list, one item per line starting with "- "`;
  if (!fix) fix = `change it to ${allowed}`; // every refusal says what to do, even without an example
  return { ...position(tree, error.instancePath), message, fix };
}

/**
 * Turns ajv errors into problems at the line:column of the offending key or value, worded as
 * what is allowed there. Errors inside an `anyOf` (match: string or list; tolerance: number or
 * percent) are folded into one problem, placed at the deepest failing part.
 * @example explainSchemaErrors(schemaErrors(value), tree) // [{ line: 2, col: 3, message: 'unknown key "cuttoff" in defaults', fix: 'did you mean "cutoff"?' }]
 */
export function explainSchemaErrors(errors: readonly ErrorObject[], tree: YamlTree): ConfigProblem[] {
  const problems: ConfigProblem[] = [];
  const branches = errors.filter((e) => e.schemaPath.includes('/anyOf/'));
  // A message lists 20 problems; explaining thousands (a file of unknown keys) only costs time.
  for (const error of errors.slice(0, MAX_EXPLAINED)) {
    if (error.schemaPath.includes('/anyOf/')) continue;
    if (error.keyword === 'additionalProperties') {
      problems.push(unknownKey(error, tree));
    } else if (error.keyword === 'required') {
      const key = String((error.params as { missingProperty: string }).missingProperty);
      problems.push({
        ...position(tree, error.instancePath),
        message: `${placeName(error.instancePath)} has no "${key}"`,
        fix: key === 'match' ? 'add a glob over metric names, e.g. match: "latency/*"' : `add ${key}:`,
      });
    } else if (error.keyword === 'anyOf') {
      const inner = branches
        .filter((b) => b.instancePath.startsWith(`${error.instancePath}/`) && b.keyword !== 'type')
        .concat(branches.filter((b) => b.instancePath.startsWith(`${error.instancePath}/`)))[0];
      problems.push(wrongValue(inner ?? error, tree));
    } else {
      problems.push(wrongValue(error, tree));
    }
  }
  const seen = new Set<string>();
  return problems.filter((p) => {
    const id = `${p.line}:${p.col}:${p.message}`;
    return seen.has(id) ? false : (seen.add(id), true);
  });
}
