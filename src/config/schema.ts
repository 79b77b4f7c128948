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
 * The validator is ajv's own code for this schema, generated ahead of time by ajv's standalone
 * code generation (schema-validator.generated.js, `npm run gen:config-validator`), so no run
 * compiles the schema. test/config/schema.test.ts checks the schema against the draft-07
 * meta-schema; validator-fresh.test.ts that the generated module is current and reports what a
 * run-time ajv compile reports.
 * @example schemaErrors({ defaults: { cutoff: 2 } })[0].keyword // 'exclusiveMaximum'
 */
export function schemaErrors(value: unknown): ErrorObject[] {
  return validate(value) ? [] : [...(validate.errors ?? [])];
}
