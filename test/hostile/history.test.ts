// Hostile history documents: truncated, wrong version, duplicated runs, non-finite values, wrong
// types, prototype keys — through parseHistory and verifyHistory, and through the CLI (check,
// verify, report --html, check --record), where an unreadable history is refused clearly and never
// overwritten (DEVELOPERS.md, "The history document"). Numbers past the double range read as Infinity by JSON.parse
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
  const problems = verifyHistory(text);
  if (outcome === 'refused') expect(problems.length).toBeGreaterThan(0);
  if (problems.length === 0) expect(outcome).toBe('ok');
  for (const p of problems) {
    expect(p.problem.length).toBeGreaterThan(0);
    expect(p.problem).not.toMatch(/\[object Object\]/);
  }
  assertNoPollution();
  counter.add(label, outcome);
}

const V3 = readFileSync(new URL('../fixtures/history/v3-small.jsonl', import.meta.url), 'utf8');

const HEADER = '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"m"},{"name":"n","unit":"ms"}]}';
const v3 = (...lines: string[]): string => `${[HEADER, ...lines].join('\n')}\n`;

const HAND: Array<[string, string]> = [
  ['empty text', ''],
  ['not JSON', 'schema: bellgate.history/3'],
  ['an array', '[]\n'],
  ['null', 'null\n'],
  ['no schema', '{"series":"s","metrics":[]}\n'],
  ['schema a number', '{"schema":3}\n'],
  ['newer version', '{"schema":"bellgate.history/4","series":"s","metrics":[]}\n'],
  ['older version', '{"schema":"bellgate.history/2","series":"s","runs":{"id":[]}}\n'],
  ['version 0', '{"schema":"bellgate.history/0"}\n'],
  ['version with leading zero', '{"schema":"bellgate.history/03","series":"s","metrics":[]}\n'],
  ['version 1e9', '{"schema":"bellgate.history/999999999"}\n'],
  ['version fractional', '{"schema":"bellgate.history/3.5"}\n'],
  ['other schema', '{"schema":"acme.history/3"}\n'],
  ['series a number', '{"schema":"bellgate.history/3","series":5,"metrics":[]}\n'],
  ['metrics an object', '{"schema":"bellgate.history/3","series":"s","metrics":{"0":"m"}}\n'],
  ['metric listed twice', '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"m"},{"name":"m"}]}\n'],
  ['metric unit a number', '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"m","unit":5}]}\n'],
  ['metric name empty', '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":""}]}\n'],
  ['run id a number', v3('{"id":7,"values":[1]}')],
  ['run id empty', v3('{"id":"","values":[1]}')],
  ['run id 10,000 characters', v3(`{"id":"${'x'.repeat(10_000)}","values":[1]}`)],
  ['run seen twice (the later line counts)', v3('{"id":"a","values":[1]}', '{"id":"a","values":[2]}')],
  ['more values than metrics', v3('{"id":"a","values":[1,2,3]}')],
  ['value 1e400', v3('{"id":"a","values":[1e400]}')],
  ['value -1e400', v3('{"id":"a","values":[-1e400]}')],
  ['value "NaN"', v3('{"id":"a","values":["NaN"]}')],
  ['value true', v3('{"id":"a","values":[true]}')],
  ['value an object', v3('{"id":"a","values":[{"valueOf":1}]}')],
  ['values an object', v3('{"id":"a","values":{"m":1}}')],
  ['time a number', v3('{"id":"a","time":1}')],
  ['time not ISO (readable, flagged by verify)', v3('{"id":"a","time":"yesterday","values":[1]}')],
  ['pr negative', v3('{"id":"a","pr":-3}')],
  ['marks not a list', v3('{"id":"a","marks":{"reason":"manual"}}')],
  ['mark of another reason', v3('{"id":"a","marks":[{"reason":"because"}]}')],
  [
    'mark line for an unknown run (readable, flagged by verify)',
    v3('{"id":"a","values":[1]}', '{"mark":"zz","reason":"manual"}'),
  ],
  ['drop of a number', v3('{"drop":5}')],
  ['a line of no kind', v3('{"who":"knows"}')],
  ['torn last line (readable, flagged by verify)', `${v3('{"id":"a","values":[1]}')}{"id":"b","val`],
  [
    '__proto__ names',
    '{"schema":"bellgate.history/3","series":"s","metrics":[{"name":"__proto__"},{"name":"constructor"},{"name":"toString"}]}\n{"id":"a","values":[1,2,3]}\n',
  ],
  [
    '__proto__ keys',
    '{"schema":"bellgate.history/3","series":"s","__proto__":{"polluted":1},"metrics":[{"name":"m","__proto__":{"polluted":1}}]}\n{"id":"a","__proto__":{"polluted":1},"values":[1]}\n',
  ],
  ['deep nesting', v3(`{"id":"a","values":${'['.repeat(100_000)}${']'.repeat(100_000)}}`)],
  ['a BOM first', `\uFEFF${V3}`],
  ['NUL inside', V3.replace('linux-x64', 'linux\\u0000x64')],
];
describe('parseHistory and verifyHistory on hand-picked documents', () => {
  it.each(HAND)('%s', (label, text) => both(text, 'hand-picked'));

  it('a value past the double range is never read as a number', () => {
    for (const text of [HAND.find(([l]) => l === 'value -1e400')![1], HAND.find(([l]) => l === 'value 1e400')![1]]) {
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
  it('every prefix of a valid document: refused, or read as its complete lines (a torn last line left out)', () => {
    fc.assert(
      fc.property(historyArbitrary('s'), fc.nat(), (h, cutAt) => {
        const text = serializeHistory(h);
        const cut = text.slice(0, cutAt % Math.max(1, text.length));
        both(cut, 'truncated');
        // A cut that parses holds a prefix of the runs: every whole line, the torn one left out.
        let parsed: History | undefined;
        try {
          parsed = parseHistory(cut, 'h.jsonl');
        } catch {
          parsed = undefined;
        }
        if (parsed) {
          const whole = parseHistory(text, 'h.jsonl');
          for (const run of parsed.runs) expect(whole.runs.map((r) => r.id)).toContain(run.id);
        }
      }),
      FC(300),
    );
  });

  it('one byte replaced anywhere in a document', () => {
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
      fc.property(fc.constant(V3), fc.nat(), junk, (doc, at, c) => {
        const i = at % doc.length;
        both(doc.slice(0, i) + c + doc.slice(i + 1), 'one byte changed');
      }),
      FC(400),
    );
  });

  it('run lines with values of every JSON type, and header names of every kind', () => {
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
        fc.array(fc.array(value, { maxLength: 3 }), { maxLength: 4 }),
        fc.array(fc.constantFrom('__proto__', 'constructor', 'm', 'n', '<b>', ''), { maxLength: 4 }),
        (rows, names) => {
          const header = JSON.stringify({
            schema: 'bellgate.history/3',
            series: 's',
            metrics: names.map((name) => ({ name })),
          });
          const lines = rows.map((values, i) => JSON.stringify({ id: `r${i}`, values }));
          both(`${[header, ...lines].join('\n')}\n`, 'typed values');
        },
      ),
      FC(300),
    );
  });
});

