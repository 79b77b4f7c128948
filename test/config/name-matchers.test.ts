import fc from 'fast-check';
import picomatch from 'picomatch';
import { describe, expect, it, vi } from 'vitest';
import { exactMatcher, isPlainGlob } from '../../src/config/name-matchers.js';

// The outside reference is picomatch itself, whose glob syntax the config documents: a plain name
// compared as a string must give exactly picomatch's answer with Bellgate's options.
const OPTIONS = { dot: true, windows: false } as const;
function byPicomatch(globs: string[]): (name: string) => boolean {
  const plain = globs.filter((g) => !g.startsWith('!'));
  const negated = globs.filter((g) => g.startsWith('!')).map((g) => g.slice(1));
  const include = plain.length > 0 ? picomatch(plain, OPTIONS) : () => true;
  const exclude = negated.length > 0 ? picomatch(negated, OPTIONS) : () => false;
  return (name) => include(name) && !exclude(name);
}

const ALPHABET = [..."aZ09 _.,:;=#%&~<>'`^/-"];
const plainGlob = fc
  .array(fc.constantFrom(...ALPHABET), { minLength: 1, maxLength: 10 })
  .map((cs) => cs.join(''))
  .filter((g) => !g.startsWith('./'));
/** Names that picomatch might confuse with the glob: the same with a slash, dot or case changed. */
const near = (g: string): string[] => [
  g,
  `${g}/`,
  `./${g}`,
  `/${g}`,
  g.replace(/\//g, '//'),
  g.toUpperCase(),
  g.slice(1),
  g.slice(0, -1),
  `${g}a`,
  `a${g}`,
  g.replace(/^\.\//, ''),
];

describe('plain globs', () => {
  it('match exactly what picomatch matches, with and without ! exclusions', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.boolean(), plainGlob), { minLength: 1, maxLength: 4 }),
        fc.string({ maxLength: 6 }),
        (parts, extra) => {
          const globs = parts.map(([negated, g]) => (negated ? `!${g}` : g));
          const exact = exactMatcher(globs);
          expect(exact).toBeDefined();
          const reference = byPicomatch(globs);
          for (const name of [...parts.flatMap(([, g]) => near(g)), extra]) {
            expect(exact!(name), `${JSON.stringify(globs)} vs ${JSON.stringify(name)}`).toBe(reference(name));
          }
        },
      ),
      { numRuns: 2000, seed: 7 },
    );
  });

  it('are never globs to picomatch.scan', () => {
    fc.assert(
      fc.property(plainGlob, (g) => {
        expect(picomatch.scan(g).isGlob).toBe(false);
      }),
      { numRuns: 2000, seed: 11 },
    );
  });

  it('leave out every character picomatch gives a meaning (its README "Matching features") and non-ASCII', () => {
    for (const c of ['*', '?', '[', ']', '{', '}', '(', ')', '!', '+', '@', '|', '\\', '"', '$', 'é', '\u{1F600}']) {
      expect(isPlainGlob(`a${c}b`), c).toBe(false);
    }
    expect(isPlainGlob('./a')).toBe(false);
    expect(isPlainGlob('latency/p95 (ms)')).toBe(false);
    expect(isPlainGlob('BenchmarkParse/small-8')).toBe(true);
    expect(exactMatcher(['latency/*'])).toBeUndefined();
    expect(exactMatcher(['!!a'])).toBeUndefined();
  });
});

describe('matcherFor', () => {
  it('needs no glob library for plain names, and says so when a glob was never compiled', async () => {
    vi.resetModules();
    const fresh = await import('../../src/config/name-matchers.js');
    expect(fresh.matcherFor(['size/app.js', 'size/vendor.js'])('size/vendor.js')).toBe(true);
    expect(fresh.matcherFor(['!size/app.js'])('size/app.js')).toBe(false);
    expect(() => fresh.matcherFor(['size/*'])).toThrow(/never compiled/);
    vi.resetModules();
  });

  it('falls back to picomatch for globs no reader filed, once glob-matcher is loaded', async () => {
    vi.resetModules();
    const { matcherFor } = await import('../../src/config/name-matchers.js');
    await import('../../src/config/glob-matcher.js');
    const globs = ['size/*', '!size/*.map'];
    expect(matcherFor(globs)('size/app.js')).toBe(true);
    expect(matcherFor(globs)('size/app.js.map')).toBe(false);
    expect(matcherFor(globs)('size/a/b.js')).toBe(false);
  });
});
