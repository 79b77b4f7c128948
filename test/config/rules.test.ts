import { describe, expect, it } from 'vitest';
import { compileGlobs, isLiteralGlob } from '../../src/config/glob-matcher.js';
import { parseConfig } from '../../src/config/load.js';
import { groupFor, settingsFor } from '../../src/config/rules.js';

// Glob semantics are picomatch's (README "Globbing features"): `*` matches any characters but
// '/', `**` matches across '/' segments, `?` one character, `[ab]` a class, `{x,y}` alternatives.
describe('compileGlobs', () => {
  it('keeps * within one segment and lets ** cross segments', () => {
    const one = compileGlobs(['throughput/*']);
    expect(one('throughput/home')).toBe(true);
    expect(one('throughput/api/v2')).toBe(false);
    expect(one('throughput')).toBe(false);
    const all = compileGlobs(['size/**']);
    expect(all('size/app.js')).toBe(true);
    expect(all('size/assets/img/logo.svg')).toBe(true);
    expect(all('sizes/app.js')).toBe(false);
    expect(compileGlobs(['**/p95'])('latency/geocode/p95')).toBe(true);
  });

  it('treats a leading dot and a backslash as ordinary name characters', () => {
    expect(compileGlobs(['size/*'])('size/.env')).toBe(true);
    expect(compileGlobs(['a\\\\b'])('a\\b')).toBe(true);
    expect(compileGlobs(['a/*'])('a\\b')).toBe(false);
  });

  it('supports ?, classes and braces', () => {
    expect(compileGlobs(['latency/p9?'])('latency/p95')).toBe(true);
    expect(compileGlobs(['latency/p[59]0'])('latency/p90')).toBe(true);
    expect(compileGlobs(['latency/p[59]0'])('latency/p70')).toBe(false);
    expect(compileGlobs(['{build,test}/*'])('test/suite')).toBe(true);
  });

  it('excludes names matched by a !glob; only !globs means everything else', () => {
    const m = compileGlobs(['latency/*', '!latency/calibrate']);
    expect(m('latency/render')).toBe(true);
    expect(m('latency/calibrate')).toBe(false);
    const rest = compileGlobs(['!legacy/**']);
    expect(rest('latency/x')).toBe(true);
    expect(rest('legacy/a/b')).toBe(false);
  });

  it('compiles each globs array once', () => {
    const globs = ['a/*'];
    expect(compileGlobs(globs)).toBe(compileGlobs(globs));
  });

  it('tells literal names from globs', () => {
    expect(isLiteralGlob('latency/calibrate')).toBe(true);
    expect(isLiteralGlob('latency/*')).toBe(false);
    expect(isLiteralGlob('{a,b}')).toBe(false);
    expect(isLiteralGlob('!a')).toBe(false);
  });
});

describe('settingsFor', () => {
  const config = parseConfig(
    [
      'defaults:',
      '  cutoff: 0.01',
      '  tolerance: 2%',
      'metrics:',
      '  - match: "latency/**"',
      '    transform: log',
      '    cutoff: 0.005',
      '  - match: "latency/*-p95"',
      '    cutoff: 0.001',
      '  - match: ["latency/*", "!latency/calibrate"]',
      '    relative-to: latency/calibrate',
      '  - match: "throughput/*"',
      '    worse: lower',
      '  - match: "size/**"',
      '    tolerance: 4096',
      '  - match: "legacy/*"',
      '    ignore: true',
      '  - match: "legacy/keep-*"',
      '    ignore: false',
      '  - match: "calib/**"',
      '    relative-to: calib/base',
    ].join('\n'),
    'rules.yml',
  );

  it('returns the defaults for a metric no rule matches', () => {
    expect(settingsFor(config, 'memory/peak')).toEqual(config.defaults);
  });

  it('applies matching rules in order, a later match overriding an earlier one key by key', () => {
    const p95 = settingsFor(config, 'latency/geocode-p95');
    expect(p95.cutoff).toBe(0.001); // rule 2 overrides rule 1
    expect(p95.transform).toBe('log'); // rule 1 still applies where rule 2 is silent
    expect(p95.tolerance).toEqual({ kind: 'percent', amount: 0.02 }); // defaults
    expect(p95.relativeTo).toBe('latency/calibrate');
    const nested = settingsFor(config, 'latency/geo/p95');
    expect(nested.cutoff).toBe(0.005); // `*` does not cross '/', so rules 2 and 3 miss it
    expect(nested.relativeTo).toBeUndefined();
  });

  it('reads the bad side, tolerance and ignore from the rules', () => {
    expect(settingsFor(config, 'throughput/geocode').worse).toBe('lower');
    expect(settingsFor(config, 'throughput/geocode/x').worse).toBe('higher');
    expect(settingsFor(config, 'size/web/app.js.gz').tolerance).toEqual({ kind: 'absolute', amount: 4096 });
    expect(settingsFor(config, 'legacy/old').ignore).toBe(true);
    expect(settingsFor(config, 'legacy/keep-this').ignore).toBe(false);
  });

  it('never makes a metric relative to itself', () => {
    expect(settingsFor(config, 'latency/calibrate').relativeTo).toBeUndefined();
    expect(settingsFor(config, 'calib/base').relativeTo).toBeUndefined();
    expect(settingsFor(config, 'calib/other').relativeTo).toBe('calib/base');
  });

  it('does not change the config it reads', () => {
    const before = JSON.stringify(config);
    settingsFor(config, 'latency/geocode-p95').cutoff = 0.5;
    expect(JSON.stringify(config)).toBe(before);
  });

  it('treats names like __proto__ and constructor as plain names', () => {
    const c = parseConfig('metrics:\n  - match: "__proto__"\n    worse: lower\n', 'p.yml');
    expect(settingsFor(c, '__proto__').worse).toBe('lower');
    expect(settingsFor(c, 'constructor').worse).toBe('higher');
    expect(groupFor(c, '__proto__')).toBeUndefined();
  });
});

describe('groupFor', () => {
  const config = parseConfig(
    'groups:\n  - name: p95\n    match: "latency/*-p95"\n  - name: timings\n    match: ["latency/*", "build/*"]\n  - name: throughput\n',
    'groups.yml',
  );
  it('returns the first group whose globs match', () => {
    expect(groupFor(config, 'latency/geocode-p95')?.name).toBe('p95');
    expect(groupFor(config, 'latency/geocode-p50')?.name).toBe('timings');
    expect(groupFor(config, 'build/compile')?.name).toBe('timings');
    expect(groupFor(config, 'throughput/a/b')?.name).toBe('throughput'); // default match: NAME/**
    expect(groupFor(config, 'memory/peak')).toBeUndefined();
  });
});
