// limits.max-samples in every reader: a file past the cap is refused at the sample that passes it
// (JUnit XML, which is parsed whole, by counting its elements first), naming the key to raise.
import { describe, expect, it } from 'vitest';
import { DEFAULT_LIMITS } from '../../src/inputs/limits.js';
import { parseMetricText } from '../../src/inputs/parse.js';
import { rejectionOf } from './helpers.js';

const limits = { ...DEFAULT_LIMITS, maxSamples: 3 };

// Four samples of one metric in each format; the fourth passes the cap of three.
const FOUR: Array<[string, string, string]> = [
  ['json', '{"a": [1, 2, 3, 4]}', 'f (a)'],
  ['jsonl', '{"name":"a","value":1}\n{"name":"a","value":2}\n{"name":"a","value":3}\n{"name":"a","value":4}\n', 'f:4'],
  ['csv', 'name,value\na,1\na,2\na,3\na,4\n', 'f:5'],
  ['csv', 'a,b\n1,2\n3,4\n', 'f:3'],
  ['openmetrics', 'a 1\na 2\na 3\na 4\n', 'f:4'],
  [
    'gobench',
    'BenchmarkA-8 1 1 ns/op\nBenchmarkA-8 1 2 ns/op\nBenchmarkA-8 1 3 ns/op\nBenchmarkA-8 1 4 ns/op\n',
    'f:4',
  ],
];

describe('limits.max-samples', () => {
  it.each(FOUR)('refuses the fourth sample of %s when the cap is three', async (format, text, where) => {
    const error = await rejectionOf(parseMetricText(text, 'f', format, limits));
    expect(error.message).toBe('f has more than 3 samples (limit limits.max-samples = 3)');
    expect(error.where).toBe(where);
    expect(error.fix).toBe('raise limits.max-samples in the config file if this input is expected');
    // At the cap itself the file is read.
    expect((await parseMetricText(text, 'f', format, { ...limits, maxSamples: 4 })).readings).toHaveLength(4);
  });

  it('counts the test cases and suites of JUnit XML before parsing it (not <testsuites>)', async () => {
    const xml = (cases: number) =>
      `<testsuites><testsuite name="s">${'<testcase name="t" time="1"/>'.repeat(cases)}</testsuite></testsuites>`;
    const error = await rejectionOf(parseMetricText(xml(3), 'f', 'junit', limits));
    expect(error.message).toBe('f has more than 3 test cases and suites (limit limits.max-samples = 3)');
    expect((await parseMetricText(xml(2), 'f', 'junit', limits)).readings).toHaveLength(2);
  });
});
