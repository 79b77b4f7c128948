import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Ajv } from 'ajv';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { schemaErrors } from '../../src/config/schema.js';

const root = resolve(import.meta.dirname, '..', '..');
const committed = join(root, 'src', 'config', 'schema-validator.generated.js');
const schema = JSON.parse(readFileSync(join(root, 'src', 'config', 'bellgate.schema.json'), 'utf8')) as Record<
  string,
  unknown
>;
const fresh = mkdtempSync(join(tmpdir(), 'bellgate-validator-'));
afterAll(() => rmSync(fresh, { recursive: true, force: true }));

describe('the generated config validator', () => {
  it('is what the generator writes today from bellgate.schema.json (else: npm run gen:config-validator)', () => {
    const out = join(fresh, 'v.js');
    execFileSync(process.execPath, [join(root, 'test', 'gen-config-validator.mjs'), out], { cwd: root, stdio: 'pipe' });
    const stale = [
      ['schema-validator.generated.js', out, committed],
      ['schema-validator.generated.d.ts', out.replace(/\.js$/, '.d.ts'), committed.replace(/\.js$/, '.d.ts')],
    ].filter(([, made, kept]) => !readFileSync(made!).equals(readFileSync(kept!)));
    if (stale.length > 0)
      expect.fail(
        `stale: src/config/${stale.map(([name]) => name).join(', ')}; run npm run gen:config-validator and commit`,
      );
  });

  it('imports nothing, so ajv is not loaded at run time', () => {
    const code = readFileSync(committed, 'utf8');
    expect(code).not.toMatch(/^\s*import\b/m);
    expect(code).not.toMatch(/\brequire\(/);
  });

  // The outside reference is ajv itself: a validator compiled at run time with the same options,
  // as Bellgate did before. Every error, with its schema node and data, must come out the same,
  // because the config messages are worded from them.
  it('reports exactly the errors a run-time ajv compile reports, on random config-shaped data', () => {
    const reference = new Ajv({ allErrors: true, verbose: true, strict: true }).compile(schema);
    const keys = [
      'defaults',
      'metrics',
      'groups',
      'family',
      'keep',
      'input-format',
      'limits',
      'cutoff',
      'worse',
      'tolerance',
      'resolution',
      'window',
      'min-runs',
      'transform',
      'shared-move',
      'aggregate',
      'change-points',
      'ignore',
      'relative-to',
      'match',
      'name',
      'max-file-bytes',
      'max-line-length',
      'max-metrics',
      'max-samples',
      'cuttoff',
      '__proto__',
      'x',
    ];
    const scalar = fc.oneof(
      fc.constantFrom(
        0,
        1,
        2,
        0.5,
        -1,
        1e9,
        60,
        8,
        'higher',
        'lower',
        'both',
        'log',
        'robust',
        'holm',
        'json',
        '1%',
        '2.5 %',
        '5 percent',
        '',
        'a/*',
        '\u{1F600}'.repeat(201),
        true,
        false,
        null,
      ),
      fc.double({ noNaN: true, noDefaultInfinity: true }),
      fc.string({ maxLength: 6 }),
    );
    const { value } = fc.letrec((tie) => ({
      value: fc.oneof({ depthSize: 'small', withCrossShrink: true }, scalar, tie('list'), tie('map')),
      list: fc.array(tie('value'), { maxLength: 3 }),
      map: fc.dictionary(fc.constantFrom(...keys), tie('value'), { maxKeys: 5, noNullPrototype: false }),
    }));
    const top = fc.dictionary(fc.constantFrom(...keys), value, { maxKeys: 6 });
    let invalid = 0;
    fc.assert(
      fc.property(top, (data) => {
        const expected = reference(data) ? [] : [...(reference.errors ?? [])];
        if (expected.length > 0) invalid++;
        expect(schemaErrors(data)).toEqual(expected);
      }),
      { numRuns: 400, seed: 20261202 },
    );
    expect(invalid, 'the random data should mostly be refused, so errors get compared').toBeGreaterThan(100);
  });
});
