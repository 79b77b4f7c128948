import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readPlainYaml } from '../../src/config/plain-yaml.js';
import type { YamlTree } from '../../src/config/tree.js';
import { readYamlTree } from '../../src/config/yaml-tree.js';

// The reference for every check here is the `yaml` npm library (eemeli/yaml 2.x, YAML 1.2 core
// schema) as wrapped by readYamlTree: whenever readPlainYaml answers, its tree must be the one the
// library builds — values (numbers compared with Object.is, so -0 vs 0 shows), null prototypes,
// key order, and the line:col of every key and value.

/** The tree as comparable data: prototypes and numbers made visible, maps as ordered entry lists. */
function shown(tree: YamlTree): unknown {
  const value = (v: unknown): unknown => {
    if (typeof v === 'number') return Object.is(v, -0) ? '<-0>' : `<number ${v}>`;
    if (v === null || typeof v !== 'object') return v;
    expect(Object.getPrototypeOf(v)).toBeNull();
    return Object.entries(v).map(([k, item]) => [k, value(item)]);
  };
  return { value: value(tree.value), valueAt: [...tree.valueAt], keyAt: [...tree.keyAt] };
}

/** readPlainYaml's answer, checked against the library when it gives one; returns whether it answered. */
function agreesWithLibrary(text: string): boolean {
  const plain = readPlainYaml(text);
  if (plain === undefined) return false;
  const reference = readYamlTree(text);
  expect(reference.problems, text).toEqual([]);
  expect(shown(plain), text).toEqual(shown(reference.tree!));
  return true;
}

// ---- generators of plain configs -------------------------------------------------------------

/** Spellings the core schema reads as null or booleans; generated keys and words avoid them. */
const CORE_WORDS = new Set(['null', 'Null', 'NULL', 'true', 'True', 'TRUE', 'false', 'False', 'FALSE']);

const KEY = fc.oneof(
  fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_-]{0,11}$/).filter((k) => !CORE_WORDS.has(k)),
  fc.constantFrom(
    'keep',
    'defaults',
    'cutoff',
    'tolerance',
    'limits',
    'family',
    '__proto__',
    'constructor',
    'yes',
    'no',
    'on',
    'Infinity',
    'NaN',
    'e5',
    'x',
  ),
);

/** Scalars in every accepted spelling (source text as written). */
const ACCEPTED_SCALAR = fc.oneof(
  fc.integer({ min: -1e9, max: 1e9 }).map(String),
  fc.stringMatching(/^-?(0|[1-9][0-9]{0,6})(\.[0-9]{1,6})?([eE][-+]?[0-9]{1,2})?$/),
  fc.constantFrom('0', '-0', '0.0', '-0.0', '1e5', '1E-3', '2.5e+2', '900', '0.01', '1e308', '123456789012345'),
  fc.constantFrom('true', 'false'),
  fc.stringMatching(/^[0-9]{1,3}(\.[0-9]{1,2})?%$/),
  fc
    .stringMatching(/^[A-Za-z][A-Za-z0-9_./%+-]{0,10}( {1,2}[A-Za-z0-9_./%+-]{1,5}){0,2}$/)
    .filter((w) => !CORE_WORDS.has(w)),
  fc.constantFrom(
    'holm',
    'log',
    'json',
    'higher',
    'plug-in',
    'yes',
    'no',
    'on',
    'off',
    'Infinity',
    'NaN',
    'e5',
    'x.y/z',
  ),
);

interface PlainMap {
  entries: Array<[string, string | PlainMap]>;
  indent: number;
}

const MAP: fc.Arbitrary<PlainMap> = fc.letrec<{ map: PlainMap; value: string | PlainMap }>((tie) => ({
  value: fc.oneof({ maxDepth: 4, depthIdentifier: 'plain' }, ACCEPTED_SCALAR, tie('map')),
  map: fc.record({
    entries: fc.uniqueArray(fc.tuple(KEY, tie('value')), { minLength: 1, maxLength: 5, selector: ([k]) => k }),
    indent: fc.integer({ min: 1, max: 4 }),
  }),
})).map;

