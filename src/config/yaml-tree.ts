import { Composer, LineCounter, Parser, isAlias, isMap, isScalar, isSeq, type Document, type Node } from 'yaml';
import type { ConfigProblem } from './problems.js';
import { pointerSegment, type Position, type YamlTree } from './tree.js';
import {
  MAX_ALIAS_COUNT,
  MAX_CONFIG_CHARS,
  MAX_CONFIG_DEPTH,
  MAX_CONFIG_VALUES,
  checkTokenLimits,
  prescanShape,
} from './yaml-limits.js';

/** Thrown inside the builder to stop at a limit; turned into a problem by readYamlTree. */
class Stop {
  constructor(readonly problem: ConfigProblem) {}
}

/**
 * Parses YAML text into plain data under hard limits (size, depth, scalar length, alias uses and
 * expanded values), keeping the line:column of every key and value. Never throws for bad text:
 * problems come back in the list, and `tree` is undefined when any was found.
 * Keys are kept as own properties of null-prototype objects, so `__proto__` is just a key.
 * @example readYamlTree('cutoff: 0.05\n').tree?.value // { cutoff: 0.05 }
 */
export function readYamlTree(text: string): { tree?: YamlTree; problems: ConfigProblem[] } {
  if (text.length > MAX_CONFIG_CHARS) {
    return {
      problems: [
        {
          line: 1,
          col: 1,
          message: `the config is ${text.length} characters; the limit is ${MAX_CONFIG_CHARS} (1 MiB)`,
          fix: 'a Bellgate config is a few kilobytes; check that the right file is named',
        },
      ],
    };
  }
  const deep = prescanShape(text);
  if (deep) return { problems: [deep] };
  const counter = new LineCounter();
  let docs: Document.Parsed[];
  try {
    const tokens = [...new Parser(counter.addNewLine).parse(text)];
    const tooBig = checkTokenLimits(tokens, counter);
    if (tooBig) return { problems: [tooBig] };
    docs = [...new Composer({ uniqueKeys: false, merge: false, strict: true }).compose(tokens, true, text.length)];
  } catch (err) {
    // The YAML library reports problems in doc.errors; a throw would be its own bug, still shown as bad input.
    return {
      problems: [
        {
          line: 1,
          col: 1,
          message: `the YAML could not be read (${(err as Error).message})`,
          fix: 'simplify the file',
        },
      ],
    };
  }
  const problems: ConfigProblem[] = [];
  const at = (offset: number): Position => counter.linePos(offset);
  for (const doc of docs) {
    for (const issue of [...doc.errors, ...doc.warnings]) {
      problems.push({
        ...at(issue.pos[0]),
        message: firstLine(issue.message),
        fix: 'write valid YAML (see https://yaml.org/spec/1.2.2/)',
      });
    }
  }
  if (docs.length > 1) {
    const second = docs[1]!;
    problems.push({
      ...at(second.range[0]),
      message: `the file holds ${docs.length} YAML documents; a config is one`,
      fix: 'remove the "---" separator and merge the documents',
    });
  }
  const doc = docs.length === 1 ? docs[0] : undefined;
  const tree: YamlTree = { value: undefined, valueAt: new Map(), keyAt: new Map() };
  // Built even when the parser complained, so duplicate keys are reported with syntax errors.
  if (doc !== undefined && doc.contents !== null) {
    try {
      tree.value = buildValue(doc, doc.contents, tree, at, problems);
    } catch (err) {
      if (!(err instanceof Stop)) throw err;
      problems.push(err.problem);
    }
    problems.push(...collectNonFinite(tree));
  }
  return problems.length > 0 ? { problems } : { tree, problems };
}

function firstLine(message: string): string {
  return message.split('\n')[0]!.trim();
}

