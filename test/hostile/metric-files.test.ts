// Hostile metric files in every format (own JSON, JSON Lines, CSV long and wide, OpenMetrics, Go
// benchmark, JUnit XML): well-formed documents carrying hostile names, values and units, chosen
// by fast-check (fixed seed, bounded runs; property-based testing is common practice for parsers),
// plus hand-picked attacks. The contract (src/inputs/parse.ts): sound readings, or an InputError
// that names the file — never another error, never a prototype touched.
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { checkMetricName, checkUnit } from '../../src/inputs/names.js';
import { parseMetricText } from '../../src/inputs/parse.js';
import type { ReadResult } from '../../src/inputs/run.js';
import { bellgate, scratch } from '../cli/helpers/cli-harness.js';
import { assertNoPollution, CaseCounter, FC, settledOrInputError, STACK_LINE } from './guards.js';
import { assertInertHtml, assertInertMarkdown, assertInertText } from './outputs.js';

const counter = new CaseCounter('metric files');
const work = scratch('bellgate-hostile-files-');
afterAll(() => {
  counter.print();
  work.remove();
});

const FILE = 'hostile.metrics';

/** Names that must come out inert: object machinery, markup, mentions, table breakers. */
const NASTY = [
  '__proto__',
  'constructor',
  'toString',
  'hasOwnProperty',
  '<img src=x onerror=alert(1)>',
  '](javascript:alert(1))',
  '@team',
  '#123',
  '`x`',
  'a|b',
  '"quoted"',
  "it's",
  '&amp;',
  '\\',
  '名前',
  '😀',
];
/** Characters every reader must refuse in a name. */
const REFUSED_CHARS = ['\u0000', '\u0007', '\u001b', '\u007f', '\u0085', '\u009b', '\u202e', '\u2066'];

// Weighted so that about half the documents are valid and read, the rest refused for one reason.
const nameArb = fc.oneof(
  { arbitrary: fc.constantFrom(...NASTY), weight: 12 },
  { arbitrary: fc.string({ unit: 'grapheme', minLength: 1, maxLength: 20 }), weight: 6 },
  {
    arbitrary: fc.tuple(fc.constantFrom(...NASTY), fc.constantFrom(...REFUSED_CHARS)).map(([a, b]) => `${a}${b}`),
    weight: 1,
  },
  { arbitrary: fc.constantFrom('', ' ', 'x'.repeat(513), 'y'.repeat(10 * 1024)), weight: 1 },
);
const numberText = fc.oneof(
  { arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }).map(String), weight: 15 },
  fc.constantFrom(
    'NaN',
    'Infinity',
    '-Infinity',
    '1e400',
    '-1e400',
    '-0',
    '',
    ' ',
    '0x10',
    '1_000',
    '1,5',
    '+1',
    '.5',
    '5.',
    '1e',
    'null',
    'true',
    '١٢',
  ),
);
const unitArb = fc.oneof(
  { arbitrary: fc.constantFrom('ns', 'B', '<b>u</b>', '@u', 'a|b', ''), weight: 8 },
  { arbitrary: fc.constantFrom('x'.repeat(65), 'm\u202es'), weight: 1 },
  { arbitrary: fc.string({ maxLength: 8 }), weight: 2 },
);

/** The contract of one parse, counted under `format`. */
async function contract(text: string, format: string | undefined, label: string): Promise<void> {
  const outcome = await settledOrInputError(
    () => parseMetricText(text, FILE, format),
    (result: ReadResult) => {
      for (const r of result.readings) {
        checkMetricName(r.name); // throws on a name no reader should have let through
        if (r.unit !== undefined) checkUnit(r.unit);
      }
      expect(result.readings.every((r) => Number.isFinite(r.value))).toBe(true);
      expect(result.readings.length + result.notFitted.size).toBeGreaterThan(0);
    },
  );
  counter.add(label, outcome);
}

async function refusalNamesFile(text: string, format: string): Promise<void> {
  try {
    await parseMetricText(text, FILE, format);
  } catch (error) {
    expect((error as { where?: string }).where ?? '').toContain(FILE);
  }
}

