import { describe, expect, it } from 'vitest';
import { detectFormat } from '../../src/inputs/detect.js';
import { metricFormat } from '../../src/inputs/formats.js';
import { DEFAULT_LIMITS } from '../../src/inputs/limits.js';
import { parseMetricText } from '../../src/inputs/parse.js';
import { inputErrorOf, rejectionOf } from './helpers.js';

describe('detectFormat', () => {
  it('tells formats apart by content', () => {
    expect(detectFormat('{"metrics": []}', 'x')).toBe('json');
    expect(detectFormat('{"name": "a", "value": 1}\n{"name": "b", "value": 2}\n', 'x')).toBe('jsonl');
    expect(detectFormat('{"name": "a", "value": 1}', 'x')).toBe('jsonl');
    expect(detectFormat('\ufeffname,value\na,1\n', 'x')).toBe('csv');
    expect(detectFormat('go_goroutines 69\n', 'x')).toBe('openmetrics');
    expect(detectFormat('goos: linux\nBenchmarkA-8 10 5 ns/op\nPASS\n', 'x')).toBe('gobench');
    expect(detectFormat('<?xml version="1.0"?>\n<testsuites></testsuites>', 'x')).toBe('junit');
  });

  it('lists the candidates and says to pass --input-format when unsure', () => {
    // A labelled sample line is also a valid CSV header.
    const error = inputErrorOf(() => detectFormat('a{x="1",y="2"} 3\n', 'metrics.txt'));
    expect(error.message).toBe('cannot tell the format of the metric file: it could be openmetrics or csv');
    expect(error.fix).toMatch(/--input-format \(openmetrics \| csv\)/);
    expect(error.where).toBe('metrics.txt');
  });

  it('lets the extension decide between the candidates it fits', () => {
    expect(detectFormat('a{x="1",y="2"} 3\n', 'node.prom')).toBe('openmetrics');
    expect(detectFormat('a{x="1",y="2"} 3\n', 'node.csv')).toBe('csv');
  });

  it('refuses text in no known format, and empty files', () => {
    const error = inputErrorOf(() => detectFormat('hello there\n', 'x.txt'));
    expect(error.message).toMatch(/no format Bellgate recognises/);
    expect(error.fix).toMatch(/--input-format/);
    expect(inputErrorOf(() => detectFormat(' \n\n', 'x.txt')).message).toBe('the metric file is empty');
    expect(inputErrorOf(() => detectFormat('<html/>', 'x.xml')).message).toMatch(/no format/);
  });
});

describe('parseMetricText', () => {
  it('accepts format names case-insensitively, with aliases, and refuses unknown ones', async () => {
    expect(metricFormat('Prometheus')).toBe('openmetrics');
    expect(metricFormat('NDJSON')).toBe('jsonl');
    expect((await rejectionOf(parseMetricText('a 1', 'x', 'yaml'))).fix).toMatch(
      /json, jsonl, csv, openmetrics, gobench, junit/,
    );
  });

  it('refuses a file that yields no metric at all', async () => {
    expect((await rejectionOf(parseMetricText('PASS\nok  \tpkg\t1.2s\n', 'b.txt', 'gobench'))).message).toMatch(
      /no metrics found in the file \(read as gobench\)/,
    );
  });

  it('refuses a line over limits.max-line-length, naming the limit and the key', async () => {
    const limits = { ...DEFAULT_LIMITS, maxLineLength: 20 };
    const error = await rejectionOf(parseMetricText(`a 1\nb${' '.repeat(30)}2\n`, 'm.prom', 'openmetrics', limits));
    expect(error.message).toBe('line 2 is 32 characters long (limit limits.max-line-length = 20)');
    expect(error.where).toBe('m.prom:2');
    expect(error.fix).toMatch(/raise limits\.max-line-length/);
  });

  it('applies the line limit to line-oriented formats only (one-line JSON is bounded by file size)', async () => {
    const limits = { ...DEFAULT_LIMITS, maxLineLength: 20 };
    const oneLine = JSON.stringify({
      metrics: [
        { name: 'a', value: 1 },
        { name: 'b', value: 2 },
      ],
    });
    expect((await parseMetricText(oneLine, 'm.json', undefined, limits)).readings).toHaveLength(2);
    expect(
      (await rejectionOf(parseMetricText('{"name": "a", "value": 1}', 'm.jsonl', 'jsonl', limits))).message,
    ).toMatch(/limits\.max-line-length/);
    expect(
      (await rejectionOf(parseMetricText('name,value\nabcdefghijklmnopqrstuvwxyz,1', 'm.csv', 'csv', limits))).where,
    ).toBe('m.csv:2');
  });

  it('refuses more than limits.max-metrics distinct metrics while parsing', async () => {
    const limits = { ...DEFAULT_LIMITS, maxMetrics: 2 };
    expect((await parseMetricText('a 1\nb 2\na 3\n', 'm.prom', undefined, limits)).readings).toHaveLength(3);
    const error = await rejectionOf(parseMetricText('a 1\nb 2\nc 3\n', 'm.prom', undefined, limits));
    expect(error.message).toMatch(/more than 2 metrics \(limit limits\.max-metrics = 2\)/);
    expect(error.where).toBe('m.prom:3');
  });
});
