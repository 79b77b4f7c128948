import type { ErrorObject } from 'ajv';
import schema from './bellgate.schema.json' with { type: 'json' };
import { validate } from './schema-validator.generated.js';

/**
 * The JSON Schema of `.github/bellgate.yml` (draft-07), the same file that ships in the package
 * for editors. Draft-07 because it is what editor YAML plugins and ajv's default build support best.
 */
export const configSchema: Readonly<Record<string, unknown>> = schema;

/**
 * Validates plain data (from the YAML tree) against the config schema and returns every error
 * (ajv allErrors, verbose so each error carries its schema node for wording).
 * The validator is ajv's own code for this schema, generated ahead of time
 * (schema-validator.generated.js, `npm run gen:config-validator`): compiling it at every start
 * cost about 40 ms and loading ajv's compiler another 275 KB. test/config/schema.test.ts checks
 * the schema against the draft-07 meta-schema; validator-fresh.test.ts that the module is current.
 * @example schemaErrors({ defaults: { cutoff: 2 } })[0].keyword // 'exclusiveMaximum'
 */
export function schemaErrors(value: unknown): ErrorObject[] {
  return validate(value) ? [] : [...(validate.errors ?? [])];
}
