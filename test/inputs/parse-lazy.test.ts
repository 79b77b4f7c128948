// The lazy parser must read every fixture exactly as the eager one does (the fixtures' expected
// results come from the published examples named in their .expected.json files).
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors/input-error.js';
import { parseMetricText } from '../../src/inputs/parse.js';
import { parseMetricTextLazily } from '../../src/inputs/parse-lazy.js';

const dir = join(import.meta.dirname, '..', 'fixtures', 'inputs');
const fixtures = readdirSync(dir).filter((f) => !f.endsWith('.expected.json'));

describe('parseMetricTextLazily', () => {
  it.each(fixtures)('reads %s as parseMetricText does', async (name) => {
    const text = readFileSync(join(dir, name), 'utf8');
    const eager = parseMetricText(text, name);
    const lazy = await parseMetricTextLazily(text, name);
    expect(lazy.readings).toEqual(eager.readings);
    expect([...lazy.notFitted]).toEqual([...eager.notFitted]);
    expect([...lazy.meta]).toEqual([...eager.meta]);
  });

  it('refuses what the eager parser refuses, with the same InputError', async () => {
    for (const [text, format] of [
      ['', undefined],
      ['{"a": "x"}', 'json'],
      ['<testsuites/>', 'junit'],
      ['x', 'nonsense'],
    ] as const) {
      let eager: unknown;
      try {
        parseMetricText(text, 'f', format);
      } catch (e) {
        eager = e;
      }
      const lazy = await parseMetricTextLazily(text, 'f', format).catch((e: unknown) => e);
      expect(eager).toBeInstanceOf(InputError);
      expect(lazy).toBeInstanceOf(InputError);
      expect((lazy as InputError).message).toBe((eager as InputError).message);
    }
  });
});
