// Hostile history documents: truncated, wrong version, duplicated runs, non-finite values, wrong
// types, prototype keys — through parseHistory and verifyHistory, and through the CLI (check,
// verify, report --html, check --record), where an unreadable history is refused clearly and never
// overwritten (DESIGN.md, "History"). Numbers past the double range read as Infinity by JSON.parse
// (ECMA-262, Number.parseFloat semantics of JSON numbers — from memory).
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseHistory, serializeHistory } from '../../src/history/document.js';
import type { History } from '../../src/history/history.js';
import { verifyHistory } from '../../src/history/verify.js';
import { bellgate, scratch } from '../cli/helpers/cli-harness.js';
import { historyArbitrary } from '../history/arbitraries.js';
import { assertNoPollution, CaseCounter, FC, resultOrInputError, STACK_LINE } from './guards.js';
import { assertInertHtml, assertInertText } from './outputs.js';

const counter = new CaseCounter('history');
const work = scratch('bellgate-hostile-history-');
afterAll(() => {
  counter.print();
  work.remove();
});

/** A parsed History keeps its invariants: unique ids, aligned columns, finite-or-missing values. */
function sound(h: History): void {
  const ids = new Set(h.runs.map((r) => r.id));
  expect(ids.size).toBe(h.runs.length);
  for (const r of h.runs) expect(typeof r.id === 'string' && r.id !== '').toBe(true);
  expect(h.columns).toBeInstanceOf(Map);
  for (const c of h.columns.values()) {
    expect(c.values.length).toBe(h.runs.length);
    expect(c.values.every((v) => Number.isNaN(v) || Number.isFinite(v))).toBe(true);
  }
}

/** parseHistory and verifyHistory agree: a document verify finds clean always parses. */
function both(text: string, label: string): void {
  const outcome = resultOrInputError(() => parseHistory(text, 'h.json'), sound);
  const problems = verifyHistory(text, 'h.json');
  if (outcome === 'refused') expect(problems.length).toBeGreaterThan(0);
  if (problems.length === 0) expect(outcome).toBe('ok');
  for (const p of problems) {
    expect(p.problem.length).toBeGreaterThan(0);
    expect(p.problem).not.toMatch(/\[object Object\]/);
  }
  assertNoPollution();
  counter.add(label, outcome);
}

const V2 = readFileSync(new URL('../fixtures/history/v2-small.json', import.meta.url), 'utf8');
const V1 = readFileSync(new URL('../fixtures/history/v1-small.json', import.meta.url), 'utf8');

const v2 = (runs: unknown, metrics: unknown, extra: Record<string, unknown> = {}) =>
  JSON.stringify({ schema: 'bellgate.history/2', series: 's', runs, metrics, ...extra });

