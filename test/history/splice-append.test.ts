// The text splice of an append must write what the generic writer writes. The references are the
// generic writer serializeHistory (JSON.stringify of every row) and the engine's JSON.parse
// (ECMA-262 section 25.5.1): both outputs must read back to the same History, number for number
// (Object.is, so -0 and 0 differ), whatever the spacing and number forms of the file read.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Run } from '../../src/inputs/run.js';
import { parseHistory, parseHistoryBytes, serializeHistory } from '../../src/history/document.js';
import type { History, RunInfo } from '../../src/history/history.js';
import { appendRun, trimHistory } from '../../src/history/merge.js';
import { spliceHistory, writtenHistory, type WrittenHistory } from '../../src/history/splice-append.js';
import { historyArbitrary, metricName } from './arbitraries.js';

const SPACES = ['', ' ', '\n', '\t', '\r\n', '   '];

/**
 * h written the way a person or another program might: any JSON spacing, members in another
 * order, numbers as exponents, 17 digits, or "-0" for a zero — every form reads back to h's value
 * (the zeros to -0, which the generic writer prints as 0).
 */
function oddText(h: History, noise: number[]): string {
  let k = 0;
  const pick = (): number => noise[k++ % noise.length] ?? 0;
  const ws = (): string => SPACES[pick() % SPACES.length] ?? '';
  const num = (v: number): string => {
    if (Number.isNaN(v)) return 'null';
    const form = pick() % 4;
    if (form === 0) return JSON.stringify(v);
    if (form === 1) return v.toExponential();
    if (form === 2) return v === 0 ? '-0' : v.toPrecision(17);
    return String(v);
  };
  const rows = [...h.columns.values()].map(
    (c) => `[${ws()}${c.values.map((v) => `${ws()}${num(v)}${ws()}`).join(',')}]`,
  );
  const runs: Record<string, unknown[]> = { id: h.runs.map((r) => r.id) };
  for (const field of ['sha', 'ref', 'event', 'time'] as const)
    if (pick() % 3 > 0) runs[field] = h.runs.map((r) => r[field] ?? null);
  const names = JSON.stringify([...h.columns.keys()], null, pick() % 3);
  const units = JSON.stringify([...h.columns.values()].map((c) => c.unit ?? null));
  const metrics = `{${ws()}"names"${ws()}:${names},"units":${ws()}${units},${ws()}"values"${ws()}:${ws()}[${ws()}${rows.join(`${ws()},${ws()}`)}${ws()}]${ws()}}`;
  const parts = [
    '"schema":"bellgate.history/2"',
    `"series":${JSON.stringify(h.series)}`,
    `"runs":${JSON.stringify(runs, null, pick() % 3)}`,
    `"metrics"${ws()}:${metrics}`,
  ];
  if (pick() % 2 === 1) parts.reverse();
  return `${ws()}{${ws()}${parts.join(`,${ws()}`)}${ws()}}${ws()}`;
}

/** The document read from text, as a store's load keeps it; fails the test when the fast reader declines it. */
function readWritten(text: string): WrittenHistory & { history: History } {
  const bytes = Buffer.from(text, 'utf8');
  const { history, rows } = parseHistoryBytes(bytes, 'h.json');
  expect(rows).toBeDefined();
  return { ...writtenHistory(bytes, rows!, history), history };
}

/** A History as comparable plain data, each number shown with its sign of zero (Object.is). */
function plain(h: History): unknown {
  return {
    series: h.series,
    runs: h.runs,
    columns: [...h.columns].map(([name, c]) => [
      name,
      c.unit ?? null,
      c.values.map((v) => (Object.is(v, -0) ? '-0' : String(v))),
    ]),
  };
}

/** Splice and generic writer give documents that read back the same; returns whether the splice applied. */
function agrees(h: History, written: WrittenHistory): boolean {
  const spliced = spliceHistory(h, written);
  const generic = serializeHistory(h);
  if (spliced === undefined) return false;
  const text = spliced.toString('utf8');
  expect(plain(parseHistory(text, 'spliced.json'))).toEqual(plain(parseHistory(generic, 'generic.json')));
  // The same bytes read by JSON.parse alone (no Bellgate decoding in between).
  expect(JSON.stringify(JSON.parse(text))).toBe(JSON.stringify(JSON.parse(generic)));
  return true;
}

const runOf = (entries: [string, number, string | undefined][]): Run => ({
  metrics: new Map(
    entries.map(([name, value, unit]) => [name, unit === undefined ? { value, count: 1 } : { value, unit, count: 1 }]),
  ),
  meta: new Map(),
});

const finite = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -0, 1e-300, -1e-300, 5e-324, Number.MAX_VALUE, 0.1, 1 / 3, 123456789012345680000),
);