/** Line decorations: blank and comment lines, spaces after ":", trailing comments. */
const STYLE = fc.record({
  between: fc.array(fc.constantFrom('', '   ', '# note', '  # indented note: with - [odd] "chars"', '#'), {
    maxLength: 2,
  }),
  gap: fc.constantFrom(' ', ' ', '  ', '    '),
  trailing: fc.constantFrom('', '', ' ', '  ', ' # why', '   #', ' #: - [x]'),
});

/** Writes a map as YAML, with decorations drawn from `styles` in turn. */
function write(root: PlainMap, styles: ReadonlyArray<{ between: string[]; gap: string; trailing: string }>): string {
  let n = 0;
  const next = () => styles[n++ % styles.length]!;
  const lines: string[] = [];
  const walk = (map: PlainMap, indent: number): void => {
    for (const [key, value] of map.entries) {
      const style = next();
      lines.push(...style.between);
      const pad = ' '.repeat(indent);
      if (typeof value === 'string') {
        lines.push(`${pad}${key}:${style.gap}${value}${style.trailing}`);
      } else {
        lines.push(`${pad}${key}:${style.trailing}`);
        walk(value, indent + value.indent);
      }
    }
  };
  walk(root, 0);
  return lines.join('\n') + (styles[0]!.trailing.length % 2 === 0 ? '\n' : '');
}

const PLAIN_TEXT = fc
  .tuple(MAP, fc.array(STYLE, { minLength: 1, maxLength: 6 }))
  .map(([map, styles]) => write(map, styles));

// ---- near misses: one declined feature injected ----------------------------------------------

const REJECTED_SCALAR = fc.constantFrom(
  'null',
  'Null',
  'NULL',
  '~',
  'True',
  'TRUE',
  'False',
  'FALSE',
  '0x1F',
  '0o17',
  '.5',
  '1.',
  '+1',
  '1_000',
  '.inf',
  '-.inf',
  '.nan',
  '012',
  '-012',
  '1e400',
  '12345678901234567890',
  '"quoted"',
  "'single'",
  '[a, b]',
  '{a: 1}',
  '&a x',
  '*a',
  '!!str x',
  '|',
  '>',
  'a: b',
  'a #b',
  'a#b',
  'é',
  'tab\there',
  '2 %',
  '%2',
  '-',
  '- x',
  '?',
  '@x',
  '`x`',
  'a,b',
  'x:',
  '1:2',
);

const INSERTS = [
  '\t',
  '\r',
  '\r\n',
  ' ',
  '  ',
  '-',
  '- ',
  '"',
  "'",
  '[',
  ']',
  '{',
  '}',
  ',',
  '&a ',
  '*a',
  '!',
  '|',
  '>',
  '---\n',
  '...\n',
  '%YAML 1.2\n',
  ':',
  ': ',
  ' #',
  '#',
  '?',
  '\u00e9',
  '\u2028',
  '\0',
  'x',
  '\n',
  '\n  ',
  '\n    x',
  '~',
];

