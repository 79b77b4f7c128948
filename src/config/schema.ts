import { Ajv, type ErrorObject, type ValidateFunction } from 'ajv';
import schema from './bellgate.schema.json' with { type: 'json' };

/**
 * The JSON Schema of `.github/bellgate.yml` (draft-07), the same file that ships in the package
 * for editors. Draft-07 because it is what editor YAML plugins and ajv's default build support best.
 */
export const configSchema: Readonly<Record<string, unknown>> = schema;

let validate: ValidateFunction | undefined;

/**
 * Validates plain data (from the YAML tree) against the config schema and returns every error
 * (ajv allErrors, verbose so each error carries its schema node for wording). Compiled once.
 * @example schemaErrors({ defaults: { cutoff: 2 } })[0].keyword // 'exclusiveMaximum'
 */
export function schemaErrors(value: unknown): ErrorObject[] {
  // validateSchema: false skips checking our own schema against the draft-07 meta-schema on every
  // start (about 55 ms, test/bench/README.md); test/config/schema.test.ts checks it once instead.
  validate ??= new Ajv({ allErrors: true, verbose: true, strict: true, validateSchema: false }).compile(schema);
  return validate(value) ? [] : [...(validate.errors ?? [])];
}
