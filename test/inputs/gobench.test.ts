import { describe, expect, it } from 'vitest';
import { readGoBench } from '../../src/inputs/gobench.js';
import { inputErrorOf } from './helpers.js';

describe('readGoBench', () => {
  it('keeps the -N suffix when the file mixes GOMAXPROCS values, so they never mix', () => {
    const text = 'BenchmarkA-1 10 40 ns/op\nBenchmarkA-4 10 12 ns/op\n';
    const result = readGoBench(text, 'b.txt');
    expect(result.readings.map((r) => r.name)).toEqual(['BenchmarkA-1/ns/op', 'BenchmarkA-4/ns/op']);
    expect(result.meta.get('gomaxprocs')).toBe('1,4');
  });

  it('reads names without a suffix and custom units', () => {
    // Go proposal 14313: units are free text; "-cpu" absent means no suffix.
    const result = readGoBench('Benchmark/sub 3 2.5 widgets/op 1e3 ns/op\n', 'b.txt');
    expect(result.readings).toEqual([
      { name: 'Benchmark/sub/widgets/op', value: 2.5, unit: 'widgets/op', where: 'b.txt:1' },
      { name: 'Benchmark/sub/ns/op', value: 1000, unit: 'ns/op', where: 'b.txt:1' },
    ]);
    expect(result.meta.has('gomaxprocs')).toBe(false);
  });

  it('keeps every value of a configuration key that changes within the file', () => {
    const result = readGoBench('pkg: a\nBenchmarkX 1 1 ns/op\npkg: b\nBenchmarkY 1 1 ns/op\nnote:\n', 'b.txt');
    expect(result.meta.get('pkg')).toBe('a, b');
    expect(result.meta.get('note')).toBe('');
  });

  it('ignores lines that are not result or configuration lines (proposal 14313)', () => {
    const text =
      'BenchmarkA\nBenchmarkA 10 5\nBenchmarkA x 5 ns/op\nUpper: case key\nkey with space: x\nBenchmarkA 10 5 ns/op\n';
    const result = readGoBench(text, 'b.txt');
    expect(result.readings.map((r) => r.where)).toEqual(['b.txt:6']);
    expect([...result.meta.keys()]).toEqual([]);
  });

  it('refuses a value that is not a number on a result line', () => {
    const error = inputErrorOf(() => readGoBench('BenchmarkA-8 10 fast ns/op\n', 'b.txt'));
    expect(error.where).toBe('b.txt:1');
    expect(error.message).toMatch(/"fast" is not a number/);
  });
});