describe('hostile histories through the CLI', () => {
  const run = work.write('run.json', '{"m": 1, "__proto__": 2}');
  const bad = HAND.filter(([l]) => !/readable|a BOM first|seen twice/.test(l));
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
    expect(refused).toBeGreaterThan(25);
  });

  it('a readable history with prototype names: check, verify and report --html work and stay inert', async () => {
    const text =
      '{"schema":"bellgate.history/3","series":"default","metrics":[{"name":"__proto__"},{"name":"constructor"},{"name":"toString"}]}\n' +
      '{"id":"a","time":"2026-03-01T00:00:00.000Z","values":[5,6]}\n{"id":"b","time":"2026-03-02T00:00:00.000Z","values":[7,null,8]}\n';
    const h = resultOrInputError(
      () => parseHistory(text, 'h.jsonl'),
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
    const text = `${JSON.stringify({ schema: 'bellgate.history/3', series: 's', metrics: [{ name: 'x\u202Ey' }, { name: 'esc\u001b[2J' }] })}\n{"id":"a","values":[1,1e400]}\n`;
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
    const h = parseHistory(readFileSync(history, 'utf8'), 'h.jsonl');
    expect([...h.columns.keys()].sort()).toEqual([...kept].sort());
    // "__proto__" is the fifth name of each JSON Lines run (10 + run + 4), then the CSV's 2.
    expect(h.columns.get('__proto__')?.values).toEqual([14, 15, 16, 2]);
    assertNoPollution();
    counter.add('cli import', 'ok');
  });
});
