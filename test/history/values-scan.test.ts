// The fast reader of history bytes must mean exactly what JSON.parse means (the reference here is
// the JavaScript engine's own JSON.parse, ECMA-262 §25.5.1): for every text it either returns
// undefined (the caller then uses JSON.parse) or the same document, with null read as NaN.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scanHistoryBytes } from '../../src/history/values-scan.js';

const bytesOf = (text: string): Uint8Array => new TextEncoder().encode(text);

/** JSON.parse's reading of the document with null in the values rows shown as NaN, as the scan gives it. */
function reference(text: string): unknown {
  const root = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text) as { metrics?: { values?: unknown } };
  const values = root.metrics?.values;
  if (Array.isArray(values))
    root.metrics!.values = values.map((row) => (Array.isArray(row) ? row.map((v) => (v === null ? NaN : v)) : row));
  return root;
}

function parsesLikeJson(text: string): void {
  const scanned = scanHistoryBytes(bytesOf(text));
  let expected: unknown;
  try {
    expected = reference(text);
  } catch {
    // JSON.parse refuses it, so the scan must leave it to JSON.parse (which explains the problem).
    expect(scanned).toBeUndefined();
    return;
  }
  if (scanned !== undefined) expect(scanned.root).toStrictEqual(expected);
}

const space = fc.constantFrom('', ' ', '\n', '\t', '\r\n', '  ');
/** Any double JSON can carry, written the ways people and programs write numbers. */
const numberText = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => JSON.stringify(x)),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => x.toExponential()),
  fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }).map((x) => x.toFixed(6)),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => x.toPrecision(17)),
  fc.integer().map(String),
  fc.constantFrom(
    '0',
    '-0',
    '0.0',
    '-0.0',
    '1E5',
    '1e-300',
    '5e-324',
    '1.7976931348623157e308',
    '1e999',
    '-1e999',
    '123456789012345678901234567890',
    '0.1000000000000000055511151231257827',
    '9007199254740993',
    '0.30000000000000004',
  ),
);
const cell = fc.oneof({ weight: 6, arbitrary: numberText }, { weight: 1, arbitrary: fc.constant('null') });
const row = fc
  .array(fc.tuple(space, cell, space), { maxLength: 12 })
  .map((cells) => `[${cells.map(([a, c, b]) => a + c + b).join(',')}]`);
const nameText = fc.oneof(
  fc.string(),
  fc.constantFrom('__proto__', 'values', 'metrics', '"values":[[1]]', 'é/ü', '\u2028', '\\'),
);

const documentText = fc
  .record({
    rows: fc.array(fc.tuple(space, row, space), { maxLength: 6 }),
    names: fc.array(nameText, { maxLength: 6 }),
    series: nameText,
    before: space,
    order: fc.boolean(),
  })
  .map(({ rows, names, series, before, order }) => {
    const values = `"values":${before}[${rows.map(([a, r, b]) => a + r + b).join(',')}]`;
    const namesPart = `"names":${JSON.stringify(names)}`;
    const metrics = order ? `{${namesPart},${values}}` : `{${values}, ${namesPart}}`;
    return `{"schema":"bellgate.history/2","series":${JSON.stringify(series)},\n"runs":{"id":["a"]},${before}"metrics":${metrics}}${before}`;
  });

