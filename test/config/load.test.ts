import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { defaultConfig, parseConfig } from '../../src/config/load.js';

// The expected values below are the ones written in each YAML snippet: the check is that every key
// of README's "Configuration" is read into the Config field it names, with YAML 1.2 core-schema
// typing (yaml.org/spec/1.2.2, section 10.3: `.5` and `1e-3` are floats, `true` a boolean).
describe('parseConfig: accepted keys', () => {
  it('gives the documented defaults for an empty file, only comments, or a null document', () => {
    const fixture = readFileSync(new URL('../fixtures/config/comments-only.yml', import.meta.url), 'utf8');
    for (const text of ['', '\n\n', fixture, '~\n', '---\n...\n']) {
      const config = parseConfig(text, 'bellgate.yml');
      // Defaults from README's "Configuration" section.
      expect(config.defaults).toEqual({
        cutoff: 0.01,
        worse: 'higher',
        tolerance: { kind: 'percent', amount: 0.01 },
        resolution: 0,
        window: 60,
        minRuns: 8,
        transform: 'auto',
        ignore: false,
        aggregate: 'auto',
        changePoints: true,
        sharedMove: true,
      });
      expect(config.family).toBe('holm');
      expect(config.budget).toBe(0.01);
      expect(config.unsettled).toBe('pass');
      expect(config.keep).toBe(4000); // six months at 20 recorded runs a day (README, "Config file")
      expect(config.limits).toEqual({
        maxFileBytes: 64 * 1024 * 1024,
        maxLineLength: 1024 * 1024,
        maxMetrics: 100_000,
        maxSamples: 250_000,
      });
      expect(config.rules).toEqual([]);
      expect(config.groups).toEqual([]);
      expect(config.inputFormat).toBeUndefined();
      expect(config.source).toBe('bellgate.yml');
    }
    expect(defaultConfig().source).toBe('<defaults>');
  });

  it('reads every defaults key', () => {
    const config = parseConfig(
      [
        'defaults:',
        '  cutoff: .005',
        '  worse: both',
        '  tolerance: 2.5%',
        '  resolution: 1e-3',
        '  window: 40',
        '  min-runs: 12',
        '  transform: log',
        '  shared-move: false',
        '  aggregate: min',
        '  change-points: false',
      ].join('\n'),
      'c.yml',
    );
    expect(config.defaults).toEqual({
      cutoff: 0.005,
      worse: 'both',
      tolerance: { kind: 'percent', amount: 0.025 },
      resolution: 0.001,
      window: 40,
      minRuns: 12,
      transform: 'log',
      ignore: false,
      aggregate: 'min',
      changePoints: false,
      sharedMove: false,
    });
  });

  it('reads every top-level key and every limit', () => {
    const config = parseConfig(
      'family: fdr\nbudget: 5%\nunsettled: block\nkeep: 250\ninput-format: openmetrics\nlimits:\n  max-file-bytes: 1000\n  max-line-length: 200\n  max-metrics: 30\n  max-samples: 40\n',
      'c.yml',
    );
    expect(config.family).toBe('fdr');
    expect(config.budget).toBe(0.05);
    expect(config.unsettled).toBe('block');
    expect(config.keep).toBe(250);
    expect(config.inputFormat).toBe('openmetrics');
    expect(config.limits).toEqual({ maxFileBytes: 1000, maxLineLength: 200, maxMetrics: 30, maxSamples: 40 });
    for (const family of ['none', 'bonferroni', 'holm', 'fdr'])
      expect(parseConfig(`family: ${family}`, 'c').family).toBe(family);
    for (const format of ['json', 'jsonl', 'csv', 'openmetrics', 'gobench', 'junit']) {
      expect(parseConfig(`input-format: ${format}`, 'c').inputFormat).toBe(format);
    }
  });

  it('reads rules with every key, in order, with their line numbers', () => {
    const config = parseConfig(
      [
        'metrics:',
        '  - match: "size/**"',
        '    tolerance: 512',
        '  - match: ["throughput/*", "!throughput/warmup"]',
        '    worse: lower',
        '    cutoff: 0.02',
        '    resolution: 5',
        '    window: 30',
        '    min-runs: 9',
        '    transform: log',
        '    shared-move: false',
        '    aggregate: max',
        '    change-points: false',
        '    relative-to: throughput/calibrate',
        '  - match: legacy/*',
        '    ignore: true',
      ].join('\n'),
      'c.yml',
    );
    expect(config.rules).toEqual([
      { match: ['size/**'], settings: { tolerance: { kind: 'absolute', amount: 512 } }, line: 2 },
      {
        match: ['throughput/*', '!throughput/warmup'],
        settings: {
          worse: 'lower',
          cutoff: 0.02,
          resolution: 5,
          window: 30,
          minRuns: 9,
          transform: 'log',
          sharedMove: false,
          aggregate: 'max',
          changePoints: false,
          relativeTo: 'throughput/calibrate',
        },
        line: 4,
      },
      { match: ['legacy/*'], settings: { ignore: true }, line: 15 },
    ]);
  });

  it('reads groups; a group without match holds NAME/**; null sections are empty', () => {
    const config = parseConfig(
      'groups:\n  - name: timings\n    match: ["latency/*", "build/*"]\n  - name: throughput\ndefaults:\nmetrics:\nlimits:\n',
      'c',
    );
    expect(config.groups).toEqual([
      { name: 'timings', match: ['latency/*', 'build/*'], line: 2 },
      { name: 'throughput', match: ['throughput/**'], line: 4 },
    ]);
    expect(config.rules).toEqual([]);
    expect(config.defaults.cutoff).toBe(0.01);
  });

  it('reads tolerance as absolute (number) or percent ("N%"), including 0 and a space before %', () => {
    const tol = (value: string) => parseConfig(`defaults:\n  tolerance: ${value}\n`, 'c').defaults.tolerance;
    expect(tol('0')).toEqual({ kind: 'absolute', amount: 0 });
    expect(tol('4096')).toEqual({ kind: 'absolute', amount: 4096 });
    expect(tol('0.25')).toEqual({ kind: 'absolute', amount: 0.25 });
    expect(tol('"1%"')).toEqual({ kind: 'percent', amount: 0.01 });
    expect(tol('150%')).toEqual({ kind: 'percent', amount: 1.5 });
    expect(tol('.5%')).toEqual({ kind: 'percent', amount: 0.005 });
    expect(tol("'3 %'")).toEqual({ kind: 'percent', amount: 0.03 });
  });

  it('accepts anchors and aliases within the limits, a byte-order mark, and CRLF line ends', () => {
    const config = parseConfig(
      '\uFEFFgroups:\r\n  - name: timings\r\n    match: &t ["latency/*", "build/*"]\r\nmetrics:\r\n  - match: *t\r\n    transform: log\r\n',
      'c',
    );
    expect(config.groups[0]!.match).toEqual(['latency/*', 'build/*']);
    expect(config.rules[0]!.match).toEqual(['latency/*', 'build/*']);
    expect(config.rules[0]!.line).toBe(5);
  });

  it('returns a fresh, independent config each time', () => {
    const a = defaultConfig();
    a.defaults.tolerance.amount = 5;
    a.limits.maxMetrics = 1;
    expect(defaultConfig().defaults.tolerance.amount).toBe(0.01);
    expect(defaultConfig().limits.maxMetrics).toBe(100_000);
  });
});
