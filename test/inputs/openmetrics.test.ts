import { describe, expect, it } from 'vitest';
import { foldLabels } from '../../src/inputs/openmetrics-labels.js';
import { readOpenMetrics } from '../../src/inputs/openmetrics.js';
import { inputErrorOf } from './helpers.js';

describe('foldLabels', () => {
  it('sorts labels by key and escapes the characters that would make the name ambiguous', () => {
    expect(
      foldLabels('q', [
        ['b', '2'],
        ['a', '1'],
      ]),
    ).toBe('q/a=1,b=2');
    expect(
      foldLabels('q', [
        ['path', '/a,b=c'],
        ['pct', '50%'],
      ]),
    ).toBe('q/path=/a%2Cb=c,pct=50%25');
    expect(foldLabels('q', [['v', 'x\u202Ey\n']])).toBe('q/v=x%E2%80%AEy%0A');
    expect(foldLabels('q', [])).toBe('q');
  });

  it('can be undone: decoding each value gives back the labels (property over a few cases)', () => {
    const labels: [string, string][] = [
      ['a', 'x,y=z/%w'],
      ['b', '\n'],
    ];
    const folded = foldLabels('m', labels);
    const [, pairs] = folded.split(/\/(.*)/s);
    const back = pairs!.split(',').map((pair) => {
      const at = pair.indexOf('=');
      return [pair.slice(0, at), decodeURIComponent(pair.slice(at + 1))];
    });
    expect(back).toEqual(labels);
  });
});

describe('readOpenMetrics', () => {
  it('gives the UNIT to amounts and not to counts', () => {
    const text = '# TYPE d histogram\n# UNIT d seconds\nd_bucket{le="1"} 2\nd_count 2\nd_sum 1.5\n# EOF\n';
    const result = readOpenMetrics(text, 'm.om');
    expect(result.readings.map(({ name, unit }) => [name, unit])).toEqual([
      ['d_bucket/le=1', undefined],
      ['d_count', undefined],
      ['d_sum', 'seconds'],
    ]);
  });

  it('reads NaN samples into notFitted and ignores timestamps', () => {
    const result = readOpenMetrics('a NaN\nb 1 1700000000\n', 'm.prom');
    expect(result.notFitted.get('a')).toBe('value is NaN at m.prom:1');
    expect(result.readings).toEqual([{ name: 'b', value: 1, where: 'm.prom:2' }]);
  });

  it('refuses text after # EOF, naming the line', () => {
    const error = inputErrorOf(() => readOpenMetrics('a 1\n# EOF\nb 2\n', 'm.om'));
    expect(error.where).toBe('m.om:3');
    expect(error.message).toMatch(/after "# EOF"/);
  });

  it('refuses malformed sample lines with what was expected', () => {
    const cases: [string, RegExp][] = [
      ['a{b="1" 2', /"," or "}"/],
      ['a{b=1} 2', /quoted value/],
      ['a{b="1} 2', /closing quote/],
      ['a{b="1",b="2"} 3', /label b only once/],
      ['a', /space and a value/],
      ['a 1 2 3', /at most a timestamp/],
      ['a one', /not a number/],
      ['9a 1', /metric name at the start/],
    ];
    for (const [line, message] of cases) {
      const error = inputErrorOf(() => readOpenMetrics(`${line}\n`, 'm.prom'));
      expect(error.message).toMatch(message);
      expect(error.where).toBe('m.prom:1');
    }
  });

  it('refuses an unknown TYPE', () => {
    expect(inputErrorOf(() => readOpenMetrics('# TYPE a thing\na 1\n', 'm.prom')).message).toMatch(
      /unknown metric type "thing"/,
    );
  });

  it('keeps unknown escapes and reads trailing commas in label sets (Prometheus text format 0.0.4)', () => {
    const result = readOpenMetrics('a{b="x\\ty",} 1\n', 'm.prom');
    expect(result.readings[0]!.name).toBe('a/b=x\\ty');
  });
});