describe('spliceHistory', () => {
  it('writes what serializeHistory writes after any append (copied or in place) and trim of any history, however the file was spaced (fast-check)', () => {
    let spliced = 0;
    fc.assert(
      fc.property(
        historyArbitrary('series "x"'),
        fc.array(fc.nat(), { minLength: 1, maxLength: 40 }),
        fc.array(fc.tuple(metricName(), finite, fc.option(fc.constantFrom('ms', 'B', 'é'), { nil: undefined })), {
          maxLength: 6,
        }),
        fc.constantFrom('new', 'old-id', 'early'),
        fc.option(fc.integer({ min: 1, max: 10 }), { nil: undefined }),
        fc.boolean(),
        (h0, noise, entries, kind, keep, extendInPlace) => {
          const written = readWritten(oddText(h0, noise));
          // appendRun refuses a blank id; any other id already present is replaced (the merge path).
          const id = (kind === 'old-id' ? h0.runs.find((r) => r.id.trim() !== '')?.id : undefined) ?? 'new-run';
          const info: RunInfo = {
            id,
            time: kind === 'early' ? '2019-01-01T00:00:00.000Z' : '2031-01-01T00:00:00.000Z',
          };
          // extendInPlace (as record does) pushes onto the very arrays the splice compares with.
          const appended = appendRun(written.history, info, runOf(entries), { extendInPlace });
          if (agrees(keep === undefined ? appended : trimHistory(appended, keep), written)) spliced += 1;
        },
      ),
      { numRuns: 1500 },
    );
    // Not vacuous: most cases (a new newest run) take the splice, not the fallback.
    expect(spliced).toBeGreaterThan(500);
  });

  it('the usual record splices: a newest run appended, then trimmed by 0, 1 or 3 runs; values -0, 1e-300 and missing ones intact', () => {
    const runs: RunInfo[] = Array.from({ length: 5 }, (_, i) => ({
      id: `${80 + i}-1`,
      time: `2026-03-0${i + 1}T10:00:00.000Z`,
    }));
    const text =
      '{"schema":"bellgate.history/2","series":"linux-x64",\n"runs":' +
      JSON.stringify({ id: runs.map((r) => r.id), time: runs.map((r) => r.time) }) +
      ',\n"metrics":{"names":["__proto__","a/\\"b\\"","gone"],"units":["ms",null,null],"values":[\n' +
      '[ 1.5 , -0,1e-300,null,  2 ],\n[null,null,null,null,7E2],\n[9, null ,null,null,null]]}}\n';
    const written = readWritten(text);
    const next = appendRun(
      written.history,
      { id: '90-1', time: '2026-03-09T10:00:00.000Z' },
      runOf([['a/"b"', 4.25, undefined]]),
    );
    for (const keep of [Infinity, 5, 3]) expect(agrees(trimHistory(next, keep), written)).toBe(true);
    // The -0 row is written fresh (as 0, like the generic writer); the others keep their bytes.
    const kept = spliceHistory(next, written)!.toString('utf8');
    expect(kept).toContain('[null,null,null,null,7E2,4.25]');
    expect(kept).toContain('[1.5,0,1e-300,null,2,null]');
    // trimmed by 3: the row "gone" holds no value any more and is dropped, as trimHistory drops it.
    const trimmed = spliceHistory(trimHistory(next, 3), written)!.toString('utf8');
    expect(trimmed).toContain('"names":["__proto__","a/\\"b\\""]');
    expect(trimmed).toContain('[null,  2 ,null]');
    expect(trimmed).toContain('[null,7E2,4.25]');
  });

  it('very long rows (3,000 runs) splice like the generic writer', () => {
    const n = 3000;
    const runs = Array.from({ length: n }, (_, i) => `${i}-1`);
    const values = (seed: number) =>
      Array.from({ length: n }, (_, i) => ((i * 7919 + seed) % 101 === 0 ? null : ((i * 7919 + seed) % 10007) / 7));
    const text = `{"schema":"bellgate.history/2","series":"s","runs":{"id":${JSON.stringify(runs)}},"metrics":{"names":["x","y"],"values":[${JSON.stringify(values(1))},\n${JSON.stringify(values(2))}]}}`;
    const written = readWritten(text);
    const next = appendRun(written.history, { id: 'last' }, runOf([['x', 1, undefined]]));
    expect(agrees(next, written)).toBe(true);
    expect(agrees(trimHistory(next, 2000), written)).toBe(true);
  });

  it('declines what is not an append to the document read: runs reordered, the first run dropped from the middle', () => {
    const text =
      '{"schema":"bellgate.history/2","series":"s","runs":{"id":["a","b","c"]},"metrics":{"names":["m"],"values":[[1,2,3]]}}';
    const written = readWritten(text);
    const h = written.history;
    const reordered: History = { ...h, runs: [h.runs[1]!, h.runs[0]!, h.runs[2]!] };
    expect(spliceHistory(reordered, written)).toBeUndefined();
    const gap: History = { series: 's', runs: [h.runs[0]!, h.runs[2]!], columns: new Map([['m', { values: [1, 3] }]]) };
    expect(spliceHistory(gap, written)).toBeUndefined();
  });

  it('refuses to write a History that cannot be stored, as serializeHistory does', () => {
    const written = readWritten(
      '{"schema":"bellgate.history/2","series":"s","runs":{"id":["a"]},"metrics":{"names":["m"],"values":[[1]]}}',
    );
    const bad: History = {
      series: 's',
      runs: [{ id: 'a' }, { id: 'b' }],
      columns: new Map([['m', { values: [1, Infinity] }]]),
    };
    expect(() => spliceHistory(bad, written)).toThrow(/holds Infinity, which cannot be stored/);
    expect(() => serializeHistory(bad)).toThrow(/holds Infinity, which cannot be stored/);
    const twice: History = { series: 's', runs: [{ id: 'a' }, { id: 'a' }], columns: new Map() };
    expect(() => spliceHistory(twice, written)).toThrow(/appears twice/);
  });
});
