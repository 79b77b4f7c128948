import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { verifyHistory } from '../../src/history/verify.js';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/history/${name}`, import.meta.url), 'utf8');

const HEADER = '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"a"},{"name":"b"}]}';
const doc = (...lines: string[]): string => `${[HEADER, ...lines].join('\n')}\n`;

describe('verifyHistory', () => {
  it('finds nothing wrong with the fixture', () => {
    expect(verifyHistory(fixture('v3-small.jsonl'))).toEqual([]);
  });

  it('lists every problem of a document at once, each with its line', () => {
    const text = doc(
      '{"id":"1","time":"2026-03-02T00:00:00Z","values":[1,2]}',
      '{"id":"2","values":[1,"NaN"]}',
      '{"id":"3","values":[1,1e999]}',
      '{"id":"4","time":"soon","valeus":[1]}',
      'not json',
      '{"id":"5","values":[1,2,3]}',
      '{"mark":"9","reason":"manual"}',
      '{"drop":"1","why":"x"}',
      '[1]',
    );
    expect(verifyHistory(text)).toEqual([
      { where: '3', problem: expect.stringMatching(/run "2": values\[1\] is a string, not a finite number or null/) },
      { where: '4', problem: expect.stringMatching(/values\[1\] is the non-finite number Infinity/) },
      { where: '6:2', problem: expect.stringMatching(/not valid JSON/) },
      { where: '7', problem: expect.stringMatching(/run "5" has 3 values, but the header lists 2 metrics/) },
      { where: '10', problem: expect.stringMatching(/must be a JSON object, found an array/) },
      { where: '5', problem: 'field "valeus" is not part of a run line' },
      { where: '5', problem: 'time "soon" is not an ISO-8601 date-time' },
      { where: '8', problem: 'the mark is for run "9", which the history does not hold' },
      { where: '9', problem: 'field "why" is not part of a drop line' },
    ]);
  });

  it('flags metric names that every metric reader refuses (bidi override, control character, over 512 characters)', () => {
    // U+202E is RIGHT-TO-LEFT OVERRIDE and U+0007 BELL (Unicode character database); the
    // 512-character cap is the readers' documented name limit.
    const names = ['fine/name', 'evil\u202Egnp', 'bell\u0007', 'x'.repeat(513)];
    const text = `${JSON.stringify({ schema: 'bellgate.history/3', series: 's', metrics: names.map((name) => ({ name })) })}\n`;
    const problems = verifyHistory(text);
    expect(problems.map((p) => p.where)).toEqual(['1', '1', '1']);
    expect(problems.map((p) => p.problem.slice(0, 11))).toEqual(['metrics[1]:', 'metrics[2]:', 'metrics[3]:']);
    expect(problems[0]?.problem).toMatch(/bidirectional/);
  });

  it('reports the format problems: missing, older, newer', () => {
    expect(verifyHistory('{"series":"s"}\n')).toEqual([
      { where: '1', problem: expect.stringMatching(/not a Bellgate history/) },
    ]);
    expect(verifyHistory('{"schema":"bellgate.history/2"}\n')).toEqual([
      { where: '1', problem: expect.stringMatching(/version 2 is not read/) },
    ]);
    expect(verifyHistory('{"schema":"bellgate.history/12"}\n')).toEqual([
      { where: '1', problem: expect.stringMatching(/newer Bellgate/) },
    ]);
    expect(verifyHistory('')).toEqual([{ where: '', problem: expect.stringMatching(/empty/) }]);
  });

  it('reports a torn last line with its line number', () => {
    const cut = fixture('v3-small.jsonl').slice(0, -30);
    expect(verifyHistory(cut)).toEqual([
      { where: '6', problem: expect.stringMatching(/^ignored the last line, which a write that was cut short/) },
    ]);
  });

  it('caps a flood of problems with a count of the rest', () => {
    const lines = Array.from({ length: 500 }, (_, i) => `{"id":"${i}","values":["x"]}`);
    const problems = verifyHistory(doc(...lines));
    expect(problems).toHaveLength(201);
    expect(problems.at(-1)).toEqual({ where: '', problem: '300 more problems not listed' });
  });

  it('never throws, whatever the text (fast-check)', () => {
    const base = fixture('v3-small.jsonl');
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.json(),
          fc
            .tuple(fc.nat(base.length), fc.string({ maxLength: 3 }))
            .map(([i, s]) => base.slice(0, i) + s + base.slice(i + 1)),
        ),
        (text) => {
          expect(Array.isArray(verifyHistory(text))).toBe(true);
        },
      ),
      { numRuns: 500 },
    );
  });
});