describe('scanHistoryBytes', () => {
  it('reads a document Bellgate writes the way JSON.parse does (rows of doubles, null as NaN)', () => {
    const text =
      '{"schema":"bellgate.history/2","series":"s",\n"runs":{"id":["1","2"]},\n"metrics":{"names":["a","b"],"units":["ms",null],"values":[\n[12.5,null],\n[-0,1e-300]]}}\n';
    const scanned = scanHistoryBytes(bytesOf(text))!;
    expect(scanned.root).toStrictEqual(reference(text));
    expect(Object.is((scanned.root as { metrics: { values: number[][] } }).metrics.values[1]![0], -0)).toBe(true);
    // rowEnds point at each row's closing bracket, so an append can splice before it.
    expect(scanned.rowEnds.map((at) => text[at])).toEqual([']', ']']);
    expect(text.slice(scanned.valuesStart, scanned.valuesEnd)).toBe('[\n[12.5,null],\n[-0,1e-300]]');
  });

  it('agrees with JSON.parse on every generated document (numbers written many ways, odd spacing, hostile names)', () => {
    fc.assert(fc.property(documentText, parsesLikeJson), { numRuns: 2000 });
  });

  it('reads every double back bit for bit, through the exact fast path and the Number() path alike', () => {
    fc.assert(
      fc.property(fc.array(numberText, { minLength: 1, maxLength: 40 }), (cells) => {
        const text = `{"metrics":{"values":[[${cells.join(',')}]]}}`;
        const rowRead = (scanHistoryBytes(bytesOf(text))!.root as { metrics: { values: number[][] } }).metrics
          .values[0]!;
        cells.forEach((c, i) => expect(Object.is(rowRead[i], JSON.parse(c))).toBe(true));
      }),
      { numRuns: 3000 },
    );
  });

  it('says its rows are all finite (or NaN for null) exactly when JSON.parse finds no infinite value in them', () => {
    fc.assert(
      fc.property(fc.array(fc.array(cell, { maxLength: 6 }), { minLength: 1, maxLength: 5 }), (rows) => {
        const text = `{"metrics":{"values":[${rows.map((r) => `[${r.join(',')}]`).join(',\n')}]}}`;
        const scanned = scanHistoryBytes(bytesOf(text))!;
        const parsed = JSON.parse(text) as { metrics: { values: (number | null)[][] } };
        const infinite = parsed.metrics.values.some((row) => row.some((v) => v === Infinity || v === -Infinity));
        expect(scanned.finite).toBe(!infinite);
      }),
      { numRuns: 2000 },
    );
  });

  it('never accepts a text JSON.parse refuses, and never reads one differently (random damage)', () => {
    fc.assert(
      fc.property(
        documentText,
        fc.nat(),
        fc.constantFrom('', '"', ',', '[', ']', '{', '}', '\\', 'x', '1', 'n', ':', '-', '.', 'e'),
        (text, at, insert) => {
          const i = at % (text.length + 1);
          parsesLikeJson(text.slice(0, i) + insert + text.slice(i + (at % 3 === 0 ? 1 : 0)));
        },
      ),
      { numRuns: 4000 },
    );
  });

  it('compact rows of valid and broken number tokens read as JSON.parse reads them, or are left to it', () => {
    // Rows without spaces take the reader's short road (plainRow); broken tokens must still be refused.
    const token = fc.oneof(
      numberText,
      fc.constantFrom(
        'null',
        'nul',
        'nulll',
        '-',
        '--1',
        '01',
        '1.',
        '.5',
        '1e',
        '1e+',
        '+1',
        '0x1',
        '1.2.3',
        '',
        '-0',
        '0.000001',
        '999999999999999',
        '9999999999999999',
        'true',
        '"1"',
      ),
    );
    fc.assert(
      fc.property(fc.array(token, { maxLength: 8 }), fc.boolean(), (cells, trailingComma) => {
        parsesLikeJson(
          `{"metrics":{"values":[[${cells.join(',')}${trailingComma ? ',' : ''}],[${cells.slice().reverse().join(',')}]]}}`,
        );
      }),
      { numRuns: 3000 },
    );
  });

  it('leaves unusual but valid shapes to JSON.parse: escaped or repeated keys, strings in rows, BOM', () => {
    const cases = [
      '{"metrics":{"val\\u0075es":[[1]]}}',
      '{"metrics":{"values":[[1]],"values":[[2]]}}',
      '{"metrics":{"values":[[1]]},"metrics":{"values":[[2]]}}',
      '{"metrics":{"values":[["1"]]}}',
      '{"metrics":{"values":[[[1]]]}}',
      '{"metrics":{"values":{"a":[1]}}}',
      '{"metrics":[1]}',
      '[1,2]',
      '',
    ];
    for (const text of cases) {
      expect(scanHistoryBytes(bytesOf(text))).toBeUndefined();
      parsesLikeJson(text);
    }
    const withMark = '\ufeff{"metrics":{"values":[[1,null]]}}';
    expect(scanHistoryBytes(bytesOf(withMark))?.root).toStrictEqual({ metrics: { values: [[1, NaN]] } });
  });
});
