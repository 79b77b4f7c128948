import { describe, expect, it } from 'vitest';
import { OK_ROWS_LISTED } from '../../src/report/ok-rows.js';
import { renderText } from '../../src/report/text.js';
import { HOSTILE, makeFixture } from './fixture.js';

// ECMA-48 (ANSI X3.64) control sequences start with ESC (0x1B); a terminal report without colour
// must contain none, and metric names must never be able to inject one.
const ESC = '\u001b';

describe('renderText', () => {
  const { report } = makeFixture();

  it('prints the verdict, the counts and every status word without colour', () => {
    const out = renderText(report, { color: false });
    expect(out).not.toContain(ESC);
    expect(out.split('\n')[0]).toContain('REGRESSED');
    expect(out).toContain('1 regressed, 1 improved, 1 missing, 2 ok, 1 learning, 1 new, 1 ignored');
    for (const word of [
      '▲ regressed',
      '▼ improved',
      '● ok',
      '✕ missing (1): search/index-size',
      '◌ learning (1): parse/front-matter',
      '✚ new (1): image/resize',
      '– ignored (1): legacy/old-bench',
    ]) {
      expect(out).toContain(word);
    }
    expect(out).toContain('shared move of timings: ok');
    expect(out).toContain('family control: none');
  });

  it('counts the ok metrics on one line beyond OK_ROWS_LISTED, keeps every flagged row, and lists all with `all`', () => {
    // The fixture holds 2 ok metrics; extra ok ones take the count to the limit and one past it.
    const okRows = (out: string): number => out.split('\n').filter((l) => /^● ok {2,}/.test(l)).length;
    const withOk = (count: number) =>
      makeFixture(
        Array.from({ length: count - 2 }, (_, i) => ({
          name: `extra/m${i}`,
          centre: 5,
          spread: 1,
          now: 5,
          status: 'ok' as const,
        })),
      ).report;
    const atLimit = renderText(withOk(OK_ROWS_LISTED), { color: false });
    expect(okRows(atLimit)).toBe(OK_ROWS_LISTED);
    expect(atLimit).not.toContain('not listed');
    const past = withOk(OK_ROWS_LISTED + 1);
    const folded = renderText(past, { color: false });
    expect(okRows(folded)).toBe(0);
    expect(folded).toContain(
      `● ok (${OK_ROWS_LISTED + 1}): within their baselines, not listed (--all lists every metric)`,
    );
    for (const word of ['▲ regressed', '▼ improved', 'build/time']) expect(folded).toContain(word);
    expect(okRows(renderText(past, { color: false, all: true }))).toBe(OK_ROWS_LISTED + 1);
  });

  it('lists regressed and improved before ok in the table', () => {
    const out = renderText(report, { color: false });
    const at = (name: string): number => out.indexOf(`  ${name} `);
    expect(at('build/time')).toBeGreaterThan(0);
    expect(at('build/time')).toBeLessThan(at('render/page-md'));
    expect(at('render/page-md')).toBeLessThan(at('bundle/app.js.gz'));
  });

  it('colours only when asked, and keeps the words when it does', () => {
    const out = renderText(report, { color: true });
    expect(out).toContain(ESC);
    const plain = out.replace(/\u001b\[[0-9;]*m/g, '');
    expect(plain).toBe(renderText(report, { color: false }));
  });

  it('keeps escape sequences, bidi overrides and line breaks of metric names out of the terminal', () => {
    const hostile = Object.values(HOSTILE).map((name) => ({
      name: `${name}\nsecond line`,
      unit: 'u\u001b[2J',
      centre: 5,
      spread: 1,
      now: 5,
      status: 'ok' as const,
    }));
    const out = renderText(makeFixture(hostile).report, { color: false });
    expect(out).not.toContain(ESC);
    expect(out).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u202A-\u202E\u2066-\u2069]/);
    expect(out).not.toMatch(/^second line/m);
    // Names are capped, so a 10 KB name cannot flood the log.
    expect(out).not.toContain('L'.repeat(100));
  });

  it('aligns every column by code points, whatever the names hold (accents, CJK, astral emoji, long names)', () => {
    // Reference: the column start is where the header word starts, counted in code points as
    // Array.from counts them (so a surrogate pair is one), after the cells before it and 2 spaces.
    const names = [
      'plain/name',
      'accent/é-ü',
      'cjk/名前',
      'emoji/\u{1F680}\u{1F680}-x',
      'lone/\uD800-surrogate',
      `long/${'n'.repeat(120)}`,
    ];
    const extra = names.map((name) => ({ name, unit: 'µs', centre: 5, spread: 1, now: 5, status: 'ok' as const }));
    const lines = renderText(makeFixture(extra).report, { color: false }).split('\n');
    const header = lines.find((l) => l.startsWith('status'))!;
    const start = (line: string, text: string): number => Array.from(line.slice(0, line.indexOf(text))).length;
    const valueColumn = start(header, 'this run');
    const baselineColumn = start(header, 'baseline');
    const rows = lines.filter((l) => /^[▲▼●] /.test(l));
    expect(rows.length).toBe(4 + names.length);
    for (const row of rows) {
      const points = Array.from(row);
      // The cell before each column start ends with two spaces, and the column starts with a non-space.
      for (const column of [valueColumn, baselineColumn]) {
        expect(points.slice(column - 2, column).join('')).toBe('  ');
        expect(points[column]).not.toBe(' ');
      }
    }
    // The long name is capped with an ellipsis at 80 code points, the others shown whole.
    expect(rows.some((r) => r.includes(`long/${'n'.repeat(74)}…`))).toBe(true);
    expect(rows.some((r) => r.includes('emoji/\u{1F680}\u{1F680}-x'))).toBe(true);
  });

  it('aligns all seven columns with astral units, no units and mixed statuses (widths counted only where a pair can occur)', () => {
    // Reference as above: Array.from code points. Units with a surrogate pair, units without, no
    // unit at all; regressed, improved and ok rows; the glyph and number cells are in the BMP.
    const extra = [
      { name: 'unitless/a', centre: 5, spread: 1, now: 5.2, status: 'ok' as const },
      { name: 'astral/\u{1F680}', unit: '\u{1D4C8}/op', centre: 12, spread: 1, now: 19, status: 'regressed' as const },
      {
        name: 'astral/unit',
        unit: '\u{1F552}',
        centre: 1200,
        spread: 10,
        now: 1150,
        status: 'improved' as const,
        worse: 'higher' as const,
      },
      { name: 'unitless/\u{1F680}\u{1F680}', centre: 0.004, spread: 0.0001, now: 0.0041, status: 'ok' as const },
    ];
    const lines = renderText(makeFixture(extra).report, { color: false }).split('\n');
    const header = lines.find((l) => l.startsWith('status'))!;
    const start = (line: string, text: string): number => Array.from(line.slice(0, line.indexOf(text))).length;
    const columns = ['metric', 'this run', 'baseline', 'change', 'sigma', 'rel. density'].map((word) =>
      start(header, word),
    );
    const rows = lines.filter((l) => /^[▲▼●] /.test(l));
    expect(rows.length).toBe(4 + extra.length);
    for (const row of rows) {
      const points = Array.from(row);
      for (const column of columns) {
        expect(points.slice(column - 2, column).join('')).toBe('  ');
        expect(points[column]).not.toBe(' ');
      }
    }
  });
});
