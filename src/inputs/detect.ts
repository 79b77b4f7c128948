import { InputError } from '../errors/input-error.js';
import { METRIC_FORMATS, type MetricFormat } from './formats.js';

const HEAD_LINES = 64;
const GO_RESULT = /^Benchmark(?:$|[^\p{Ll}\s])\S*\s+\d+\s+\S+\s+\S+/u;
const OM_COMMENT = /^#\s+(?:TYPE|HELP|UNIT)\s+\S|^#\s*EOF\s*$/;
// Label sets are matched quote-aware and without backtracking between alternatives.
const OM_SAMPLE =
  /^[a-zA-Z_:][a-zA-Z0-9_:]*(?:\{(?:[^"}]|"(?:[^"\\]|\\.)*")*\})?[ \t]+[+-]?(?:\.?\d\S*|inf|nan)(?:[ \t]+\S+)?(?:[ \t]+#.*)?$/i;
const EXTENSIONS = new Map<string, MetricFormat>([
  ['json', 'json'],
  ['jsonl', 'jsonl'],
  ['ndjson', 'jsonl'],
  ['csv', 'csv'],
  ['prom', 'openmetrics'],
  ['om', 'openmetrics'],
  ['metrics', 'openmetrics'],
  ['xml', 'junit'],
]);

/**
 * Guesses a metric file's format from its content (the first 64 non-blank lines):
 * `<` + `<testsuite` -> junit; `{` -> json, or jsonl when the first line alone is a JSON object
 * with a "name"; a `BenchmarkX  N  v unit` line -> gobench; `# TYPE/HELP/UNIT/EOF` lines or only
 * `name{labels} value` lines -> openmetrics; a comma in the first line -> csv. When several
 * formats fit, the file extension (.json .jsonl .csv .prom .xml) decides if it names one of them.
 * @throws InputError when nothing fits, or several fit and the extension does not decide; the
 *   message lists the candidates and says to pass `--input-format`.
 * @example detectFormat('BenchmarkA-8 10 5 ns/op\n', 'out.txt') // 'gobench'
 */
export function detectFormat(text: string, file: string): MetricFormat {
  const head = headLines(text);
  const first = head[0];
  if (first === undefined) {
    throw new InputError('the metric file is empty', { where: file, fix: 'check the step that writes this file' });
  }
  const candidates = new Set<MetricFormat>();
  if (first.startsWith('<')) {
    if (/<testsuites?[\s>/]/.test(text.slice(0, 65536))) candidates.add('junit');
  } else if (first.startsWith('{') || first.startsWith('[')) {
    candidates.add(looksLikeJsonLine(first, head.length) ? 'jsonl' : 'json');
  } else {
    if (head.some((line) => GO_RESULT.test(line))) candidates.add('gobench');
    const samples = head.filter((line) => !line.startsWith('#'));
    if (
      head.some((line) => OM_COMMENT.test(line)) ||
      (samples.length > 0 && samples.every((line) => OM_SAMPLE.test(line)))
    ) {
      candidates.add('openmetrics');
    }
    if (first.includes(',') && !first.startsWith('#')) candidates.add('csv');
  }
  if (candidates.size === 1) return [...candidates][0]!;
  const byExtension = EXTENSIONS.get(/\.([^./\\]+)$/.exec(file)?.[1]?.toLowerCase() ?? '');
  if (byExtension && (candidates.size === 0 ? false : candidates.has(byExtension))) return byExtension;
  const listed = candidates.size > 0 ? [...candidates] : [...METRIC_FORMATS];
  throw new InputError(
    candidates.size > 0
      ? `cannot tell the format of the metric file: it could be ${listed.join(' or ')}`
      : `the metric file is in no format Bellgate recognises (it reads ${listed.join(', ')})`,
    { where: file, fix: `pass --input-format (${listed.join(' | ')}) to say which` },
  );
}

function headLines(text: string): string[] {
  const out: string[] = [];
  let start = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (start < text.length && out.length < HEAD_LINES) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    // Cap each line looked at: detection must stay cheap on a huge single-line file.
    const line = text.slice(start, Math.min(end, start + 4096)).trim();
    if (line !== '') out.push(line);
    start = end + 1;
  }
  return out;
}

/** A first line that is a whole JSON object with a string "name" starts JSON Lines. */
function looksLikeJsonLine(first: string, lineCount: number): boolean {
  if (!first.startsWith('{') || !first.endsWith('}')) return false;
  try {
    const value = JSON.parse(first) as unknown;
    return (
      typeof value === 'object' &&
      value !== null &&
      typeof (value as { name?: unknown }).name === 'string' &&
      (lineCount > 1 || !('metrics' in value))
    );
  } catch {
    return false;
  }
}
