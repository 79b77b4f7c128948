import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { verifyHistory } from '../../src/history/verify.js';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/history/${name}`, import.meta.url), 'utf8');

const doc = (
  runs: Record<string, unknown>,
  metrics: Record<string, unknown>,
  extra: Record<string, unknown> = {},
): string => JSON.stringify({ schema: 'bellgate.history/2', series: 's', runs, metrics, ...extra });

describe('verifyHistory', () => {
  it('finds nothing wrong with the fixtures of both versions', () => {
    expect(verifyHistory(fixture('v2-small.json'), 'v2.json')).toEqual([]);
    expect(verifyHistory(fixture('v1-small.json'), 'v1.json')).toEqual([]);
  });

  it('lists every problem of a document at once, each with its JSON path', () => {
    const text = doc(
      { id: ['1', '2', '1', 4], time: ['2026-03-02T00:00:00Z', '2026-03-01T00:00:00Z', 'soon', null] },
      {
        names: ['a', 'b', 'a'],
        values: [
          [1, 'NaN', null, 2],
          [1, 2],
          [0, 0, 0, 0],
        ],
      },
    ).replace('[1,"NaN",null,2]', '[1,"NaN",null,1e999]');
    const problems = verifyHistory(text, 'h.json');
    expect(problems).toEqual([
      { where: 'runs.id[2]', problem: expect.stringMatching(/"1" appears twice \(also runs\.id\[0\]\)/) },
      { where: 'runs.id[3]', problem: expect.stringMatching(/non-empty string, found a number/) },
      { where: 'metrics.values[0][1]', problem: expect.stringMatching(/number or null.*a string/) },
      { where: 'metrics.values[0][3]', problem: expect.stringMatching(/not finite/) },
      { where: 'metrics.values[1]', problem: expect.stringMatching(/one entry per run \(4\), found 2 entries/) },
      { where: 'metrics.names[2]', problem: expect.stringMatching(/"a" appears twice/) },
      { where: 'runs.time[1]', problem: expect.stringMatching(/older than the run before it.*runs\.time\[0\]/) },
      { where: 'runs.time[2]', problem: expect.stringMatching(/"soon" is not an ISO-8601/) },
    ]);
  });

  it('flags metric names that every metric reader refuses (bidi override, control character, over 512 characters)', () => {
    // U+202E is RIGHT-TO-LEFT OVERRIDE and U+0007 BELL (Unicode character database); the
    // 512-character cap is the readers' documented name limit.
    const names = ['fine/name', 'evil\u202Egnp', 'bell\u0007', 'x'.repeat(513)];
    const text = doc({ id: ['1'], time: ['2026-03-01T00:00:00Z'] }, { names, values: names.map(() => [1]) });
    const problems = verifyHistory(text, 'h.json');
    expect(problems.map((p) => p.where)).toEqual(['metrics.names[1]', 'metrics.names[2]', 'metrics.names[3]']);
    expect(problems[0]?.problem).toMatch(/bidirectional/);
  });

  it('reports the version problems: missing, unknown, newer', () => {
    expect(verifyHistory('{"series":"s"}', 'h.json')).toEqual([
      { where: 'schema', problem: expect.stringMatching(/not a Bellgate history/) },
    ]);
    expect(verifyHistory('{"schema":"bellgate.history/0"}', 'h.json')).toEqual([
      { where: 'schema', problem: expect.stringMatching(/unknown/) },
    ]);
    expect(verifyHistory('{"schema":"bellgate.history/12"}', 'h.json')).toEqual([
      { where: 'schema', problem: expect.stringMatching(/newer Bellgate/) },
    ]);
  });

  it('reports malformed JSON with line:column', () => {
    const cut = fixture('v2-small.json').slice(0, 60);
    expect(verifyHistory(cut, 'h.json')).toEqual([{ where: '2:8', problem: expect.stringMatching(/not valid JSON/) }]);
  });

  it('uses version-1 paths for version-1 documents', () => {
    const v1 = JSON.stringify({
      schema: 'bellgate.history/1',
      series: 's',
      runs: [
        { id: 'a', time: '2026-03-02T00:00:00Z', values: { x: 1 } },
        { id: 'b', time: '2026-03-01T00:00:00Z', values: { x: '2', ['__proto__']: true }, units: { x: 3 } },
        'run?',
      ],
    });
    expect(verifyHistory(v1, 'v1.json')).toEqual([
      { where: 'runs[1].values["x"]', problem: expect.stringMatching(/finite number or null/) },
      { where: 'runs[1].units["x"]', problem: expect.stringMatching(/unit must be a string/) },
      { where: 'runs[1].values["__proto__"]', problem: expect.stringMatching(/found a boolean/) },
      { where: 'runs[2]', problem: expect.stringMatching(/must be an object/) },
      { where: 'runs[1].time', problem: expect.stringMatching(/older than the run before it/) },
    ]);
  });

  it('caps a flood of problems with a count of the rest', () => {
    const values = Array.from({ length: 500 }, () => 'x');
    const problems = verifyHistory(
      doc({ id: values.map((_, i) => String(i)) }, { names: ['m'], values: [values] }),
      'h.json',
    );
    expect(problems).toHaveLength(201);
    expect(problems.at(-1)).toEqual({ where: '', problem: '300 more problems not listed' });
  });

  it('never throws, whatever the text (fast-check)', () => {
    const base = fixture('v2-small.json');
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
          const problems = verifyHistory(text, 'h.json');
          expect(Array.isArray(problems)).toBe(true);
        },
      ),
      { numRuns: 500 },
    );
  });
});
