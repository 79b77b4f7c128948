// Writes src/config/schema-validator.generated.js: the config schema's validator, generated ahead
// of time by ajv's standalone code generation, so no run of Bellgate compiles the schema (the
// largest part of a PR check's time otherwise; DEVELOPERS.md "Decisions"). Same options as a
// run-time compile would use: allErrors (every problem is reported), verbose (errors carry their
// schema node, which the wording reads) and strict (unknown keywords in our own schema are refused
// here, at generation).
//
// Usage: node test/gen-config-validator.mjs [OUTFILE]    (npm run gen:config-validator)
// Default OUTFILE: src/config/schema-validator.generated.js. test/config/validator-fresh.test.ts
// generates into a temporary file and fails when the committed module differs.
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Ajv } from 'ajv';
import standalone from 'ajv/dist/standalone/index.js';
import ucs2length from 'ajv/dist/runtime/ucs2length.js';

const root = resolve(new URL('..', import.meta.url).pathname);
const schemaPath = resolve(root, 'src', 'config', 'bellgate.schema.json');
const out = resolve(process.argv[2] ?? resolve(root, 'src', 'config', 'schema-validator.generated.js'));

// ajv's run-time helpers, inlined so the module imports nothing: a CommonJS default import reads
// differently under node, the bundler and the test runner, and inlining sidesteps all three.
// A schema that needs another helper stops the generation here rather than at run time.
const HELPERS = new Map([['ucs2length', ucs2length.default]]);

const schema = JSON.parse(readFileSync(schemaPath, 'utf8'));
const ajv = new Ajv({
  allErrors: true,
  verbose: true,
  strict: true,
  code: { source: true, esm: true, lines: true },
});
const validate = ajv.compile(schema);
let code = standalone.default(ajv, validate);

code = code.replace(/require\("ajv\/dist\/runtime\/([\w-]+)"\)\.default/g, (_whole, name) => {
  const helper = HELPERS.get(name);
  if (typeof helper !== 'function')
    throw new Error(`gen-config-validator: the schema needs ajv's ${name} helper; add it to HELPERS`);
  return `(${helper.toString()})`;
});
if (/\brequire\(/.test(code)) throw new Error('gen-config-validator: the generated code still calls require()');

const header = `// GENERATED FILE, do not edit. The validator of src/config/bellgate.schema.json, written by ajv
// standalone code generation (options: allErrors, verbose, strict).
// Regenerate after changing the schema: npm run gen:config-validator
// (= node test/gen-config-validator.mjs); test/config/validator-fresh.test.ts fails while it is stale.
/* eslint-disable */
`;
const typings = `// GENERATED FILE, do not edit (see schema-validator.generated.js).
import type { ErrorObject } from 'ajv';

/** ajv's validate function for bellgate.schema.json: true when valid, else the errors are in .errors. */
export declare const validate: ((data: unknown) => boolean) & { errors?: ErrorObject[] | null };
export default validate;
`;
writeFileSync(out, header + code.replace(/^"use strict";\n?/, '') + (code.endsWith('\n') ? '' : '\n'));
writeFileSync(out.replace(/\.js$/, '.d.ts'), typings);
