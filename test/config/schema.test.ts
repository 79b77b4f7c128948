/* eslint-disable @typescript-eslint/no-explicit-any -- the schema is walked as untyped JSON */
import { readFileSync } from 'node:fs';
import { Ajv } from 'ajv';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../src/config/defaults.js';
import { parseConfig } from '../../src/config/load.js';

const root = new URL('../../', import.meta.url);
const schema = JSON.parse(readFileSync(new URL('src/config/bellgate.schema.json', root), 'utf8')) as Record<
  string,
  any
>;

// The outside reference here is the JSON Schema draft-07 meta-schema (json-schema.org), which ajv
// ships and checks with validateSchema; strict mode also refuses unknown keywords.
describe('the shipped JSON Schema', () => {
  it('is a valid draft-07 schema that ajv compiles in strict mode', () => {
    const ajv = new Ajv({ strict: true });
    expect(schema.$schema).toBe('http://json-schema.org/draft-07/schema#');
    expect(ajv.validateSchema(schema), JSON.stringify(ajv.errors)).toBe(true);
    expect(() => ajv.compile(schema)).not.toThrow();
  });

  it('forbids unknown keys in every object', () => {
    const objects: Array<Record<string, any>> = [];
    const walk = (node: unknown): void => {
      if (Array.isArray(node)) node.forEach(walk);
      else if (node && typeof node === 'object') {
        const n = node as Record<string, any>;
        if (n.properties) objects.push(n);
        Object.values(n).forEach(walk);
      }
    };
    walk(schema);
    expect(objects.length).toBeGreaterThanOrEqual(5); // root, defaults, rule, group, limits
    for (const o of objects) expect(o.additionalProperties).toBe(false);
  });

  it('documents the same defaults the loader uses', () => {
    const d = defaultConfig();
    expect(schema.properties.defaults.$ref).toBe('#/definitions/settings');
    const props = schema.definitions.settings.properties;
    expect(props.cutoff.default).toBe(d.defaults.cutoff);
    expect(props.worse.default).toBe(d.defaults.worse);
    expect(props.tolerance.default).toBe(`${d.defaults.tolerance.amount * 100}%`);
    expect(props.resolution.default).toBe(d.defaults.resolution);
    expect(props.window.default).toBe(d.defaults.window);
    expect(props['min-runs'].default).toBe(d.defaults.minRuns);
    expect(props.transform.default).toBe(d.defaults.transform);
    expect(props['shared-move'].default).toBe(d.defaults.sharedMove);
    expect(props.aggregate.default).toBe(d.defaults.aggregate);
    expect(props['change-points'].default).toBe(d.defaults.changePoints);
    expect(schema.properties.family.default).toBe(d.family);
    expect(schema.properties.budget.default).toBe(`${d.budget * 100}%`);
    expect(schema.properties.unsettled.default).toBe(d.unsettled);
    expect(schema.properties.keep.default).toBe(d.keep);
    expect(schema.properties.limits.$ref).toBe('#/definitions/limits');
    const limits = schema.definitions.limits.properties;
    expect(limits['max-file-bytes'].default).toBe(d.limits.maxFileBytes);
    expect(limits['max-line-length'].default).toBe(d.limits.maxLineLength);
    expect(limits['max-metrics'].default).toBe(d.limits.maxMetrics);
  });

  it('accepts examples/bellgate.yml, read by a plain YAML parser and a fresh ajv', () => {
    const text = readFileSync(new URL('examples/bellgate.yml', root), 'utf8');
    const validate = new Ajv({ allErrors: true }).compile(schema);
    expect(validate(parse(text)), JSON.stringify(validate.errors)).toBe(true);
    const config = parseConfig(text, 'examples/bellgate.yml');
    expect(config.family).toBe('holm');
    expect(config.rules.length).toBeGreaterThanOrEqual(5);
    expect(config.groups.map((g) => g.name)).toEqual(['throughput']);
  });

  it('refuses what the loader refuses, for an editor user', () => {
    const validate = new Ajv({ allErrors: true }).compile(schema);
    expect(validate(parse('defaults:\n  cuttoff: 0.1\n'))).toBe(false);
    expect(validate(parse('defaults:\n  tolerance: 5 percent\n'))).toBe(false);
    expect(validate(parse('metrics:\n  - worse: lower\n'))).toBe(false);
    expect(validate(parse('defaults:\n  tolerance: 12.5%\n'))).toBe(true);
  });
});
