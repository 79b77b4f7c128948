import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { parseHistory, parseHistoryBytes, serializeHistory } from '../../src/history/document.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { historyArbitrary } from './arbitraries.js';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/history/${name}`, import.meta.url), 'utf8');

/** Runs `fn`, expects an InputError, and returns it for further checks. */
function inputError(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  return expect.fail('expected an InputError');
}

const v2 = (body: Record<string, unknown>): string =>
  JSON.stringify({
    schema: 'bellgate.history/2',
    series: 's',
    runs: { id: ['1', '2'] },
    metrics: { names: ['m'], values: [[1, 2]] },
    ...body,
  });

describe('parseHistory / serializeHistory', () => {
  it('reads the hand-written version-2 fixture as the layout documented in document.ts', () => {
    const h = parseHistory(fixture('v2-small.json'), 'v2-small.json');
    expect(h.series).toBe('linux-x64');
    expect(h.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-2', '8104-1']);
    expect(h.runs[3]).toEqual({ id: '8104-1', event: 'workflow_dispatch', time: '2026-03-03T09:15:00.000Z' });
    expect(h.columns.get('route/match-static')).toEqual({ unit: 'ns', values: [412.5, NaN, 409.1, NaN] });
    expect(h.columns.get('tiles/render-p95')).toEqual({ values: [NaN, NaN, 0.0183, 0.0179] });
    // The writer reproduces the documented layout byte for byte (fixture written by hand).
    expect(serializeHistory(h)).toBe(fixture('v2-small.json'));
  });

  it('migrates: the version-1 fixture reads to the same History as its version-2 form', () => {
    const fromV1 = parseHistory(fixture('v1-small.json'), 'v1-small.json');
    const fromV2 = parseHistory(fixture('v2-small.json'), 'v2-small.json');
    expect(fromV1).toEqual(fromV2);
    expect([...fromV1.columns.keys()]).toEqual([...fromV2.columns.keys()]);
    // and writing the migrated history gives the version-2 document
    expect(serializeHistory(fromV1)).toBe(fixture('v2-small.json'));
  });

  it('round-trips any History through version 2 exactly (fast-check), NaN as missing', () => {
    fc.assert(
      fc.property(historyArbitrary(), (h) => {
        const back = parseHistory(serializeHistory(h), 'h.json');
        expect(back).toEqual(h);
        expect([...back.columns.keys()]).toEqual([...h.columns.keys()]);
      }),
      { numRuns: 200 },
    );
  });

  it('keeps IEEE-754 extremes exactly: Number.MAX_VALUE, the smallest subnormal 5e-324, -0 read as 0', () => {
    // ECMA-262 Number.MAX_VALUE = 1.7976931348623157e308, Number.MIN_VALUE = 5e-324 (IEEE 754 binary64).
    const h: History = {
      series: 's',
      runs: [{ id: 'a' }, { id: 'b' }, { id: 'c' }],
      columns: new Map([['x', { values: [1.7976931348623157e308, 5e-324, 0.1] }]]),
    };
    const back = parseHistory(serializeHistory(h), 'h.json');
    expect(back.columns.get('x')?.values).toEqual([Number.MAX_VALUE, Number.MIN_VALUE, 0.1]);
  });

  it('keeps hostile metric names (__proto__, constructor) in a Map through both versions', () => {
    const h: History = {
      series: 's',
      runs: [{ id: '1' }],
      columns: new Map([
        ['__proto__', { unit: 'ms', values: [3] }],
        ['constructor', { values: [4] }],
        ['toString', { values: [NaN] }],
      ]),
    };
    const back = parseHistory(serializeHistory(h), 'h.json');
    expect([...back.columns.keys()]).toEqual(['__proto__', 'constructor', 'toString']);
    expect(back.columns.get('__proto__')).toEqual({ unit: 'ms', values: [3] });
    const v1 =
      '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"1","values":{"__proto__":3,"constructor":4},"units":{"__proto__":"ms"}}]}';
    const fromV1 = parseHistory(v1, 'v1.json');
    expect(fromV1.columns.get('__proto__')).toEqual({ unit: 'ms', values: [3] });
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('reads a document with a byte-order mark and without the optional columns', () => {
    const h = parseHistory(
      '\uFEFF{"schema":"bellgate.history/2","series":"s","runs":{"id":["1"]},"metrics":{"names":["m"],"values":[[null]]}}',
      'h.json',
    );
    expect(h).toEqual({ series: 's', runs: [{ id: '1' }], columns: new Map([['m', { values: [NaN] }]]) });
    expect(serializeHistory(emptyHistory('e'))).toContain('"runs":{"id":[],"sha":[],"ref":[],"event":[],"time":[]}');
  });

  describe('hostile documents: InputError naming source and place', () => {
    const cases: Array<[string, string, RegExp, RegExp]> = [
      // cut after 200 characters: line 1 plus its newline is 53, so 147 characters of line 2 remain
      // and the input ends at line 2, column 148 (1-based, just past the last character)
      ['truncated JSON', fixture('v2-small.json').slice(0, 200), /^h\.json:2:148$/, /not valid JSON/],
      ['empty file', '', /^h\.json:1:1$/, /not valid JSON/],
      ['newer version', v2({ schema: 'bellgate.history/3' }), /^h\.json at schema$/, /newer Bellgate/],
      [
        'unknown version',
        v2({ schema: 'bellgate.history/0' }),
        /^h\.json at schema$/,
        /unknown history document version 0/,
      ],
      ['no schema', '{"series":"s"}', /^h\.json at schema$/, /not a Bellgate history document/],
      ['foreign schema', v2({ schema: 'other/2' }), /^h\.json at schema$/, /not a Bellgate history document/],
      ['not an object', '[1,2]', /^h\.json$/, /must be a JSON object/],
      ['duplicated run id', v2({ runs: { id: ['1', '1'] } }), /^h\.json at runs\.id\[1\]$/, /appears twice/],
      [
        'NaN written as a string',
        v2({ metrics: { names: ['m'], values: [[1, 'NaN']] } }),
        /at metrics\.values\[0\]\[1\]$/,
        /number or null/,
      ],
      [
        'Infinity written as a string',
        v2({ metrics: { names: ['m'], values: [['Infinity', 1]] } }),
        /at metrics\.values\[0\]\[0\]$/,
        /number or null/,
      ],
      ['wrong type of series', v2({ series: 7 }), /at series$/, /series must be a string/],
      [
        'ragged column',
        v2({ metrics: { names: ['m'], values: [[1]] } }),
        /at metrics\.values\[0\]$/,
        /one entry per run \(2\)/,
      ],
      [
        'values not matching names',
        v2({ metrics: { names: ['m', 'n'], values: [[1, 2]] } }),
        /at metrics\.values$/,
        /one column per name/,
      ],
      [
        'units too short',
        v2({ metrics: { names: ['m'], units: [], values: [[1, 2]] } }),
        /at metrics\.units$/,
        /as long as metrics\.names/,
      ],
      [
        'number as unit',
        v2({ metrics: { names: ['m'], units: [5], values: [[1, 2]] } }),
        /at metrics\.units\[0\]$/,
        /unit must be a string/,
      ],
      [
        'duplicated metric name',
        v2({
          metrics: {
            names: ['m', 'm'],
            values: [
              [1, 2],
              [3, 4],
            ],
          },
        }),
        /at metrics\.names\[1\]$/,
        /appears twice/,
      ],
      ['sha column too short', v2({ runs: { id: ['1', '2'], sha: ['a'] } }), /at runs\.sha$/, /as long as runs\.id/],
      ['empty run id', v2({ runs: { id: ['1', ''] } }), /at runs\.id\[1\]$/, /non-empty string/],
      ['runs as an array in version 2', v2({ runs: [] }), /at runs$/, /object of columns/],
      [
        'version-1 value as text',
        '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"1","values":{"a/b":"12"}}]}',
        /at runs\[0\]\.values\["a\/b"\]$/,
        /finite number or null/,
      ],
      [
        'version-1 duplicated id',
        '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"1","values":{}},{"id":"1","values":{}}]}',
        /at runs\[1\]\.id$/,
        /appears twice/,
      ],
    ];
    for (const [title, text, where, message] of cases) {
      it(title, () => {
        const error = inputError(() => parseHistory(text, 'h.json'));
        expect(error.where).toMatch(where);
        expect(error.message).toMatch(message);
        expect(error.describe()).toContain('fix:');
      });
    }

    it('an overflowing literal 1e999 (JSON.parse gives Infinity, RFC 8259 section 6) is refused with its place', () => {
      const text = v2({}).replace('[[1,2]]', '[[1,1e999]]');
      const error = inputError(() => parseHistory(text, 'h.json'));
      expect(error.where).toBe('h.json at metrics.values[0][1]');
      expect(error.message).toMatch(/not finite/);
    });

    it('the bytes reader (byte scan, then only row lengths checked) refuses every broken document as the text reader does', () => {
      // The reference is parseHistory, which JSON.parses the whole text and checks every entry.
      const texts = [
        ...cases.map(([, text]) => text),
        v2({}).replace('[[1,2]]', '[[1,1e999]]'),
        v2({}).replace('[[1,2]]', '[[1,-1e999]]'),
        v2({ metrics: { names: ['a', 'b'], values: [[1, 2], [3]] } }),
        v2({
          metrics: {
            names: ['a', 'b'],
            values: [
              [1, 2],
              [3, 4, 5],
            ],
          },
        }),
        v2({ metrics: { names: ['a'], values: [[1, 1e308]] } }).replace('1e+308', '1e309'),
      ];
      for (const text of texts) {
        const expected = inputError(() => parseHistory(text, 'h.json'));
        const error = inputError(() => parseHistoryBytes(new TextEncoder().encode(text), 'h.json'));
        expect([error.message, error.where, error.fix]).toEqual([expected.message, expected.where, expected.fix]);
      }
    });

    it('arbitrary text throws only InputError (fast-check)', () => {
      fc.assert(
        fc.property(
          fc.oneof(
            fc.string(),
            fc.json(),
            fc.jsonValue().map((v) =>
              JSON.stringify({
                schema: 'bellgate.history/2',
                ...(typeof v === 'object' && v !== null && !Array.isArray(v) ? v : { runs: v }),
              }),
            ),
          ),
          (text) => {
            try {
              parseHistory(text, 'h.json');
            } catch (error) {
              expect(error).toBeInstanceOf(InputError);
            }
          },
        ),
        { numRuns: 500 },
      );
    });

    it('mutated valid documents throw only InputError (fast-check)', () => {
      const base = fixture('v2-small.json');
      fc.assert(
        fc.property(fc.nat(base.length), fc.nat(base.length), fc.string({ maxLength: 4 }), (a, b, insert) => {
          const text = base.slice(0, Math.min(a, b)) + insert + base.slice(Math.max(a, b));
          try {
            parseHistory(text, 'h.json');
          } catch (error) {
            expect(error).toBeInstanceOf(InputError);
          }
        }),
        { numRuns: 500 },
      );
    });
  });

  it('refuses to serialize an inconsistent History (never stores a broken document)', () => {
    const ragged: History = { series: 's', runs: [{ id: '1' }], columns: new Map([['m', { values: [1, 2] }]]) };
    expect(inputError(() => serializeHistory(ragged)).message).toMatch(/2 values for 1 runs/);
    const infinite: History = { series: 's', runs: [{ id: '1' }], columns: new Map([['m', { values: [Infinity] }]]) };
    expect(inputError(() => serializeHistory(infinite)).message).toMatch(/Infinity/);
    const twice: History = { series: 's', runs: [{ id: '1' }, { id: '1' }], columns: new Map() };
    expect(inputError(() => serializeHistory(twice)).message).toMatch(/appears twice/);
  });
});
