import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { detectFormat } from '../../src/inputs/detect.js';
import { parseMetricText } from '../../src/inputs/parse.js';

// One fixture per format in test/fixtures/inputs/, each with a hand-written <name>.expected.json
// holding what a reader of that format must find (worked out from the format's rules, not from
// running the code). Where a fixture reproduces a published example, its expected file names it.
const dir = new URL('../fixtures/inputs/', import.meta.url);
const fixtures: [file: string, format: string][] = [
  ['own-list.json', 'json'],
  ['own-flat.json', 'json'],
  ['lines.jsonl', 'jsonl'],
  ['long.csv', 'csv'],
  ['wide.csv', 'csv'],
  ['prometheus-example.prom', 'openmetrics'],
  ['openmetrics-example.om', 'openmetrics'],
  ['go-proposal.txt', 'gobench'],
  ['junit-report.xml', 'junit'],
];

interface Expected {
  readings: { name: string; value: number; unit?: string; where?: string }[];
  notFitted: Record<string, string>;
  meta: Record<string, string>;
}

describe.each(fixtures)('fixture %s', (file, format) => {
  const text = readFileSync(new URL(file, dir), 'utf8');
  const expected = JSON.parse(
    readFileSync(new URL(file.replace(/\.[^.]+$/, '.expected.json'), dir), 'utf8'),
  ) as Expected;

  it(`is detected as ${format} by content`, () => {
    // Renamed so the extension cannot help: detection must work from the content alone.
    expect(detectFormat(text, 'metrics.dat')).toBe(format);
  });

  it('reads the expected readings, not-fitted entries and meta', async () => {
    const result = await parseMetricText(text, file);
    expect(result.readings.map(({ name, value, unit }) => ({ name, value, unit }))).toEqual(
      expected.readings.map(({ name, value, unit }) => ({ name, value, unit })),
    );
    expected.readings.forEach((reading, i) => {
      if (reading.where !== undefined) expect(result.readings[i]!.where).toBe(reading.where);
    });
    expect(Object.fromEntries(result.notFitted)).toEqual(expected.notFitted);
    expect(Object.fromEntries(result.meta)).toEqual(expected.meta);
  });

  it('reads the same when the format is given', async () => {
    expect((await parseMetricText(text, file, format)).readings).toEqual((await parseMetricText(text, file)).readings);
  });
});