// Duplicate keys are found here with a Set: the YAML library's own check (uniqueKeys) compares
// every pair of keys, which takes seconds on a few thousand keys.
function buildValue(
  doc: Document,
  root: Node,
  tree: YamlTree,
  at: (offset: number) => Position,
  problems: ConfigProblem[],
): unknown {
  let values = 0;
  let aliases = 0;
  const build = (node: Node, pointer: string, depth: number): unknown => {
    const pos = at(node.range?.[0] ?? 0);
    if (++values > MAX_CONFIG_VALUES || depth > MAX_CONFIG_DEPTH) {
      const what =
        values > MAX_CONFIG_VALUES
          ? `more than ${MAX_CONFIG_VALUES} values`
          : `nesting deeper than ${MAX_CONFIG_DEPTH} levels`;
      throw new Stop({
        ...pos,
        message: `the config expands to ${what}`,
        fix: 'use fewer aliases (*name); a config needs a few hundred values at most',
      });
    }
    if (!tree.valueAt.has(pointer)) tree.valueAt.set(pointer, pos);
    if (isAlias(node)) {
      if (++aliases > MAX_ALIAS_COUNT) {
        throw new Stop({
          ...pos,
          message: `more than ${MAX_ALIAS_COUNT} aliases (*name)`,
          fix: 'repeat the values instead of aliasing them',
        });
      }
      const target = node.resolve(doc);
      if (target === undefined)
        throw new Stop({
          ...pos,
          message: `alias *${node.source} names no anchor`,
          fix: `define &${node.source} before using it`,
        });
      return build(target, pointer, depth + 1);
    }
    if (isScalar(node)) return node.value;
    if (isSeq(node)) return node.items.map((item, i) => build(item as Node, `${pointer}/${i}`, depth + 1));
    if (isMap(node)) {
      const out: Record<string, unknown> = Object.create(null);
      for (const pair of node.items) {
        const keyNode = pair.key as Node | null;
        const keyPos = at(keyNode?.range?.[0] ?? node.range?.[0] ?? 0);
        const key = isScalar(keyNode) ? keyNode.value : undefined;
        if (typeof key !== 'string' && typeof key !== 'number') {
          throw new Stop({
            ...keyPos,
            message: 'a key must be a plain name',
            fix: 'write keys like "cutoff:"; lists and mappings cannot be keys',
          });
        }
        if (Object.hasOwn(out, String(key))) {
          problems.push({
            ...keyPos,
            message: `the key ${JSON.stringify(String(key))} appears twice in one mapping`,
            fix: 'keep one of the two entries',
          });
          continue;
        }
        const child = `${pointer}/${pointerSegment(key)}`;
        tree.keyAt.set(child, keyPos);
        const value = pair.value === null ? null : build(pair.value as Node, child, depth + 1);
        if (pair.value === null) tree.valueAt.set(child, keyPos);
        out[String(key)] = value;
      }
      return out;
    }
    throw new Stop({ ...pos, message: 'unsupported YAML node', fix: 'write plain mappings, lists and scalars' });
  };
  return build(root, '', 0);
}

/** YAML spells infinity and not-a-number (.inf, .nan); no setting accepts them. */
function collectNonFinite(tree: YamlTree): ConfigProblem[] {
  const problems: ConfigProblem[] = [];
  const walk = (value: unknown, pointer: string): void => {
    if (typeof value === 'number' && !Number.isFinite(value)) {
      const pos = tree.valueAt.get(pointer) ?? { line: 1, col: 1 };
      problems.push({
        ...pos,
        message: `${value > 0 ? '.inf' : value < 0 ? '-.inf' : '.nan'} is not a finite number`,
        fix: 'write an ordinary number',
      });
    } else if (Array.isArray(value)) {
      value.forEach((item, i) => walk(item, `${pointer}/${i}`));
    } else if (value !== null && typeof value === 'object') {
      for (const [key, item] of Object.entries(value)) walk(item, `${pointer}/${pointerSegment(key)}`);
    }
  };
  walk(tree.value, '');
  return problems;
}
