import type { InputLimits } from '../config/types.js';
import { checkLineLengths, DEFAULT_LIMITS, eachLine, samplesError } from './limits.js';
import { parseDecimal } from './numbers.js';
import { ReadingSink } from './reading-sink.js';
import type { ReadResult } from './run.js';

// Go proposal 14313 ("Go benchmark data format"): a configuration line is `key: value` where key
// begins with a lower-case letter and holds no space and no upper-case letter.
const CONFIG_LINE = /^(\p{Ll}[^\s\p{Lu}:]*):(?:[ \t]+(.*))?$/su;
// A result line's first field is "Benchmark" followed by the end of the field or a character
// that is not lower case (BenchmarkDecode, Benchmark/sub, but not Benchmarking).
const BENCH_NAME = /^Benchmark(?:$|[^\p{Ll}])/u;
const PROCS_SUFFIX = /-(\d+)$/;

interface ResultLine {
  name: string;
  procs?: string;
  pairs: [number, string][];
  where: string;
}

/**
 * Reads the Go benchmark data format (Go proposal 14313), as `go test -bench` prints it.
 * - A result line `BenchmarkName-8  N  v1 unit1  v2 unit2 ...` gives one sample of each
 *   `value unit` pair, as metric `<BenchmarkName>/<unit>` with its unit kept as written
 *   (`BenchmarkDecode-8 100 412 ns/op 64 B/op` -> `BenchmarkDecode/ns/op` = 412 "ns/op",
 *   `BenchmarkDecode/B/op` = 64 "B/op"). The iteration count N is not a metric.
 * - The `-N` GOMAXPROCS suffix is stripped and recorded as meta `gomaxprocs`, when every line of
 *   the file has the same N; with several (`-cpu 1,4`) the suffixes stay in the names, so that
 *   different processor counts never mix, and `gomaxprocs` lists them.
 * - Repeated lines (`-count 5`) are samples of the same metrics.
 * - Configuration lines `key: value` (goos, goarch, pkg, cpu, ...) become run meta; a key that
 *   changes within the file keeps all its values, joined by ", ".
 * - Every other line (PASS, ok, log output) is ignored, as the proposal says.
 * @throws InputError naming file:line for a value that is not a number.
 * @example readGoBench('BenchmarkA-8 10 5 ns/op\n', 'b.txt').readings[0] // { name: 'BenchmarkA/ns/op', value: 5, unit: 'ns/op', where: 'b.txt:1' }
 */
export function readGoBench(text: string, file: string, limits: InputLimits = DEFAULT_LIMITS): ReadResult {
  checkLineLengths(text, file, limits);
  const sink = new ReadingSink(file, limits);
  const config = new Map<string, string[]>();
  const results: ResultLine[] = [];
  let samples = 0;
  eachLine(text, (line, number) => {
    const where = `${file}:${number}`;
    const setting = CONFIG_LINE.exec(line);
    if (setting) {
      const values = config.get(setting[1]!) ?? [];
      const value = (setting[2] ?? '').trim();
      if (!values.includes(value)) values.push(value);
      config.set(setting[1]!, values);
      return;
    }
    const result = parseResultLine(line, where);
    if (!result) return;
    // Results are held until the file's processor counts are known: count their samples now.
    samples += result.pairs.length;
    if (samples > limits.maxSamples) throw samplesError(file, limits.maxSamples, where);
    results.push(result);
  });
  const procs = [...new Set(results.map((r) => r.procs).filter((p): p is string => p !== undefined))];
  for (const { name, procs: n, pairs, where } of results) {
    const base = procs.length > 1 && n !== undefined ? `${name}-${n}` : name;
    for (const [value, unit] of pairs) sink.add(`${base}/${unit}`, value, unit, where);
  }
  for (const [key, values] of config) sink.meta(key, values.join(', '));
  if (procs.length > 0) sink.meta('gomaxprocs', procs.join(','));
  return sink.result;
}

/** A result line split into name, GOMAXPROCS and value/unit pairs; undefined for any other line. */
function parseResultLine(line: string, where: string): ResultLine | undefined {
  const fields = line.trim().split(/\s+/u);
  const [first, iterations] = fields;
  if (first === undefined || !BENCH_NAME.test(first)) return undefined;
  if (fields.length < 4 || fields.length % 2 !== 0 || !/^\d+$/.test(iterations ?? '')) return undefined;
  const procs = PROCS_SUFFIX.exec(first);
  const name = procs ? first.slice(0, -procs[0].length) : first;
  const pairs: [number, string][] = [];
  for (let i = 2; i < fields.length; i += 2) {
    const unit = fields[i + 1]!;
    pairs.push([parseDecimal(fields[i]!, where, `value in ${unit} of ${name}`), unit]);
  }
  return { name, procs: procs?.[1], pairs, where };
}
