import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// The committed bundles in dist/ are what action.yml and the `bellgate` bin run, so they must be
// exactly what the sources build to today. This builds afresh into a temporary folder with the
// same script (`npm run build` uses it too) and compares every file byte for byte.
const root = resolve(import.meta.dirname, '..', '..');
const dist = join(root, 'dist');
const fresh = mkdtempSync(join(tmpdir(), 'bellgate-dist-'));
afterAll(() => rmSync(fresh, { recursive: true, force: true }));

function files(dir: string): string[] {
  if (!existsSync(dir)) return [];
  const out: string[] = [];
  const walk = (d: string): void => {
    for (const name of readdirSync(d)) {
      const full = join(d, name);
      if (statSync(full).isDirectory()) walk(full);
      else out.push(relative(dir, full));
    }
  };
  walk(dir);
  return out.sort();
}

describe('dist/ is up to date with src/', () => {
  it('a fresh build equals the committed dist/ byte for byte', { timeout: 600_000 }, () => {
    execFileSync(process.execPath, [join(root, 'test', 'build-dist.mjs'), fresh], { cwd: root, stdio: 'pipe' });
    const built = files(fresh);
    const committed = new Set(files(dist));
    expect(built.length, 'the build wrote no files').toBeGreaterThan(0);
    const missing = built.filter((f) => !committed.has(f));
    const stale = built.filter(
      (f) => committed.has(f) && !readFileSync(join(fresh, f)).equals(readFileSync(join(dist, f))),
    );
    const extra = [...committed].filter((f) => !built.includes(f));
    const problems = [
      ...stale.map((f) => `stale: dist/${f}`),
      ...missing.map((f) => `missing: dist/${f}`),
      ...extra.map((f) => `not built any more: dist/${f}`),
    ];
    if (problems.length > 0) {
      expect.fail(`dist/ does not match the sources; run npm run build and commit dist/\n  ${problems.join('\n  ')}`);
    }
  });
});
