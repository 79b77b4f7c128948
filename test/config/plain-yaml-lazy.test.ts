import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import { parseConfigLazily } from '../../src/config/parse-lazily.js';
import { InputError } from '../../src/errors/input-error.js';

// Counts how often the YAML reader (yaml-tree.ts and the `yaml` library behind it) is used. The
// lazy path must read plain configs without it; parseConfig (load.ts) calls it for every text.
const yamlReads = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../src/config/yaml-tree.js', async (original) => {
  const actual = await original<typeof import('../../src/config/yaml-tree.js')>();
  return {
    readYamlTree: (text: string) => {
      yamlReads.count++;
      return actual.readYamlTree(text);
    },
  };
});

afterEach(() => {
  yamlReads.count = 0;
});

type Outcome = { config: unknown } | { error: { message: string; where?: string; fix?: string } };

async function outcome(read: () => unknown): Promise<Outcome> {
  try {
    return { config: await read() };
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    return { error: { message: err.message, where: err.where, fix: err.fix } };
  }
}

/** The reference is parseConfig, which always reads with the `yaml` library (readYamlTree). */
async function expectSameAsLibrary(text: string, source: string): Promise<number> {
  const want = await outcome(() => parseConfig(text, source));
  yamlReads.count = 0;
  const got = await outcome(() => parseConfigLazily(text, source));
  expect(got, source).toEqual(want);
  return yamlReads.count;
}

const root = join(import.meta.dirname, '../..');
const files = (dir: string): string[] =>
  readdirSync(join(root, dir))
    .filter((f) => /\.ya?ml$/.test(f))
    .map((f) => join(dir, f));

describe('parseConfigLazily with the plain reader', () => {
  it('reads the bench config (`keep: 500`) and plain configs without the YAML library', async () => {
    for (const text of [
      'keep: 500\n',
      '\uFEFFkeep: 900\n',
      'family: holm\ndefaults:\n  cutoff: 0.01\n  tolerance: 2%\n',
      '# only comments\n',
    ]) {
      expect(await expectSameAsLibrary(text, 'plain.yml'), text).toBe(0);
    }
  });

  it("gives plain configs with bad values the library's errors, positions and fixes", async () => {
    for (const text of [
      'defaults:\n  cuttoff: 0.05\n',
      'keep: 0\n',
      'defaults:\n  cutoff: 1.5\n  window: 1\n',
      'defaults:\n  min-runs: 30\n  window: 20\n',
      'family: sidak\n',
    ]) {
      expect(await expectSameAsLibrary(text, 'bad.yml'), text).toBe(0);
    }
  });

  it('loads the library for configs with lists and gives the same Config for examples and fixtures', async () => {
    const paths = [
      ...files('examples'),
      ...files('examples/demo'),
      ...files('test/fixtures/config'),
      ...files('test/fixtures/tune'),
    ];
    expect(paths.length).toBeGreaterThanOrEqual(8);
    for (const path of paths) {
      const text = readFileSync(join(root, path), 'utf8');
      const reads = await expectSameAsLibrary(text, path);
      // Every one of them has `metrics:` rules or quotes, except the fixture of only comments.
      expect(reads, path).toBe(path.endsWith('comments-only.yml') ? 0 : 1);
    }
    expect(await expectSameAsLibrary('metrics:\n  - match: "latency/*"\n    transform: log\n', 'rules.yml')).toBe(1);
  });
});
