import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { decodeHistory, parseHistory, serializeHistory } from '../../src/history/document.js';
import { emptyHistory, type History } from '../../src/history/history.js';
import { textLines, type LineSource } from '../../src/history/lines.js';
import { throwingSink } from '../../src/history/problems.js';
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

const HEADER = '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"m","unit":"ms"},{"name":"k"}]}';
const doc = (...lines: string[]): string => `${[HEADER, ...lines].join('\n')}\n`;
const at = (d: number): string => new Date(Date.UTC(2026, 2, d, 10)).toISOString();

describe('parseHistory / serializeHistory', () => {
  it('reads the hand-written fixture as the layout documented in document.ts, and writes it back byte for byte', () => {
    const h = parseHistory(fixture('v3-small.jsonl'), 'v3-small.jsonl');
    expect(h.series).toBe('linux-x64');
    expect(h.runs.map((r) => r.id)).toEqual(['8101-1', '8102-1', '8103-2', '8104-1']);
    expect(h.runs[2]).toEqual({
      id: '8103-2',
      time: '2026-03-02T18:30:00.000Z',
      pr: 41,
      runner: 'Linux X64 | ubuntu24 20261110.1 | AMD EPYC 7763 64-Core Processor | 4 cpu | node 24.11.0',
      marks: [{ reason: 'accepted', pr: 41 }],
    });
    expect(h.columns.get('route/match-static')).toEqual({ unit: 'ns', values: [412.5, NaN, 409.1, NaN] });
    expect(h.columns.get('tiles/render-p95')).toEqual({ values: [NaN, NaN, 0.0183, 0.0179] });
    expect(h.dropped).toEqual(
      new Map([['8100-1', { id: '8100-1', time: '2026-03-01T08:00:00.000Z', reason: 'noisy runner' }]]),
    );
    expect(serializeHistory(h)).toBe(fixture('v3-small.jsonl'));
  });

  it('round-trips any History exactly (fast-check): runs, marks, tombstones, units, NaN as missing', () => {
    fc.assert(
      fc.property(historyArbitrary(), (h) => {
        const back = parseHistory(serializeHistory(h), 'h.jsonl');
        expect(back).toEqual(h);
        expect([...back.columns.keys()]).toEqual([...h.columns.keys()]);
      }),
      { numRuns: 300 },
    );
  });

  it('keeps IEEE-754 extremes exactly: Number.MAX_VALUE, the smallest subnormal 5e-324, -0 read as 0', () => {
    // ECMA-262 Number.MAX_VALUE = 1.7976931348623157e308, Number.MIN_VALUE = 5e-324 (IEEE 754 binary64).
    const h: History = {
      series: 's',
      runs: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd' }],
      columns: new Map([['x', { values: [1.7976931348623157e308, 5e-324, 0.1, -0] }]]),
    };
    const back = parseHistory(serializeHistory(h), 'h.jsonl');
    expect(back.columns.get('x')?.values).toEqual([Number.MAX_VALUE, Number.MIN_VALUE, 0.1, 0]);
  });

  it('keeps hostile metric names (__proto__, constructor) in a Map', () => {
    const text =
      '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"__proto__","unit":"ms"},{"name":"constructor"}]}\n' +
      '{"id":"1","values":[3,4]}\n';
    const back = parseHistory(text, 'h.jsonl');
    expect([...back.columns.keys()]).toEqual(['__proto__', 'constructor']);
    expect(back.columns.get('__proto__')).toEqual({ unit: 'ms', values: [3] });
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('reads a byte-order mark, blank lines and CRLF line ends; a shorter values array leaves later metrics missing', () => {
    const h = parseHistory(`\uFEFF${HEADER}\r\n\r\n{"id":"1","values":[2]}\r\n`, 'h.jsonl');
    expect(h.columns.get('m')?.values).toEqual([2]);
    expect(h.columns.has('k')).toBe(false);
    expect(serializeHistory(emptyHistory('e'))).toBe('{"schema":"bellgate.history/3","series":"e","metrics":[]}\n');
  });
});

describe('what lines mean (line order never changes the meaning)', () => {
  it('a run id seen twice is the later line', () => {
    const h = parseHistory(
      doc(`{"id":"a","time":"${at(1)}","values":[1]}`, `{"id":"a","time":"${at(1)}","values":[9]}`),
      'h',
    );
    expect(h.runs.map((r) => r.id)).toEqual(['a']);
    expect(h.columns.get('m')?.values).toEqual([9]);
  });

  it('a higher attempt of a CI run replaces a lower one, whichever line comes last; its marks stay', () => {
    const lines = [
      `{"id":"8123-1","time":"${at(1)}","values":[1],"marks":[{"reason":"manual","note":"new compiler"}]}`,
      `{"id":"8123-2","time":"${at(2)}","values":[2]}`,
    ];
    for (const order of [lines, [...lines].reverse()]) {
      const h = parseHistory(doc(...order), 'h');
      expect(h.runs).toEqual([{ id: '8123-2', time: at(2), marks: [{ reason: 'manual', note: 'new compiler' }] }]);
      expect(h.columns.get('m')?.values).toEqual([2]);
    }
  });

  it('a tombstone removes its run wherever it stands; a mark line adds to its run', () => {
    const h = parseHistory(
      doc(
        `{"id":"a","time":"${at(1)}","values":[1]}`,
        `{"id":"b","time":"${at(2)}","values":[2]}`,
        '{"mark":"b","metrics":["m"],"reason":"manual"}',
        '{"drop":"a","reason":"noisy"}',
      ),
      'h',
    );
    expect(h.runs).toEqual([{ id: 'b', time: at(2), marks: [{ metrics: ['m'], reason: 'manual' }] }]);
    expect(h.dropped?.get('a')).toEqual({ id: 'a', reason: 'noisy' });
    // and the rewrite folds the mark into the run and keeps the tombstone up front
    expect(serializeHistory(h)).toBe(
      doc(
        '{"drop":"a","reason":"noisy"}',
        `{"id":"b","time":"${at(2)}","values":[2],"marks":[{"metrics":["m"],"reason":"manual"}],"n":1}`,
      ).replace(HEADER, '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"m","unit":"ms"}]}'),
    );
  });

  it('runs are ordered by time, then id with numeric collation (run 999 before run 1000), untimed first', () => {
    const h = parseHistory(
      doc(
        `{"id":"1000-1","time":"${at(2)}"}`,
        `{"id":"999-1","time":"${at(2)}"}`,
        `{"id":"early","time":"${at(1)}"}`,
        '{"id":"untimed"}',
      ),
      'h',
    );
    expect(h.runs.map((r) => r.id)).toEqual(['untimed', 'early', '999-1', '1000-1']);
  });
});

/** textLines, counting the lines handed out from the end. */
function counted(text: string): { source: LineSource; fromEnd: () => number } {
  const inner = textLines(text);
  let n = 0;
  return {
    source: {
      forward: () => inner.forward(),
      *backward(stop) {
        for (const line of inner.backward(stop)) {
          n += 1;
          yield line;
        }
      },
      lineNumber: (o) => inner.lineNumber(o),
    },
    fromEnd: () => n,
  };
}

describe('reading the newest runs from the end', () => {
  it('gives the last N runs of the whole read, for any history and N (fast-check)', () => {
    fc.assert(
      fc.property(historyArbitrary(), fc.integer({ min: 1, max: 10 }), (h, newest) => {
        const text = serializeHistory(h);
        const whole = parseHistory(text, 'h');
        const tail = parseHistory(text, 'h', { newest });
        const keep = whole.runs.slice(Math.max(0, whole.runs.length - newest));
        expect(tail.runs).toEqual(keep);
        expect(tail.dropped).toEqual(whole.dropped);
        for (const [name, column] of tail.columns) {
          expect(column.values).toEqual(whole.columns.get(name)?.values.slice(whole.runs.length - keep.length));
        }
      }),
      { numRuns: 200 },
    );
  });

  it('parses only the lines it needs: 5 of 1,000 runs read 5 lines from the end', () => {
    const lines = Array.from(
      { length: 1000 },
      (_, i) =>
        `{"id":"${i + 1}-1","time":"${new Date(Date.UTC(2026, 0, 1) + i * 3.6e6).toISOString()}","values":[${i}]}`,
    );
    const { source, fromEnd } = counted(doc(...lines));
    const decoded = decodeHistory(source, throwingSink('h'), { newest: 5 });
    expect(decoded?.history.runs.map((r) => r.id)).toEqual(['996-1', '997-1', '998-1', '999-1', '1000-1']);
    expect(fromEnd()).toBe(5);
  });

  it('reads the tombstones kept after the header, and skips dropped and superseded runs when counting', () => {
    const text = doc(
      '{"drop":"3-1"}',
      `{"id":"1-1","time":"${at(1)}","values":[1]}`,
      `{"id":"2-1","time":"${at(2)}","values":[2]}`,
      `{"id":"3-1","time":"${at(3)}","values":[3]}`,
      `{"id":"4-1","time":"${at(4)}","values":[4]}`,
      `{"id":"4-2","time":"${at(5)}","values":[5]}`,
    );
    const h = parseHistory(text, 'h', { newest: 2 });
    expect(h.runs.map((r) => r.id)).toEqual(['2-1', '4-2']);
    expect(h.columns.get('m')?.values).toEqual([2, 5]);
  });
});

describe('a torn last line (a writer killed mid-append)', () => {
  const good = doc(`{"id":"a","time":"${at(1)}","values":[1]}`);
  it('is ignored with a warning naming its line, and every complete run is read', () => {
    const warnings: string[] = [];
    const h = parseHistory(`${good}{"id":"b","time":"${at(2)}","valu`, 'h.jsonl', {
      warn: (p, w) => warnings.push(`${w}: ${p}`),
    });
    expect(h.runs.map((r) => r.id)).toEqual(['a']);
    expect(warnings).toEqual([
      expect.stringMatching(/^3: ignored the last line, which a write that was cut short left incomplete/),
    ]);
    // the same from the end
    const tail = parseHistory(`${good}{"id":"b","time":"${at(2)}","valu`, 'h.jsonl', { newest: 1 });
    expect(tail.runs.map((r) => r.id)).toEqual(['a']);
  });

  it('a last line that is whole but lacks its newline is read', () => {
    const h = parseHistory(`${good}{"id":"b","time":"${at(2)}","values":[2]}`, 'h.jsonl');
    expect(h.runs.map((r) => r.id)).toEqual(['a', 'b']);
  });

  it('a broken line that is not the last is an error, not a tear', () => {
    const error = inputError(() => parseHistory(`${good}{"id":"b","valu\n{"id":"c"}\n`, 'h.jsonl'));
    // line 3 is `{"id":"b","valu`, 15 characters; the parser stops just past them, at column 16
    expect(error.where).toBe('h.jsonl:3:16');
  });
});

describe('hostile documents: InputError naming source, line and a fix', () => {
  const cases: Array<[string, string, string, RegExp]> = [
    ['empty file', '', 'h.jsonl', /the file is empty/],
    ['newer version', '{"schema":"bellgate.history/4","series":"s","metrics":[]}\n', 'h.jsonl:1', /newer Bellgate/],
    [
      'older version',
      '{"schema":"bellgate.history/2","series":"s","metrics":[]}\n',
      'h.jsonl:1',
      /format version 2 is not read/,
    ],
    ['no schema', '{"series":"s"}\n', 'h.jsonl:1', /not a Bellgate history document/],
    ['a JSON array header', '[1,2]\n', 'h.jsonl:1', /must be the header object/],
    ['header not JSON', '{"schema":\n', 'h.jsonl:1:11', /not valid JSON/],
    [
      'series not a string',
      '{"schema":"bellgate.history/3","series":5,"metrics":[]}\n',
      'h.jsonl:1',
      /"series" must be a string/,
    ],
    [
      'metric listed twice',
      '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"a"},{"name":"a"}]}\n',
      'h.jsonl:1',
      /listed twice/,
    ],
    [
      'unit not a string',
      '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"a","unit":3}]}\n',
      'h.jsonl:1',
      /"unit" must be a string/,
    ],
    ['a line that is no object', doc('7'), 'h.jsonl:2', /must be a JSON object/],
    ['a line of no known kind', doc('{"x":1}'), 'h.jsonl:2', /neither|run \(with "id"\)/],
    ['an empty id', doc('{"id":""}'), 'h.jsonl:2', /"id" must be a run id/],
    ['more values than metrics', doc('{"id":"a","values":[1,2,3]}'), 'h.jsonl:2', /3 values, but the header lists 2/],
    ['a value that is text', doc('{"id":"a","values":["12"]}'), 'h.jsonl:2', /values\[0\] is a string/],
    [
      'an overflowing literal 1e999',
      doc('{"id":"a","values":[1e999]}'),
      'h.jsonl:2',
      /values\[0\] is the non-finite number Infinity/,
    ],
    ['time not a string', doc('{"id":"a","time":5}'), 'h.jsonl:2', /"time" must be a string/],
    ['pr not a number', doc('{"id":"a","pr":"7"}'), 'h.jsonl:2', /"pr" must be a pull request number/],
    ['a mark without reason', doc('{"id":"a","marks":[{}]}'), 'h.jsonl:2', /"reason" must be "accepted" or "manual"/],
    ['a drop without id', doc('{"drop":5}'), 'h.jsonl:2', /"drop" must be a run id/],
  ];
  for (const [title, text, where, message] of cases) {
    it(title, () => {
      const error = inputError(() => parseHistory(text, 'h.jsonl'));
      expect(error.where).toBe(where);
      expect(error.message).toMatch(message);
      expect(error.describe()).toContain('fix:');
    });
  }

  it('arbitrary text throws only InputError (fast-check)', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), (text) => {
        try {
          parseHistory(text, 'h');
        } catch (error) {
          expect(error).toBeInstanceOf(InputError);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('mutated valid documents throw only InputError, whole and from the end (fast-check)', () => {
    const base = fixture('v3-small.jsonl');
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: base.length - 1 }),
        fc.string({ minLength: 1, maxLength: 3 }),
        (at, text) => {
          const mutated = base.slice(0, at) + text + base.slice(at + 1);
          for (const options of [{}, { newest: 2 }]) {
            try {
              parseHistory(mutated, 'h', options);
            } catch (error) {
              expect(error).toBeInstanceOf(InputError);
            }
          }
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('serializeHistory refuses a History it could not read back', () => {
  it('a column not aligned with the runs, an infinite value, a duplicated id, a dropped id', () => {
    const base: History = { series: 's', runs: [{ id: 'a' }], columns: new Map([['m', { values: [1] }]]) };
    expect(() => serializeHistory({ ...base, columns: new Map([['m', { values: [1, 2] }]]) })).toThrow(
      /2 values for 1 runs/,
    );
    expect(() => serializeHistory({ ...base, columns: new Map([['m', { values: [Infinity] }]]) })).toThrow(
      /cannot be stored/,
    );
    expect(() => serializeHistory({ ...base, runs: [{ id: 'a' }, { id: 'a' }], columns: new Map() })).toThrow(
      /appears twice/,
    );
    expect(() => serializeHistory({ ...base, dropped: new Map([['a', { id: 'a' }]]) })).toThrow(/was dropped/);
  });
});
