import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { collectRun } from '../../src/inputs/collect.js';
import { readCsvMetrics } from '../../src/inputs/csv.js';
import { readGoBench } from '../../src/inputs/gobench.js';
import { readJsonMetrics } from '../../src/inputs/json.js';
import { readJsonLines } from '../../src/inputs/jsonl.js';
import { readJunit } from '../../src/inputs/junit.js';
import { readOpenMetrics } from '../../src/inputs/openmetrics.js';
import { parseMetricText } from '../../src/inputs/parse.js';
import type { ReadResult } from '../../src/inputs/run.js';
import { InputError } from '../../src/errors/input-error.js';

const RUNS = 200;

const readers: [string, (text: string) => ReadResult | Promise<ReadResult>][] = [
  ['json', (t) => readJsonMetrics(t, 'f')],
  ['jsonl', (t) => readJsonLines(t, 'f')],
  ['csv', (t) => readCsvMetrics(t, 'f')],
  ['openmetrics', (t) => readOpenMetrics(t, 'f')],
  ['gobench', (t) => readGoBench(t, 'f')],
  ['junit', (t) => readJunit(t, 'f')],
  ['detected', (t) => parseMetricText(t, 'f')],
];

// Pieces of every format, so random texts get past the first check of each reader.
const tokens = fc.constantFrom(
  '{',
  '}',
  '[',
  ']',
  '"',
  ',',
  ':',
  ' ',
  '\t',
  '\n',
  '\r\n',
  '=',
  '#',
  '# TYPE ',
  '# UNIT ',
  '# EOF',
  '<',
  '>',
  '/',
  '\\',
  '"name"',
  '"value"',
  '"samples"',
  '"metrics"',
  '"unit"',
  'name',
  'value',
  'unit',
  '__proto__',
  'constructor',
  '1',
  '-2.5',
  '1e999',
  'NaN',
  '+Inf',
  '0x1F',
  'ns/op',
  'Benchmark',
  'BenchmarkA-8',
  ' 100 ',
  'goos: x',
  'a_total',
  'le="1"',
  '<testsuite name="s" time="1">',
  '<testcase name="t" time="x"/>',
  '</testsuite>',
  '<skipped/>',
  '&amp;',
  '\u202e',
  '\u0000',
  'é',
);
const soup = fc.array(tokens, { maxLength: 60 }).map((parts) => parts.join(''));
const bytes = fc.uint8Array({ maxLength: 300 }).map((b) => new TextDecoder('utf-8').decode(b));
const anyText = fc.oneof(soup, fc.string({ unit: 'binary', maxLength: 200 }), bytes);

/** Runs a reader: it returns a result whose readings are sound, or throws an InputError. */
async function readOrInputError(read: (text: string) => ReadResult | Promise<ReadResult>, text: string): Promise<void> {
  let result: ReadResult;
  try {
    result = await read(text);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    expect(error.message.length).toBeGreaterThan(0);
    return;
  }
  for (const r of result.readings) {
    expect(Number.isFinite(r.value)).toBe(true);
    expect(r.name.trim()).not.toBe('');
  }
}

describe.each(readers)('reader %s on arbitrary text', (_format, read) => {
  it('returns sound readings or throws InputError, never anything else', async () => {
    await fc.assert(
      fc.asyncProperty(anyText, (text) => readOrInputError(read, text)),
      { numRuns: RUNS },
    );
  });
});

// Names a metric file may carry: anything but the refused characters (names.ts), not blank.
const nameArb = fc
  .string({ unit: 'grapheme', minLength: 1, maxLength: 30 })
  .filter((s) => s.trim() !== '' && !/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/u.test(s));
const unitArb = fc.option(fc.constantFrom('ns', 'ms', 's', 'B', 'KiB', 'ns/op', 'allocs/op', '%', 'req/s', 'µs'), {
  nil: undefined,
});
// -0 is written "0" by every text format; its sign is not a measurement.
const valueArb = fc.double({ noNaN: true, noDefaultInfinity: true }).map((v) => (v === 0 ? 0 : v));
const runArb = fc.uniqueArray(fc.record({ name: nameArb, value: valueArb, unit: unitArb }), {
  selector: (m) => m.name,
  minLength: 1,
  maxLength: 20,
});

type Metric = { name: string; value: number; unit?: string };
const asRun = (result: ReadResult) =>
  [...collectRun([result], () => 'median').metrics].map(([name, m]) => ({ name, value: m.value, unit: m.unit }));
const expected = (metrics: Metric[]) => metrics.map(({ name, value, unit }) => ({ name, value, unit }));

function csvCell(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

describe('round trips: write a run in the format, read it back, same names, values and units', () => {
  it('own JSON, list form', async () => {
    await fc.assert(
      fc.asyncProperty(runArb, async (metrics) => {
        const text = JSON.stringify(
          { metrics: metrics.map(({ name, value, unit }) => ({ name, value, unit })) },
          null,
          2,
        );
        expect(asRun(await parseMetricText(text, 'm.json'))).toEqual(expected(metrics));
      }),
      { numRuns: RUNS },
    );
  });

  it('own JSON, flat form (no units)', () => {
    fc.assert(
      fc.property(runArb, (metrics) => {
        const text = JSON.stringify(Object.fromEntries(metrics.map((m) => [m.name, m.value])));
        // Object.fromEntries defines "__proto__" as an own key, so it is written and must come back.
        const written = metrics;
        // Objects list integer-like keys ("7") first, so compare in name order.
        const byName = (a: Metric, b: Metric) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0);
        expect(asRun(readJsonMetrics(text, 'm.json')).sort(byName)).toEqual(
          written.map(({ name, value }) => ({ name, value, unit: undefined })).sort(byName),
        );
      }),
      { numRuns: RUNS },
    );
  });

  it('JSON Lines', () => {
    fc.assert(
      fc.property(runArb, (metrics) => {
        const text = metrics.map((m) => JSON.stringify(m)).join('\n');
        expect(asRun(readJsonLines(text, 'm.jsonl'))).toEqual(expected(metrics));
      }),
      { numRuns: RUNS },
    );
  });

  it('CSV, long form with RFC 4180 quoting', async () => {
    await fc.assert(
      fc.asyncProperty(runArb, async (metrics) => {
        const rows = metrics.map(({ name, value, unit }) =>
          [csvCell(name), String(value), csvCell(unit ?? '')].join(','),
        );
        const text = ['name,value,unit', ...rows].join('\r\n');
        expect(asRun(await parseMetricText(text, 'm.csv', 'csv'))).toEqual(expected(metrics));
      }),
      { numRuns: RUNS },
    );
  });
});