const HAND: Array<[string, string]> = [
  ['empty text', ''],
  ['not JSON', 'schema: bellgate.history/2'],
  ['an array', '[]'],
  ['null', 'null'],
  ['no schema', '{"series":"s","runs":[]}'],
  ['schema a number', '{"schema":2}'],
  ['newer version', '{"schema":"bellgate.history/3"}'],
  ['version 0', '{"schema":"bellgate.history/0"}'],
  ['version with leading zero', '{"schema":"bellgate.history/02"}'],
  ['version 1e9', '{"schema":"bellgate.history/999999999"}'],
  ['version fractional', '{"schema":"bellgate.history/1.5"}'],
  ['other schema', '{"schema":"acme.history/1"}'],
  ['v2 runs an array', v2([], { names: [], values: [] })],
  ['v2 ids numbers', v2({ id: [1, 2] }, { names: [], values: [] })],
  ['v2 duplicated run id', v2({ id: ['a', 'a'] }, { names: ['m'], values: [[1, 2]] })],
  ['v2 duplicated metric name', v2({ id: ['a'] }, { names: ['m', 'm'], values: [[1], [2]] })],
  ['v2 ragged column', v2({ id: ['a', 'b'] }, { names: ['m'], values: [[1]] })],
  ['v2 more names than columns', v2({ id: ['a'] }, { names: ['m', 'n'], values: [[1]] })],
  ['v2 value 1e400', v2({ id: ['a'] }, { names: ['m'], values: [[1e400]] }).replace('null', '1e400')],
  [
    'v2 value -1e400',
    `{"schema":"bellgate.history/2","series":"s","runs":{"id":["a"]},"metrics":{"names":["m"],"values":[[-1e400]]}}`,
  ],
  ['v2 value "NaN"', v2({ id: ['a'] }, { names: ['m'], values: [['NaN']] })],
  ['v2 value true', v2({ id: ['a'] }, { names: ['m'], values: [[true]] })],
  ['v2 value an object', v2({ id: ['a'] }, { names: ['m'], values: [[{ valueOf: 1 }]] })],
  ['v2 names an object', v2({ id: ['a'] }, { names: { 0: 'm' }, values: [[1]] })],
  ['v2 units wrong length', v2({ id: ['a'] }, { names: ['m'], units: ['s', 'ms'], values: [[1]] })],
  ['v2 unit a number', v2({ id: ['a'] }, { names: ['m'], units: [5], values: [[1]] })],
  ['v2 sha column a string', v2({ id: ['a'], sha: 'abc' }, { names: [], values: [] })],
  ['v2 time column of numbers', v2({ id: ['a'], time: [1] }, { names: [], values: [] })],
  [
    'v2 __proto__ names',
    v2({ id: ['a'] }, { names: ['__proto__', 'constructor', 'toString'], values: [[1], [2], [3]] }),
  ],
  [
    'v2 __proto__ keys',
    '{"schema":"bellgate.history/2","series":"s","__proto__":{"polluted":1},"runs":{"id":["a"],"__proto__":{"polluted":1}},"metrics":{"names":["m"],"values":[[1]],"__proto__":{"polluted":1}}}',
  ],
  [
    'v2 series a number',
    JSON.stringify({ schema: 'bellgate.history/2', series: 5, runs: { id: [] }, metrics: { names: [], values: [] } }),
  ],
  [
    'v1 duplicated runs',
    JSON.stringify({
      schema: 'bellgate.history/1',
      series: 's',
      runs: [
        { id: 'a', values: { m: 1 } },
        { id: 'a', values: { m: 2 } },
      ],
    }),
  ],
  ['v1 runs an object', JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: { a: { values: {} } } })],
  [
    'v1 values a list',
    JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: [{ id: 'a', values: [1, 2] }] }),
  ],
  [
    'v1 value a string',
    JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: [{ id: 'a', values: { m: '12' } }] }),
  ],
  ['v1 value 1e400', '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"a","values":{"m":1e400}}]}'],
  [
    'v1 __proto__ value key',
    '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"a","values":{"__proto__":5,"constructor":6}},{"id":"b","values":{"__proto__":{"polluted":1}}}]}',
  ],
  [
    'v1 __proto__ names, readable',
    '{"schema":"bellgate.history/1","series":"default","runs":[{"id":"a","values":{"__proto__":5,"constructor":6}},{"id":"b","values":{"__proto__":7,"toString":8}}]}',
  ],
  [
    'v1 __proto__ units',
    '{"schema":"bellgate.history/1","series":"s","runs":[{"id":"a","values":{"m":1},"units":{"__proto__":"ms","m":{"polluted":1}}}]}',
  ],
  ['v1 id empty', JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: [{ id: '', values: {} }] })],
  ['v1 id a number', JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: [{ id: 7, values: {} }] })],
  [
    'v1 time not ISO',
    JSON.stringify({ schema: 'bellgate.history/1', series: 's', runs: [{ id: 'a', time: 'yesterday', values: {} }] }),
  ],
  [
    'v1 runs out of order',
    JSON.stringify({
      schema: 'bellgate.history/1',
      series: 's',
      runs: [
        { id: 'a', time: '2026-03-02T00:00:00Z', values: {} },
        { id: 'b', time: '2026-03-01T00:00:00Z', values: {} },
      ],
    }),
  ],
  [
    'deep nesting',
    `{"schema":"bellgate.history/2","series":"s","runs":{"id":${'['.repeat(100_000)}${']'.repeat(100_000)}}}`,
  ],
  ['a BOM first', `\uFEFF${V2}`],
  ['NUL inside', V2.replace('linux-x64', 'linux\\u0000x64')],
];