const csvCell = (s: string): string => `"${s.replace(/"/g, '""')}"`;
const xmlAttr = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/"/g, '&quot;');

/** Each format's document built from (name, value text, unit) triples. */
const BUILDERS: Record<string, (rows: Array<[string, string, string]>) => string> = {
  'json list': (rows) =>
    `{"metrics":[${rows.map(([n, v, u]) => `{"name":${JSON.stringify(n)},"value":${v === '' ? '""' : v},"unit":${JSON.stringify(u)}}`).join(',')}]}`,
  'json flat': (rows) => `{${rows.map(([n, v]) => `${JSON.stringify(n)}:${v === '' ? '""' : v}`).join(',')}}`,
  jsonl: (rows) =>
    rows
      .map(([n, v, u]) => `{"name":${JSON.stringify(n)},"value":${v === '' ? 'null' : v},"unit":${JSON.stringify(u)}}`)
      .join('\n'),
  'csv long': (rows) =>
    `name,value,unit\n${rows.map(([n, v, u]) => `${csvCell(n)},${csvCell(v)},${csvCell(u)}`).join('\r\n')}`,
  'csv wide': (rows) => `${rows.map(([n]) => csvCell(n)).join(',')}\n${rows.map(([, v]) => csvCell(v)).join(',')}\n`,
  openmetrics: (rows) => `${rows.map(([n, v], i) => `bench_${i}{case=${JSON.stringify(n)}} ${v}`).join('\n')}\n# EOF\n`,
  gobench: (rows) =>
    `goos: linux\n${rows.map(([n, v, u]) => `Benchmark${n.replace(/\s/g, '_')}-8 \t 100 \t ${v} ${u.replace(/\s/g, '') || 'ns/op'}`).join('\n')}\nPASS\n`,
  junit: (rows) =>
    `<?xml version="1.0"?><testsuite name="s">${rows.map(([n, v]) => `<testcase classname="c" name="${xmlAttr(n)}" time="${xmlAttr(v)}"/>`).join('')}</testsuite>`,
};
const FORMAT_OF: Record<string, string> = {
  'json list': 'json',
  'json flat': 'json',
  jsonl: 'jsonl',
  'csv long': 'csv',
  'csv wide': 'csv',
  openmetrics: 'openmetrics',
  gobench: 'gobench',
  junit: 'junit',
};

describe.each(Object.keys(BUILDERS))('%s documents with hostile names, values and units', (label) => {
  const build = BUILDERS[label]!;
  const format = FORMAT_OF[label]!;
  const rows = fc.array(fc.tuple(nameArb, numberText, unitArb), { minLength: 1, maxLength: 4 });
  it('read soundly or refused with an InputError naming the file, forced and detected', async () => {
    await fc.assert(
      fc.asyncProperty(rows, async (r) => {
        const text = build(r);
        await contract(text, format, label);
        await refusalNamesFile(text, format);
        await contract(text, undefined, 'detected');
      }),
      FC(100),
    );
  });
  it('refuses a document whose only name carries a control or bidi character', async () => {
    for (const c of REFUSED_CHARS) {
      const text = build([[`bad${c}name`, '1', 'ns']]);
      // Go benchmark and OpenMetrics put the name where the grammar already stops at odd characters:
      // they may read no metric (refused as empty) or a prefix; a reading never carries the character.
      const outcome = await settledOrInputError(
        () => parseMetricText(text, FILE, format),
        (res) => {
          for (const rd of res.readings) expect(rd.name).not.toContain(c);
        },
      );
      if (label.startsWith('json') || label.startsWith('csv') || label === 'junit')
        expect(outcome, JSON.stringify(c)).toBe('refused');
      counter.add(label, outcome);
    }
  });
});

