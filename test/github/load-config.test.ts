// The action's config step skips the config reader when no file can be there; it must decide exactly
// as readConfigFile (src/config/read.ts) does on its own, which is the reference here.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DEFAULT_CONFIG_PATHS, readConfigFile } from '../../src/config/read.js';
import { LOOKED_UP_CONFIGS, loadActionConfig } from '../../src/github/load-config.js';

const root = mkdtempSync(join(tmpdir(), 'bellgate-action-config-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

/** A working folder set up by `make`; returns its path. */
function folder(name: string, make: (dir: string) => void): string {
  const dir = join(root, name);
  mkdirSync(dir, { recursive: true });
  make(dir);
  return dir;
}

const FOLDERS: [string, (dir: string) => void][] = [
  ['empty', () => undefined],
  ['yml', (d) => (mkdirSync(join(d, '.github')), writeFileSync(join(d, '.github/bellgate.yml'), 'defaults:\n  cutoff: 0.05\n'))],
  ['yaml', (d) => (mkdirSync(join(d, '.github')), writeFileSync(join(d, '.github/bellgate.yaml'), 'keep: 40\n'))],
  ['github-is-a-file', (d) => writeFileSync(join(d, '.github'), 'not a folder')],
  ['config-is-a-folder', (d) => mkdirSync(join(d, '.github/bellgate.yml'), { recursive: true })],
  ['invalid', (d) => (mkdirSync(join(d, '.github')), writeFileSync(join(d, '.github/bellgate.yml'), 'defaults:\n  cutoff: 7\n'))],
];

async function outcome(run: () => Promise<unknown>): Promise<unknown> {
  try {
    return { config: await run() };
  } catch (error) {
    return { error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

describe('loadActionConfig decides as readConfigFile does', () => {
  it('looks up the same paths as src/config/read.ts', () => {
    expect([...LOOKED_UP_CONFIGS]).toEqual(DEFAULT_CONFIG_PATHS);
  });

  it.each(FOLDERS)('with the config input at its default, in a folder: %s', async (name, make) => {
    const cwd = folder(`action-${name}`, make);
    const mine = await outcome(() => loadActionConfig(undefined, cwd));
    expect(mine).toEqual(await outcome(() => readConfigFile(undefined, { cwd, required: false })));
    if (name === 'yml') expect((mine as { config: { defaults: { cutoff: number } } }).config.defaults.cutoff).toBe(0.05);
    if (name === 'invalid' || name === 'config-is-a-folder') expect(mine).toHaveProperty('error');
  });

  it('a named config that does not exist is refused, as readConfigFile refuses it', async () => {
    const cwd = folder('action-named', () => undefined);
    const mine = await outcome(() => loadActionConfig('ci/bellgate.yml', cwd));
    expect(mine).toEqual(await outcome(() => readConfigFile('ci/bellgate.yml', { cwd, required: true })));
    expect(mine).toHaveProperty('error', expect.stringMatching(/ci\/bellgate\.yml does not exist/));
  });
});