describe('parseHistory and verifyHistory on hand-picked documents', () => {
  it.each(HAND)('%s', (label, text) => both(text, 'hand-picked'));

  it('a value past the double range is never read as a number', () => {
    for (const text of [
      HAND.find(([l]) => l === 'v2 value -1e400')![1],
      HAND.find(([l]) => l === 'v1 value 1e400')![1],
    ]) {
      const outcome = resultOrInputError(
        () => parseHistory(text, 'h.json'),
        (h) => {
          for (const c of h.columns.values())
            expect(c.values.every((v) => (!Number.isFinite(v) ? Number.isNaN(v) : true))).toBe(true);
        },
      );
      counter.add('hand-picked', outcome);
    }
  });
});

describe('generated documents (fixed seed)', () => {
  it('every prefix of a valid document: read whole or refused, never half-read', () => {
    fc.assert(
      fc.property(historyArbitrary('s'), fc.nat(), (h, cutAt) => {
        const text = serializeHistory(h);
        const cut = text.slice(0, cutAt % Math.max(1, text.length));
        both(cut, 'truncated');
        // A cut that still parses must be the whole document (only trailing whitespace may go).
        let parsed: History | undefined;
        try {
          parsed = parseHistory(cut, 'h.json');
        } catch {
          parsed = undefined;
        }
        if (parsed) expect(cut.trimEnd()).toBe(text.trimEnd());
      }),
      FC(300),
    );
  });

  it('one byte replaced anywhere in v1 and v2 documents', () => {
    const junk = fc.constantFrom(
      '"',
      '{',
      '}',
      '[',
      ']',
      ',',
      ':',
      '0',
      '-',
      'e',
      'n',
      'x',
      '\\',
      '\u0000',
      ' ',
      '1e400',
    );
    fc.assert(
      fc.property(fc.constantFrom(V1, V2), fc.nat(), junk, (doc, at, c) => {
        const i = at % doc.length;
        both(doc.slice(0, i) + c + doc.slice(i + 1), 'one byte changed');
      }),
      FC(400),
    );
  });

  it('v2 documents with values of every JSON type', () => {
    const value = fc.oneof(
      fc.double({ noNaN: true, noDefaultInfinity: true }),
      fc.constant(null),
      fc.string({ maxLength: 3 }),
      fc.boolean(),
      fc.constant([]),
      fc.constant({}),
    );
    fc.assert(
      fc.property(
        fc.array(fc.array(value, { minLength: 2, maxLength: 2 }), { maxLength: 4 }),
        fc.array(fc.constantFrom('__proto__', 'constructor', 'm', 'n', '<b>', ''), { maxLength: 4 }),
        (values, names) => {
          both(v2({ id: ['a', 'b'] }, { names, values }), 'v2 typed values');
        },
      ),
      FC(300),
    );
  });
});