const NEAR_MISS = fc.oneof(
  // A rejected scalar spelling in place of an accepted one.
  fc.tuple(MAP, fc.array(STYLE, { minLength: 1, maxLength: 3 }), REJECTED_SCALAR).map(([map, styles, bad]) => {
    const text = write(map, styles);
    return text.replace(/^( *[A-Za-z_][A-Za-z0-9_-]*: +)([A-Za-z0-9][^ #\n]*)/m, (_m, head: string) => head + bad);
  }),
  // A piece inserted anywhere: structure, indentation, comments, scalars.
  fc.tuple(PLAIN_TEXT, fc.nat(), fc.constantFrom(...INSERTS)).map(([text, at, piece]) => {
    const i = at % (text.length + 1);
    return text.slice(0, i) + piece + text.slice(i);
  }),
  // A line duplicated (duplicate key) or moved to another indentation.
  fc.tuple(PLAIN_TEXT, fc.nat(), fc.integer({ min: -3, max: 3 })).map(([text, at, shift]) => {
    const lines = text.split('\n');
    const i = at % lines.length;
    const line = lines[i]!;
    const moved = shift >= 0 ? ' '.repeat(shift) + line : line.replace(new RegExp(`^ {0,${-shift}}`), '');
    lines.splice(i, 1, ...(shift === 0 ? [line, line] : [moved]));
    return lines.join('\n');
  }),
);

describe('readPlainYaml', () => {
  it('reads every generated plain config exactly as the yaml library does', () => {
    fc.assert(
      fc.property(PLAIN_TEXT, (text) => {
        expect(agreesWithLibrary(text), `declined:\n${text}`).toBe(true);
      }),
      { numRuns: 1500, seed: 20261202 },
    );
  });

  it("answers near misses only when its tree is the library's (declining is always allowed)", () => {
    let answered = 0;
    fc.assert(
      fc.property(NEAR_MISS, (text) => {
        if (agreesWithLibrary(text)) answered++;
      }),
      { numRuns: 4000, seed: 7 },
    );
    // The mutations leave some texts plain (a space in a comment); the check above covered those.
    expect(answered).toBeGreaterThan(0);
  });
});

describe('readPlainYaml on written examples', () => {
  it('reads the bench config and plain mappings as the library does', () => {
    for (const text of [
      'keep: 500\n',
      'keep: 1010',
      '# gate settings\nfamily: holm\nkeep: 900\n\ndefaults:   # for every metric\n  cutoff: 0.01\n  window: 60\n  tolerance: 2%\n  change-points: false\n',
      'limits:\n    max-file-bytes: 16777216\n    max-metrics: 1000\ninput-format: json\n',
      'a:\n  b:\n    c: -0\n  # back out\n  d: 1\n',
      '__proto__: 1\nconstructor: x\n',
    ]) {
      expect(agreesWithLibrary(text), text).toBe(true);
    }
  });

  it("gives the library's empty tree for empty and comment-only text", () => {
    for (const text of ['', '\n\n', '# only a comment\n', '  # indented\n\n#\n']) {
      expect(readPlainYaml(text)?.value, JSON.stringify(text)).toBeUndefined();
      expect(agreesWithLibrary(text)).toBe(true);
    }
  });

  it('declines every feature outside the subset', () => {
    const declined = [
      'keep:\t500\n',
      '\tkeep: 500\n',
      'keep: 500\r\n',
      'name: caf\u00e9\n',
      'name: "holm"\n',
      "name: 'holm'\n",
      'match: [a, b]\n',
      'limits: {max-metrics: 5}\n',
      'a: b, c\n',
      'metrics:\n  - match: a\n',
      '- a\n',
      'a: &x 1\nb: *x\n',
      'a: !!str 1\n',
      'a: |\n  text\n',
      'a: >\n  text\n',
      '---\nkeep: 5\n',
      'keep: 5\n...\n',
      '%YAML 1.2\n---\nkeep: 5\n',
      'keep:\n',
      'defaults:\nkeep: 5\n',
      'keep: 5\nkeep: 6\n',
      '1key: 5\n',
      'a.b: 5\n',
      '"keep": 5\n',
      'keep : 5\n',
      'a: b: c\n',
      'a: b:c\n',
      'a: b#c\n',
      'a: ~\n',
      'a: null\n',
      'a: True\n',
      'a: 0x1F\n',
      'a: .5\n',
      'a: 1_000\n',
      'a: .inf\n',
      'a: 012\n',
      'a: 1e400\n',
      'a: +1\n',
      'true: 1\n',
      'null: 1\n',
      'a: 1\n  b: 2\n',
      'a:\n    b: 1\n  c: 2\n',
      '  a: 1\n',
      'a: word\n  continued\n',
      `a: ${'x'.repeat(2000)}\n`,
      `k: 1\n${'# pad\n'.repeat(12_000)}`,
    ];
    for (const text of declined) expect(readPlainYaml(text), JSON.stringify(text.slice(0, 40))).toBeUndefined();
  });
});
