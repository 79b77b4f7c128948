// Names on the data branch. Branch names are checked against git itself (`git check-ref-format
// --branch`, the reference for ref-name rules); series files must be safe for any series name.
import { execFileSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dataBranchName, seriesFilePath } from '../../src/history/branch-path.js';
import { InputError } from '../../src/errors/input-error.js';
import { gitBlobId } from '../e2e/standins/git-data.js';

function gitAccepts(name: string): boolean {
  try {
    execFileSync('git', ['check-ref-format', '--branch', name], { stdio: 'ignore', cwd: tmpdir() });
    return true;
  } catch {
    return false;
  }
}

describe('dataBranchName', () => {
  const names = [
    'bellgate-data',
    'perf/history',
    'a.b',
    'x_y-z/1.2',
    'ünïcode',
    'a..b',
    'a b',
    'a~1',
    'a^',
    'a:b',
    'a?',
    'a*',
    'a[b',
    'a\\b',
    '-lead',
    'a/.hidden',
    'a.lock',
    'a/b.lock/c',
    'a//b',
    'trail/',
    'dot.',
    'a@{1}',
    'tab\there',
    'del\u007f',
  ];
  it.each(names)('agrees with git check-ref-format --branch on %j', (name) => {
    const ours = (() => {
      try {
        dataBranchName(name);
        return true;
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        return false;
      }
    })();
    expect(ours).toBe(gitAccepts(name));
  });
  it('drops a refs/heads/ prefix and names the input in its error', () => {
    expect(dataBranchName('refs/heads/bellgate-data')).toBe('bellgate-data');
    expect(() => dataBranchName('a..b')).toThrow(/input `history`/);
    // git's --branch reads "@" as "the current branch"; as a data branch name it is refused.
    expect(() => dataBranchName('@')).toThrow(InputError);
  });
});

describe('seriesFilePath', () => {
  it('gives any series name a safe, distinct file in the bellgate folder', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), (series) => {
        const path = seriesFilePath(series);
        expect(path).toMatch(/^bellgate\/[A-Za-z0-9_][A-Za-z0-9._-]*\.jsonl$/);
        expect(path.length).toBeLessThan(90);
        expect(path.split('/').slice(1).join('/')).not.toContain('..');
      }),
      { seed: 81, numRuns: 300 },
    );
    const hostile = ['__proto__', '../../etc/passwd', '', '.', '..', 'constructor', 'a/b', 'a b', 'A/B'];
    const paths = hostile.map(seriesFilePath);
    expect(new Set(paths).size).toBe(hostile.length);
    expect(seriesFilePath('bench/linux')).toMatch(/^bellgate\/bench-linux-[0-9a-f]{8}\.jsonl$/);
  });
});

describe("the stand-in's blob ids", () => {
  it('match git hash-object (the real object id format)', () => {
    for (const text of ['hello\n', '', '{"schema":"bellgate.history/2"}']) {
      const git = execFileSync('git', ['hash-object', '--stdin'], { input: text }).toString().trim();
      expect(gitBlobId(Buffer.from(text))).toBe(git);
    }
    // From memory: the empty blob is e69de29…, "hello\n" is ce01362….
    expect(gitBlobId(Buffer.alloc(0))).toBe('e69de29bb2d1d6434b8b29ae775ad8c2e48c5391');
  });
});