describe('hostile histories through the CLI', () => {
  const run = work.write('run.json', '{"m": 1, "__proto__": 2}');
  const bad = HAND.filter(([l]) => !['a BOM first', 'v1 runs out of order', 'v1 time not ISO'].includes(l));
  it('check refuses an unreadable history with exit 2 or 3, and check --record never overwrites it', async () => {
    let refused = 0;
    for (const [label, text] of bad) {
      const path = work.write(`h-${refused + 1}.json`, text);
      if (resultOrInputError(() => parseHistory(text, path)) === 'ok') continue;
      refused++;
      const r = await bellgate(work.dir, ['check', '--metrics', run, '--history', path, '--record', '--id', 'x-1']);
      expect([2, 3], `${label}: ${r.stderr}`).toContain(r.code);
      expect(r.stderr).not.toMatch(STACK_LINE);
      expect(r.stderr).not.toMatch(/internal error/);
      expect(r.stderr.length).toBeLessThan(4000);
      assertInertText(r.stderr.replace(/\n/g, ' '));
      expect(readFileSync(path, 'utf8'), label).toBe(text); // never overwritten
      const v = await bellgate(work.dir, ['verify', '--history', path]);
      expect(v.code, label).toBe(2);
      expect(v.stdout + v.stderr).not.toMatch(STACK_LINE);
      assertInertText((v.stdout + v.stderr).replace(/\n/g, ' '));
      assertNoPollution();
      counter.add('cli refused', 'refused');
    }
    expect(refused).toBeGreaterThan(30);
  });

  it('a readable history with prototype names: check, verify and report --html work and stay inert', async () => {
    const text = HAND.find(([l]) => l === 'v1 __proto__ names, readable')![1];
    const h = resultOrInputError(
      () => parseHistory(text, 'h.json'),
      (hist) => {
        expect([...hist.columns.keys()].sort()).toEqual(['__proto__', 'constructor', 'toString']);
        expect(hist.columns.get('__proto__')?.values).toEqual([5, 7]);
      },
    );
    counter.add('cli readable', h);
    expect(h).toBe('ok');
    const path = work.write('proto.json', text);
    const r = await bellgate(work.dir, ['check', '--metrics', run, '--history', path, '--format', 'json']);
    expect(r.stderr).not.toMatch(STACK_LINE);
    expect(r.code, r.stderr).toBe(0);
    const byName = new Map(
      (JSON.parse(r.stdout) as { metrics: Array<{ name: string; status: string }> }).metrics.map((m) => [
        m.name,
        m.status,
      ]),
    );
    // Two runs are fewer than min-runs: learning; the run's own "__proto__" is kept, not dropped.
    expect(byName.get('__proto__')).toBe('learning');
    expect(byName.get('m')).toBe('new');
    const html = join(work.dir, 'proto.html');
    const rep = await bellgate(work.dir, ['report', '--history', path, '--html', html]);
    expect(rep.code, rep.stderr).toBe(0);
    assertInertHtml(readFileSync(html, 'utf8'));
    assertNoPollution();
  });

  it('verify lists problems quoting hostile names without control or bidi characters', async () => {
    const text = v2({ id: ['a'] }, { names: ['x\u202Ey', 'x\u202Ey', 'esc\u001b[2J'], values: [[1], [2], [1e308]] });
    const path = work.write('named-verify.json', text);
    const v = await bellgate(work.dir, ['verify', '--history', path]);
    expect(v.code).toBe(2);
    assertInertText((v.stdout + v.stderr).replace(/\n/g, ' '));
    counter.add('cli refused', 'refused');
  });
});

describe('import with hostile names', () => {
  it('skips names every reader refuses (with a reason shown inert) and keeps the rest exactly', async () => {
    const refused = ['a\u202Eb', 'esc\u001b[2J', 'x'.repeat(10 * 1024), ' '];
    const kept = ['__proto__', 'constructor', '<img src=x onerror=alert(1)>', '@team|#1'];
    const lines = [0, 1, 2].map((i) =>
      JSON.stringify({
        id: `r${i}`,
        time: `2026-03-0${i + 1}T00:00:00Z`,
        metrics: [...refused, ...kept].map((name, k) => ({ name, value: 10 + i + k })),
      }),
    );
    const runs = work.write('import/runs.jsonl', lines.join('\n'));
    const wide = work.write('import/runs.csv', `id,time,"a\u202Eb",__proto__\nw1,2026-03-05T00:00:00Z,1,2\n`);
    const history = join(work.dir, 'import/history.json');
    for (const file of [runs, wide]) {
      const r = await bellgate(work.dir, ['import', '--history', history, '--runs', file]);
      expect(r.code, r.stderr).toBe(0);
      expect(r.stderr).toMatch(/skipped .*control character|skipped .*bidirectional/);
      assertInertText(r.stderr.replace(/\n/g, ' '));
      expect(r.stderr).not.toMatch(STACK_LINE);
    }
    const h = parseHistory(readFileSync(history, 'utf8'), 'h.json');
    expect([...h.columns.keys()].sort()).toEqual([...kept].sort());
    // "__proto__" is the fifth name of each JSON Lines run (10 + run + 4), then the CSV's 2.
    expect(h.columns.get('__proto__')?.values).toEqual([14, 15, 16, 2]);
    assertNoPollution();
    counter.add('cli import', 'ok');
  });
});
