import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, steadyFixture } from './helpers/cli-harness.js';

// Exit codes are README's ("Exit codes"): 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const { work, history, calm } = steadyFixture();
afterAll(() => work.remove());

describe('usage', () => {
  it('--help lists every command and exits 0', async () => {
    const r = await bellgate(work.dir, ['--help']);
    expect(r.code).toBe(0);
    for (const c of ['check', 'record', 'explain', 'tune', 'report', 'import', 'verify', 'demo'])
      expect(r.stdout).toContain(c);
    expect(r.stdout).toContain('Exit codes');
  });

  it('each command has --help with examples', async () => {
    for (const c of ['check', 'record', 'explain', 'tune', 'report', 'import', 'verify', 'demo']) {
      const r = await bellgate(work.dir, [c, '--help']);
      expect(r.code, c).toBe(0);
      expect(r.stdout, c).toContain('Examples:');
      expect(r.stdout, c).toContain(`$ bellgate ${c}`);
    }
  });

  it('--version prints the version of package.json', async () => {
    const pkg = JSON.parse(readFileSync(join(import.meta.dirname, '..', '..', 'package.json'), 'utf8')) as {
      version: string;
    };
    const r = await bellgate(work.dir, ['--version']);
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toBe(pkg.version);
  });

  it('no command: usage on stderr, exit 2', async () => {
    const r = await bellgate(work.dir, []);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('Usage: bellgate');
  });

  it('an unknown flag: exit 2, the flag named, a pointer to --help', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--histroy', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("unknown option '--histroy'");
    expect(r.stderr).toContain('--history'); // commander's did-you-mean
    expect(r.stdout).toBe('');
  });

  it('a required flag left out: exit 2 naming it', async () => {
    const r = await bellgate(work.dir, ['check']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--metrics');
  });

  it('a value outside the choices: exit 2 listing them', async () => {
    const r = await bellgate(work.dir, ['check', '--metrics', calm, '--format', 'xml']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('text, markdown, json');
  });

  it('an unknown command: exit 2', async () => {
    const r = await bellgate(work.dir, ['chek']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('check'); // did-you-mean
  });
});
