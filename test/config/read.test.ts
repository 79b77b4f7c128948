import { chmodSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readConfigFile } from '../../src/config/read.js';
import { InputError } from '../../src/errors/input-error.js';

const dirs: string[] = [];
function project(files: Record<string, string | Buffer>): string {
  const dir = mkdtempSync(join(tmpdir(), 'bellgate-config-'));
  dirs.push(dir);
  for (const [name, content] of Object.entries(files)) {
    mkdirSync(join(dir, name, '..'), { recursive: true });
    writeFileSync(join(dir, name), content);
  }
  return dir;
}
afterAll(() => {
  for (const dir of dirs) rmSync(dir, { recursive: true, force: true });
});

async function refusal(promise: Promise<unknown>): Promise<InputError> {
  const err = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(InputError);
  return err as InputError;
}

describe('readConfigFile', () => {
  it('reads .github/bellgate.yml from the working folder when no path is given', async () => {
    const cwd = project({ '.github/bellgate.yml': 'defaults:\n  cutoff: 0.02\n' });
    const config = await readConfigFile(undefined, { cwd });
    expect(config.defaults.cutoff).toBe(0.02);
    expect(config.source).toBe('.github/bellgate.yml');
  });

  it('falls back to .github/bellgate.yaml, then to the defaults', async () => {
    const yaml = await readConfigFile(undefined, { cwd: project({ '.github/bellgate.yaml': 'keep: 99\n' }) });
    expect(yaml.keep).toBe(99);
    const none = await readConfigFile(undefined, { cwd: project({}) });
    expect(none.source).toBe('<defaults>');
    expect(none.defaults.cutoff).toBe(0.01);
  });

  it('refuses a named path that is missing, naming it, unless required is false', async () => {
    const cwd = project({});
    const err = await refusal(readConfigFile('conf/gate.yml', { cwd }));
    expect(err.message).toBe('config file conf/gate.yml does not exist');
    expect(err.where).toBe('conf/gate.yml');
    expect(err.fix).toMatch(/check the path/);
    const soft = await readConfigFile('.github/bellgate.yml', { cwd, required: false });
    expect(soft.source).toBe('<defaults>');
    await refusal(readConfigFile(undefined, { cwd, required: true }));
  });

  it('reads a named path relative to cwd and reports problems with that path, line and column', async () => {
    const cwd = project({ 'ci/gate.yml': 'defaults:\n  worse: upward\n' });
    const err = await refusal(readConfigFile('ci/gate.yml', { cwd }));
    expect(err.where).toBe('ci/gate.yml:2:10');
    const ok = await readConfigFile(join(cwd, 'ci/gate.yml').replace('gate.yml', 'ok.yml'), { cwd, required: false });
    expect(ok.source).toBe('<defaults>');
  });

  it('refuses files over 1 MiB, folders and text that is not UTF-8', async () => {
    const cwd = project({
      'big.yml': `# ${'x'.repeat(1024 * 1024)}\n`, // 2 + 1048576 + 1 bytes
      'folder.yml/inner': '',
      'latin1.yml': Buffer.from([0x6b, 0x65, 0x65, 0x70, 0x3a, 0x20, 0x35, 0x0a, 0x23, 0xe9, 0x0a]),
    });
    expect((await refusal(readConfigFile('big.yml', { cwd }))).message).toBe(
      'config file big.yml is 1048579 bytes; the limit is 1048576 (1 MiB)',
    );
    expect((await refusal(readConfigFile('folder.yml', { cwd }))).message).toBe(
      'config path folder.yml is a folder, not a file',
    );
    expect((await refusal(readConfigFile('latin1.yml', { cwd }))).message).toBe(
      'config file latin1.yml is not UTF-8 text',
    );
  });

  it.skipIf(process.getuid?.() === 0)('refuses an unreadable file with the reason', async () => {
    const cwd = project({ 'locked.yml': 'keep: 5\n' });
    chmodSync(join(cwd, 'locked.yml'), 0o000);
    const err = await refusal(readConfigFile('locked.yml', { cwd }));
    expect(err.message).toBe('cannot read config file locked.yml (EACCES)');
  });
});
