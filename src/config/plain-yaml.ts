import { pointerSegment, type Position, type YamlTree } from './tree.js';

/** Longest text the recogniser reads; a plain config is a few kilobytes, anything larger goes to the library. */
const MAX_PLAIN_CHARS = 64 * 1024;
/** Longest line; far below the library's 16 KiB scalar limit. */
const MAX_PLAIN_LINE = 1024;
/** Most keys; below the library's 5,000-entry limit (yaml-limits.ts). */
const MAX_PLAIN_KEYS = 4000;
/** Most nested mappings; below the library's 32 levels (yaml-limits.ts). */
const MAX_PLAIN_DEPTH = 24;

/** Anything but printable ASCII and "\n" (tabs, "\r", control and non-ASCII characters). */
const OUTSIDE_SUBSET = /[^\n\x20-\x7e]/;
/** A blank line or a comment line. */
const SKIPPED = /^ *(?:#.*)?$/;
/** `indent key:rest`: the key a plain name, right before the colon. */
const KEY_LINE = /^( *)([A-Za-z_][A-Za-z0-9_-]*):(.*)$/;
/** What follows `key:` when a nested mapping comes next: nothing, spaces, or a ` #` comment. */
const NO_SCALAR = /^(?: +(?:#.*)?)?$/;
/** What follows `key:` when it holds a scalar: spaces, words of safe characters, then maybe a ` #` comment. */
const SCALAR = /^( +)([A-Za-z0-9_./%+-]+(?: +[A-Za-z0-9_./%+-]+)*)(?: +(?:#.*)?)?$/;
/** Numbers in JSON's spelling, which YAML 1.2's core schema reads the same way. */
const NUMBER = /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:[eE][-+]?[0-9]+)?$/;
const PERCENT = /^[0-9]+(?:\.[0-9]+)?%$/;
const WORD = /^[A-Za-z]/;
/** Words the core schema reads as null or as booleans other than `true`/`false`. */
const NOT_A_STRING = new Set(['null', 'Null', 'NULL', 'True', 'TRUE', 'False', 'FALSE']);

interface Level {
  indent: number;
  map: Record<string, unknown>;
  pointer: string;
}

/**
 * Reads the plain subset of YAML most configs are written in — block mappings of mappings, indented
 * by spaces, whose leaves are numbers (JSON spelling), `true`/`false`, words starting with a letter
 * or `2%`-style percentages, with blank lines and `#` comments — without loading the YAML library.
 * Gives exactly the tree readYamlTree (yaml-tree.ts) builds: same values in null-prototype objects,
 * same key order and line:col of every key and value. Returns undefined ("decline") for anything
 * else — lists, quotes, flow collections, tabs, "\r", non-ASCII, anchors, tags, block scalars,
 * directives, null values, duplicate keys, other spellings of numbers or booleans, over 64 KiB —
 * and the caller then reads the text with the library, which stays the reference and says what is
 * wrong. Declining is always correct; the recogniser only has to be right when it answers.
 * @example readPlainYaml('defaults:\n  tolerance: 2%\n')?.value // { defaults: { tolerance: '2%' } }
 * @example readPlainYaml('metrics:\n  - match: a\n') // undefined (a list)
 */
export function readPlainYaml(text: string): YamlTree | undefined {
  if (text.length > MAX_PLAIN_CHARS || OUTSIDE_SUBSET.test(text)) return undefined;
  const tree: YamlTree = { value: undefined, valueAt: new Map(), keyAt: new Map() };
  const levels: Level[] = [];
  // A `key:` without a scalar, waiting for its nested mapping on a later line.
  let open: { parent: Level; key: string; pointer: string } | undefined;
  let keys = 0;
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.length > MAX_PLAIN_LINE) return undefined;
    if (SKIPPED.test(line)) continue;
    const found = KEY_LINE.exec(line);
    if (found === null || ++keys > MAX_PLAIN_KEYS) return undefined;
    const indent = found[1]!.length;
    const key = found[2]!;
    const rest = found[3]!;
    const at: Position = { line: i + 1, col: indent + 1 };
    if (levels.length === 0) {
      if (indent !== 0) return undefined;
      levels.push({ indent, map: Object.create(null) as Record<string, unknown>, pointer: '' });
      tree.value = levels[0]!.map;
      tree.valueAt.set('', at);
    } else if (open !== undefined) {
      if (indent <= open.parent.indent || levels.length >= MAX_PLAIN_DEPTH) return undefined;
      const level: Level = { indent, map: Object.create(null) as Record<string, unknown>, pointer: open.pointer };
      open.parent.map[open.key] = level.map;
      tree.valueAt.set(open.pointer, at);
      levels.push(level);
      open = undefined;
    } else {
      while (levels[levels.length - 1]!.indent > indent) levels.pop();
      // Deeper than the mapping after a scalar (a continuation line), or between two levels: decline.
      if (levels.length === 0 || levels[levels.length - 1]!.indent !== indent) return undefined;
    }
    const level = levels[levels.length - 1]!;
    if (NOT_A_STRING.has(key) || key === 'true' || key === 'false' || Object.hasOwn(level.map, key)) return undefined;
    const pointer = `${level.pointer}/${pointerSegment(key)}`;
    tree.keyAt.set(pointer, at);
    if (NO_SCALAR.test(rest)) {
      open = { parent: level, key, pointer };
      continue;
    }
    const scalar = SCALAR.exec(rest);
    if (scalar === null) return undefined;
    const value = plainScalar(scalar[2]!);
    if (value === undefined) return undefined;
    level.map[key] = value;
    tree.valueAt.set(pointer, { line: i + 1, col: indent + key.length + 1 + scalar[1]!.length + 1 });
  }
  // A last `key:` with nothing under it is null, which the library reads.
  return open === undefined ? tree : undefined;
}

/** The value of a plain scalar in the accepted spellings, or undefined to decline. */
function plainScalar(source: string): string | number | boolean | undefined {
  if (NUMBER.test(source)) {
    // At most 15 significant digits, so the library's parseInt/parseFloat and Number agree exactly.
    if (source.replace(/[eE].*$/, '').replace(/[^0-9]/g, '').length > 15) return undefined;
    const value = Number(source);
    return Number.isFinite(value) ? value : undefined;
  }
  if (source === 'true' || source === 'false') return source === 'true';
  if (PERCENT.test(source)) return source;
  if (WORD.test(source) && !NOT_A_STRING.has(source)) return source;
  return undefined;
}
