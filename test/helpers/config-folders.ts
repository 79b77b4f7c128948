// Working folders with and without a default config file, shared by the tests that check a config
// step decides exactly as readConfigFile (src/config/read.ts) does on its own.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll } from 'vitest';

/** The folder layouts: no config, .yml, .yaml, .github as a file, the config as a folder, an invalid config. */
export const CONFIG_FOLDERS: [string, (dir: string) => void][] = [
  ['empty', () => undefined],
  [
    'yml',
    (d) => (
      mkdirSync(join(d, '.github')),
      writeFileSync(join(d, '.github/bellgate.yml'), 'defaults:\n  cutoff: 0.05\n')
    ),
  ],
  ['yaml', (d) => (mkdirSync(join(d, '.github')), writeFileSync(join(d, '.github/bellgate.yaml'), 'keep: 40\n'))],
  ['github-is-a-file', (d) => writeFileSync(join(d, '.github'), 'not a folder')],
  ['config-is-a-folder', (d) => mkdirSync(join(d, '.github/bellgate.yml'), { recursive: true })],
  [
    'invalid',
    (d) => (mkdirSync(join(d, '.github')), writeFileSync(join(d, '.github/bellgate.yml'), 'defaults:\n  cutoff: 7\n')),
  ],
];

/** A temporary root, removed after the file's tests; `folder(name, make)` makes a folder in it. */
export function configFolderRoot(prefix: string): (name: string, make: (dir: string) => void) => string {
  const root = mkdtempSync(join(tmpdir(), prefix));
  afterAll(() => rmSync(root, { recursive: true, force: true }));
  return (name, make) => {
    const dir = join(root, name);
    mkdirSync(dir, { recursive: true });
    make(dir);
    return dir;
  };
}

/** What a config step gave: the config, or its error as "Name: message", for comparing two steps. */
export async function outcome(run: () => Promise<unknown>): Promise<unknown> {
  try {
    return { config: await run() };
  } catch (error) {
    return { error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}
