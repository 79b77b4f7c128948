import { describe, expect, it } from 'vitest';
import type { MetricResult } from '../../src/gate/report.js';
import { commentMarker, markerLine } from '../../src/report/marker.js';
import { MARKDOWN_LIMIT, renderMarkdown } from '../../src/report/markdown.js';
import { HOSTILE, makeFixture } from './fixture.js';

/** Rows of GFM tables (GitHub Flavored Markdown spec, section 4.10 "Tables"), header and delimiter rows left out. */
function tableRows(md: string): string[] {
  return md.split('\n').filter((l) => l.startsWith('| ') && !l.startsWith('| status |'));
}

/** Cells of a row: split on pipes not preceded by a backslash (GFM 4.10: `\|` is a literal pipe). */
const cellCount = (row: string): number => row.split(/(?<!\\)\|/).length - 2;

describe('renderMarkdown', () => {
  const { report } = makeFixture();

  it('starts with the hidden marker and a verdict line, and ends with the footer', () => {
    const md = renderMarkdown(report, {
      marker: commentMarker('linux-x64'),
      runUrl: 'https://github.com/o/r/actions/runs/7',
    });
    const lines = md.split('\n');
    expect(lines[0]).toBe('<!-- bellgate:series=linux-x64 -->');
    expect(lines[1]).toContain('**regressed**');
    expect(md).toContain('[workflow run](https://github.com/o/r/actions/runs/7)');
    expect(md.trimEnd().split('\n').at(-1)).toContain('Bellgate');
  });

  it('has one table row per metric, with 9 cells each, flagged ones outside <details>', () => {
    const md = renderMarkdown(report);
    const rows = tableRows(md);
    expect(rows.length).toBe(report.metrics.length);
    for (const r of rows) expect(cellCount(r)).toBe(9);
    const [open, closed = ''] = md.split('<details>');
    expect(open).toContain('▲ **regressed**');
    expect(closed).toContain('● ok');
    expect(closed).not.toContain('regressed**');
  });

  it('draws a sparkline of recent runs and this run for each flagged metric', () => {
    const md = renderMarkdown(report);
    const line = md.split('\n').find((l) => l.startsWith('- **build/time**')) ?? '';
    const spark = /`([▁▂▃▄▅▆▇█ ]+)→([▁▂▃▄▅▆▇█])`/.exec(line);
    expect(spark).not.toBeNull();
    expect(Array.from(spark?.[1] ?? '').length).toBe(20);
    // This run (47.9 s) is far above every recent value, so it is the full block.
    expect(spark?.[2]).toBe('█');
  });

  it('keeps hostile names inert in table cells and text', () => {
    const hostile = Object.values(HOSTILE).map((name) => ({
      name,
      unit: '<b>',
      centre: 5,
      spread: 1,
      now: 9,
      status: 'regressed' as const,
    }));
    const { report: bad } = makeFixture(hostile);
    const md = renderMarkdown(bad, { runUrl: 'javascript:alert(1)' });
    expect(md).not.toMatch(/<img|<b>/i);
    expect(md).not.toContain('](javascript');
    expect(md).not.toMatch(/@team/);
    expect(md).not.toMatch(/#123/);
    expect(md).not.toMatch(/[\u0000-\u0009\u000B-\u001F\u202A-\u202E\u2066-\u2069]/);
    expect(md).not.toContain('L'.repeat(201));
    for (const r of tableRows(md)) expect(cellCount(r)).toBe(9);
    expect(tableRows(md).length).toBe(bad.metrics.length);
  });

  it("stays under GitHub's 65,536-character comment limit, with a note on what was cut", () => {
    const base = makeFixture().report;
    const many: MetricResult[] = Array.from({ length: 3000 }, (_, i) => ({
      ...(base.metrics[1] as MetricResult),
      name: `suite-${i}/${'x'.repeat(150)}`,
      status: i < 400 ? 'regressed' : 'ok',
    }));
    const md = renderMarkdown({ ...base, metrics: many });
    expect(md.length).toBeLessThan(MARKDOWN_LIMIT);
    expect(md).toContain('more metrics not shown');
    expect(md).toContain('more flagged metrics not shown');
    expect(md).toContain('</details>');
  });

  it('puts everything in <details> when nothing is flagged', () => {
    const quiet = {
      ...report,
      verdict: 'pass' as const,
      metrics: report.metrics.filter((m) => m.status === 'ok'),
      groups: [],
    };
    const md = renderMarkdown(quiet);
    const [open, closed = ''] = md.split('<details>');
    expect(open).toContain('**pass**');
    expect(tableRows(open ?? '').length).toBe(0);
    expect(tableRows(closed).length).toBe(quiet.metrics.length);
  });

  it('keeps any series name inside one HTML comment', () => {
    const line = markerLine(commentMarker('x --> <script>\n'));
    expect(line.startsWith('<!-- ')).toBe(true);
    expect(line.endsWith(' -->')).toBe(true);
    // HTML Living Standard, "Comments": the text must not contain "--" or ">" .
    expect(line.slice(4, -3)).not.toMatch(/--|>|\n/);
  });
});
