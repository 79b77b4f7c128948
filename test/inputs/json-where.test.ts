import fc from 'fast-check';
import { parseDocument } from 'yaml';
import { describe, expect, it } from 'vitest';
import { jsonValueOffset, whereInJson } from '../../src/inputs/json-where.js';

/** Every path into a JSON value, depth first (object keys, then array indices). */
function pathsOf(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  const out: (string | number)[][] = [prefix];
  if (Array.isArray(value)) value.forEach((item, i) => out.push(...pathsOf(item, [...prefix, i])));
  else if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) out.push(...pathsOf(item, [...prefix, key]));
  }
  return out;
}

describe('jsonValueOffset', () => {
  it('finds the values by hand-counted offsets', () => {
    // Offsets counted by hand in the strings below.
    expect(jsonValueOffset('{"a": [1, 2]}', ['a', 1])).toBe(10);
    expect(jsonValueOffset('{"a": 1, "a": 2}', ['a'])).toBe(14); // JSON.parse keeps the last of two equal keys
    expect(jsonValueOffset('{"k\\"}": {"x": "]"}, "b": [[], {}, "\\\\", 3]}', ['b', 3])).toBe(41);
    expect(jsonValueOffset(' [ ] ', [0])).toBeUndefined();
    expect(jsonValueOffset('{"a": 1}', ['b'])).toBeUndefined();
    expect(jsonValueOffset('{"a": 1}', [0])).toBeUndefined();
    expect(jsonValueOffset('[1, 2]', [2])).toBeUndefined();
    expect(jsonValueOffset('{"__proto__": 5}', ['__proto__'])).toBe(14);
  });

  // The outside reference is the YAML library (YAML 1.2 is a superset of JSON): its node ranges
  // for the same paths, over random JSON documents written compactly and indented.
  it('agrees with the positions the YAML library gives for every path of random JSON', () => {
    let compared = 0;
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 3 }), fc.constantFrom(undefined, 2, '\t'), (value, indent) => {
        const text = JSON.stringify(value, null, indent);
        const doc = parseDocument(text, { uniqueKeys: false, strict: false });
        if (doc.errors.length > 0) return; // a string the YAML reader cannot take: no reference
        for (const path of pathsOf(JSON.parse(text)).slice(0, 40)) {
          const node = doc.getIn(path, true) as { range?: [number, number, number] } | undefined;
          if (!node?.range) continue;
          expect(jsonValueOffset(text, path), JSON.stringify(path)).toBe(node.range[0]);
          compared++;
        }
      }),
      { numRuns: 500, seed: 3 },
    );
    expect(compared, 'most paths must have a reference position').toBeGreaterThan(1000);
  });
});

describe('whereInJson', () => {
  it('gives file:line:col and the path, or the path alone when it is not there', () => {
    // Line 2 is `  "a": [1, "x"]`; the string "x" starts in column 12.
    expect(whereInJson('{\n  "a": [1, "x"]\n}', 'm.json', ['a', 1])).toBe('m.json:2:12 (a[1])');
    expect(whereInJson('{"metrics": []}', 'm.json', ['metrics', 0])).toBe('m.json (metrics[0])');
  });
});
