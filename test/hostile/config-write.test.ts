// `bellgate tune --write` turns metric names into YAML rule globs and comments: a hostile name must
// not inject YAML (new keys, a second document, a comment that swallows a value) nor widen its glob
// to other metrics. Checked by reading the written text back with parseConfig and matching every
// name with settingsFor (YAML 1.2 quoting rules, sections 7.3 and 8.1 — from memory).
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/config/load.js';
import { settingsFor } from '../../src/config/rules.js';
import { applyConfigEdit } from '../../src/config/write-config.js';
import { assertNoPollution, CaseCounter, FC, resultOrInputError } from './guards.js';

const counter = new CaseCounter('config writing');
const skipped: string[] = [];
afterAll(() => {
  counter.print();
  console.log(`names with no rule written (no literal glob): ${JSON.stringify(skipped)}`);
  // Only names whose characters no glob can spell literally may be skipped.
  expect(skipped.every((n) => /[\u0000-\u001f\u202a-\u202e]/.test(n))).toBe(true);
});

const NAMES = [
  '__proto__',
  'constructor',
  'a: b',
  'x\n  cutoff: 0.5',
  '# comment',
  '- item',
  '"quoted"',
  "it's",
  '*',
  '**',
  'a/*',
  '[x]',
  '{a,b}',
  '!tag',
  '&anchor',
  '*alias',
  '---',
  '...',
  '? key',
  '|',
  '>',
  '%YAML',
  '@team',
  '`x`',
  '<img src=x onerror=alert(1)>',
  'x\u202Ey',
  'tab\there',
  ' lead',
  'trail ',
  '0.5',
  'true',
  'null',
  '~',
  '名前',
  '😀',
];

describe('applyConfigEdit with hostile metric names in rules and reasons', () => {
  it.each(NAMES.map((n) => [JSON.stringify(n), n] as const))(
    'rule for %s reads back for that name only',
    (_label, name) => {
      const edit = {
        defaults: { cutoff: 0.005 },
        rules: [{ metric: name, cutoff: 0.0001, reason: `because ${name}\n---\nmetrics: []` }],
      };
      const outcome = resultOrInputError(
        () => applyConfigEdit('defaults:\n  window: 30 # kept\n', 'b.yml', edit),
        (text) => {
          const config = parseConfig(text, 'b.yml');
          expect(config.defaults.cutoff).toBe(0.005);
          expect(config.defaults.window).toBe(30);
          // Skipped rules (no literal glob for the name) leave the name on the default.
          const own = settingsFor(config, name).cutoff;
          expect([0.0001, 0.005]).toContain(own);
          if (own === 0.005) skipped.push(name);
          for (const other of ['other', 'a', 'x', 'ab', `${name}x`])
            if (other !== name) expect(settingsFor(config, other).cutoff, other).toBe(0.005);
          expect(text).toContain('# kept');
        },
      );
      assertNoPollution();
      counter.add('hand-picked names', outcome);
    },
  );

  it('generated names: a rule written for a name matches that name and no other of the set', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.oneof(fc.constantFrom(...NAMES), fc.string({ minLength: 1, maxLength: 10 })), {
          minLength: 1,
          maxLength: 5,
        }),
        (names) => {
          const rules = names.map((metric, i) => ({ metric, cutoff: 0.0001 * (i + 1), reason: 'r' }));
          const outcome = resultOrInputError(
            () => applyConfigEdit('', 'b.yml', { defaults: { cutoff: 0.01 }, rules }),
            (text) => {
              const config = parseConfig(text, 'b.yml');
              names.forEach((n, i) => {
                const got = settingsFor(config, n).cutoff;
                // Either its own rule, or (no literal glob possible) the default; never another name's.
                expect([0.0001 * (i + 1), 0.01], JSON.stringify(n)).toContain(got);
              });
            },
          );
          counter.add('generated names', outcome);
        },
      ),
      FC(150),
    );
  });
});
