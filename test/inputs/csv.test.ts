import { describe, expect, it } from 'vitest';
import { readCsvMetrics } from '../../src/inputs/csv.js';
import { inputErrorOf } from './helpers.js';

describe('readCsvMetrics', () => {
  it('reads the long form with columns in any order and any case', () => {
    const result = readCsvMetrics('Unit,VALUE,name\nms,3,a\n', 'm.csv');
    expect(result.readings).toEqual([{ name: 'a', value: 3, unit: 'ms', where: 'm.csv:2' }]);
  });

  it('keeps the line of a record whose quoted name spans lines out of the way of later lines', () => {
    // RFC 4180 §2.6: a quoted field may contain a line break; the name rule then refuses it.
    const error = inputErrorOf(() => readCsvMetrics('name,value\n"a\nb",1\n', 'm.csv'));
    expect(error.message).toMatch(/control character \(U\+000A\)/);
  });

  it('refuses a value that is not a plain decimal number, naming line and column', () => {
    for (const bad of ['1,5', '0x10', 'abc', 'NaN', 'Infinity', '1e999']) {
      const error = inputErrorOf(() => readCsvMetrics(`name,value\na,"${bad}"\n`, 'm.csv'));
      expect(error.where).toBe('m.csv:2');
      expect(error.message).toMatch(/not a (finite )?number/);
    }
    const wide = inputErrorOf(() => readCsvMetrics('a,b\n1,x\n', 'm.csv'));
    expect(wide.where).toBe('m.csv:2:2');
    expect(wide.message).toMatch(/column 2/);
  });

  it('refuses rows with the wrong number of cells and unclosed quotes', () => {
    expect(inputErrorOf(() => readCsvMetrics('a,b\n1,2,3\n', 'm.csv')).where).toBe('m.csv:2');
    expect(inputErrorOf(() => readCsvMetrics('a,b\n"1,2\n', 'm.csv')).message).toMatch(/malformed CSV/);
  });

  it('refuses an empty name in either form, and a metric column twice', () => {
    expect(inputErrorOf(() => readCsvMetrics('name,value\n,1\n', 'm.csv')).message).toBe('metric name is empty');
    expect(inputErrorOf(() => readCsvMetrics('a,,b\n1,2,3\n', 'm.csv')).message).toBe('metric name is empty');
    expect(inputErrorOf(() => readCsvMetrics('a [ms],a [s]\n1,2\n', 'm.csv')).message).toMatch(
      /names metric "a" twice/,
    );
  });

  it('reads a bracketed unit only at the end of a wide header cell', () => {
    const result = readCsvMetrics('p[95] latency [ms],x\n1,2\n', 'm.csv');
    expect(result.readings.map(({ name, unit }) => [name, unit])).toEqual([
      ['p[95] latency', 'ms'],
      ['x', undefined],
    ]);
  });
});