describe('hand-picked attacks on the readers', () => {
  const cases: Array<[string, string, string | undefined]> = [
    ['__proto__ as a flat key', '{"__proto__": {"polluted": 1}, "a": 1}', 'json'],
    ['__proto__ as a flat value', '{"__proto__": 5}', 'json'],
    ['constructor.prototype', '{"constructor": {"prototype": {"polluted": 1}}}', 'json'],
    ['__proto__ inside an entry', '{"metrics": [{"name": "a", "value": 1, "__proto__": {"polluted": 1}}]}', 'json'],
    [
      '__proto__ as an entry name',
      '{"metrics": [{"name": "__proto__", "value": 1}, {"name": "constructor", "samples": [1, 2]}]}',
      'json',
    ],
    ['deep nesting', `${'['.repeat(100_000)}${']'.repeat(100_000)}`, 'json'],
    ['deep nesting, detected', `${'{"a":'.repeat(50_000)}1${'}'.repeat(50_000)}`, undefined],
    ['a 10 MB number', `{"a": ${'9'.repeat(10_000_000)}}`, 'json'],
    [
      'a million samples of one metric',
      `{"metrics":[{"name":"m","samples":[${Array(1_000_000).fill('1').join(',')}]}]}`,
      'json',
    ],
    ['duplicate names', '{"metrics":[{"name":"a","value":1},{"name":"a","value":2}]}', 'json'],
    [
      'jsonl __proto__ line',
      '{"name":"__proto__","value":1}\n{"__proto__":{"polluted":1},"name":"b","value":2}\n',
      'jsonl',
    ],
    ['jsonl huge line', `{"name":"a","value":1,"pad":"${'x'.repeat(2 * 1024 * 1024)}"}`, 'jsonl'],
    ['csv __proto__ header', '__proto__,constructor,toString\n1,2,3\n', 'csv'],
    ['csv quote never closed', 'name,value\n"a,1\n', 'csv'],
    ['csv one column', 'name\na\n', 'csv'],
    ['csv ragged rows', 'a,b\n1\n1,2,3\n', 'csv'],
    ['csv formula cells', 'name,value\n=HYPERLINK("http://x"),1\n@SUM(A1),2\n', 'csv'],
    [
      'openmetrics label bomb',
      `m{${Array.from({ length: 5000 }, (_, i) => `l${i}="v"`).join(',')}} 1\n# EOF\n`,
      'openmetrics',
    ],
    ['openmetrics escapes in labels', 'm{a="\\"<img src=x>\\n\\\\"} 1\n# EOF\n', 'openmetrics'],
    ['openmetrics NaN and Inf', 'a NaN\nb +Inf\nc -Inf\n# EOF\n', 'openmetrics'],
    ['gobench __proto__', 'Benchmark__proto__-8 10 5 ns/op\nBenchmarkconstructor 10 5 ns/op\n', 'gobench'],
    ['gobench odd units', 'BenchmarkA-8 10 5 <img/op 7 @team/op\n', 'gobench'],
    [
      'junit billion laughs',
      `<?xml version="1.0"?><!DOCTYPE l [<!ENTITY a "aaaaaaaaaa">${Array.from({ length: 9 }, (_, i) => `<!ENTITY ${'b'.repeat(i + 1)} "${`&${i === 0 ? 'a' : 'b'.repeat(i)};`.repeat(10)}">`).join('')}]><testsuite><testcase name="&bbbbbbbbb;" time="1"/></testsuite>`,
      'junit',
    ],
    [
      'junit external entity',
      '<?xml version="1.0"?><!DOCTYPE t [<!ENTITY x SYSTEM "file:///etc/passwd">]><testsuite><testcase name="&x;" time="1"/></testsuite>',
      'junit',
    ],
    [
      'junit __proto__ attributes',
      '<testsuite name="__proto__"><testcase classname="constructor" name="__proto__" time="1"/><testcase name="toString" time="2"/></testsuite>',
      'junit',
    ],
    [
      'junit deep nesting',
      `${'<testsuite>'.repeat(20_000)}<testcase name="a" time="1"/>${'</testsuite>'.repeat(20_000)}`,
      'junit',
    ],
    [
      'junit CDATA markup',
      '<testsuite><testcase name="a" time="1"><system-out><![CDATA[<img src=x onerror=alert(1)>]]></system-out></testcase></testsuite>',
      'junit',
    ],
    ['only a BOM', '\uFEFF', undefined],
    ['NUL bytes', '\u0000'.repeat(1000), undefined],
    ['lone surrogates', '{"\uD800": 1, "\uDFFF": 2}', 'json'],
    ['unknown format name', '{"a":1}', '__proto__'],
  ];
  it.each(cases)('%s', async (_label, text, format) => {
    const outcome = await settledOrInputError(
      () => parseMetricText(text, FILE, format),
      (res) => {
        // One expect per file, not per reading: a million readings would make the check the slow part.
        const names = new Set(res.readings.map((r) => r.name));
        for (const n of names) expect(checkMetricName(n)).toBe(n);
        expect(res.readings.every((r) => Number.isFinite(r.value))).toBe(true);
      },
      format !== '__proto__',
    );
    counter.add('hand-picked', outcome);
  });

  it('a JUnit entity expansion never grows a name past the limit nor reads a file', async () => {
    const laugh = cases.find(([l]) => l === 'junit external entity')![1];
    const out = await settledOrInputError(
      () => parseMetricText(laugh, FILE, 'junit'),
      (res) => {
        for (const r of res.readings) expect(r.name).not.toMatch(/root:|\/bin\//);
      },
    );
    counter.add('hand-picked', out);
  });
});

describe('hostile names in every format through the CLI (no history: every metric new)', () => {
  // One hostile name per format that its grammar lets through, shown in check and report --html.
  const files: Array<[string, string, string]> = [
    [
      'json',
      'm.json',
      JSON.stringify({ metrics: [{ name: '<img src=x onerror=alert(1)> @team #1 |', value: 1, unit: '<b>' }] }),
    ],
    ['jsonl', 'm.jsonl', `${JSON.stringify({ name: '](javascript:alert(1)) `x`', value: 2 })}\n`],
    ['csv', 'm.csv', 'name,value,unit\n"<script>alert(1)</script>|a|b",3,"@u"\n'],
    ['csv', 'w.csv', '"<img src=x onerror=alert(1)>","@team #2 |"\n1,2\n'],
    ['openmetrics', 'm.om', 'req_seconds{path="<img src=x onerror=alert(1)>",who="@team|#3"} 0.5\n# EOF\n'],
    ['gobench', 'b.txt', 'Benchmark<img_src=x_onerror=alert(1)>|@team#4-8 100 5 ns/op\n'],
    [
      'junit',
      'j.xml',
      '<testsuite name="@team"><testcase classname="&lt;img src=x onerror=alert(1)&gt;" name="|#5|`" time="1.5"/></testsuite>',
    ],
  ];
  it.each(files)('%s (%s)', async (format, file, text) => {
    const path = work.write(`${format}-${file}`, text);
    const history = join(work.dir, `${file}.history.json`);
    const base = ['--metrics', path, '--history', history, '--input-format', format];
    const md = await bellgate(work.dir, ['check', ...base, '--format', 'markdown']);
    expect(md.stderr).not.toMatch(STACK_LINE);
    expect(md.code, md.stderr).toBe(0);
    assertInertMarkdown(md.stdout);
    const txt = await bellgate(work.dir, ['check', ...base, '--format', 'text']);
    assertInertText(txt.stdout);
    const json = await bellgate(work.dir, ['check', ...base, '--format', 'json']);
    const names = (JSON.parse(json.stdout) as { metrics: Array<{ name: string; status: string }> }).metrics;
    expect(names.length).toBeGreaterThan(0);
    expect(names.every((m) => m.status === 'new')).toBe(true);
    const html = join(work.dir, `${file}.html`);
    const rep = await bellgate(work.dir, ['report', ...base, '--html', html]);
    expect(rep.code, rep.stderr).toBe(0);
    assertInertHtml(readFileSync(html, 'utf8'));
    assertNoPollution();
    counter.add(`cli ${format}`, 'ok');
  });
});
