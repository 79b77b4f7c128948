import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fnv1a32, reportPath } from '../../src/github/report-path.js';

describe('fnv1a32', () => {
  it('matches the published FNV-1a 32-bit test vectors', () => {
    // From the FNV reference test suite (Fowler/Noll/Vo, test_fnv.c; values recalled from memory).
    expect(fnv1a32('')).toBe(0x811c9dc5);
    expect(fnv1a32('a')).toBe(0xe40c292c);
    expect(fnv1a32('foobar')).toBe(0xbf9cf968);
  });

  it('hashes the UTF-8 bytes, so a non-ASCII name equals its byte string', () => {
    // "é" is C3 A9 in UTF-8 (RFC 3629); the latin1 string of those two bytes must hash alike byte by byte.
    const bytes = '\u00c3\u00a9';
    let reference = 0x811c9dc5;
    for (let i = 0; i < bytes.length; i++) reference = Math.imul(reference ^ bytes.charCodeAt(i), 0x01000193) >>> 0;
    expect(fnv1a32('é')).toBe(reference);
  });
});

describe('reportPath', () => {
  it('names one readable file per series under RUNNER_TEMP/bellgate', () => {
    expect(reportPath('/tmp/runner', 'bench/linux')).toMatch(
      /^\/tmp\/runner\/bellgate\/report-bench-linux-[0-9a-f]{8}\.json$/,
    );
    expect(reportPath('/tmp/runner', '///')).toMatch(/^\/tmp\/runner\/bellgate\/report-[0-9a-f]{8}\.json$/);
  });

  it('keeps series apart whose slugs coincide, and never leaves the folder', () => {
    const hostile = [
      'bench/linux',
      'bench linux',
      'bench-linux',
      '__proto__',
      '../../etc/passwd',
      '',
      '.',
      '..',
      'a/b',
      'A/B',
    ];
    expect(new Set(hostile.map((s) => reportPath('/r', s))).size).toBe(hostile.length);
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), (series) => {
        expect(reportPath('/r', series)).toMatch(
          /^\/r\/bellgate\/report-([A-Za-z0-9_][A-Za-z0-9._-]*-)?[0-9a-f]{8}\.json$/,
        );
      }),
      { seed: 17, numRuns: 300 },
    );
  });
});
