// The CLI's config step skips the config reader when no file can be there; it must decide exactly
// as readConfigFile (src/config/read.ts) does on its own, which is the reference here.
import { describe, expect, it } from 'vitest';
import { readConfigFile } from '../../src/config/read.js';
import { createContext } from '../../src/cli/context.js';
import { loadConfig } from '../../src/cli/load-config.js';
import { CONFIG_FOLDERS, configFolderRoot, outcome } from '../helpers/config-folders.js';

const folder = configFolderRoot('bellgate-cli-config-');
const contextIn = (cwd: string) =>
  createContext({ stdout: () => undefined, stderr: () => undefined, cwd, env: {}, isTTY: false });

describe('loadConfig (CLI) decides as readConfigFile does', () => {
  it.each(CONFIG_FOLDERS)('without --config, in a folder: %s', async (name, make) => {
    const cwd = folder(`cli-${name}`, make);
    const mine = await outcome(() => loadConfig(contextIn(cwd), undefined));
    expect(mine).toEqual(await outcome(() => readConfigFile(undefined, { cwd, required: false })));
    if (name === 'yml')
      expect((mine as { config: { defaults: { cutoff: number } } }).config.defaults.cutoff).toBe(0.05);
    if (name === 'invalid' || name === 'config-is-a-folder') expect(mine).toHaveProperty('error');
  });

  it('a named --config that does not exist is refused, as readConfigFile refuses it', async () => {
    const cwd = folder('cli-named', () => undefined);
    const mine = await outcome(() => loadConfig(contextIn(cwd), 'ci/bellgate.yml'));
    expect(mine).toEqual(await outcome(() => readConfigFile('ci/bellgate.yml', { cwd, required: true })));
    expect(mine).toHaveProperty('error', expect.stringMatching(/ci\/bellgate\.yml does not exist/));
  });
});
