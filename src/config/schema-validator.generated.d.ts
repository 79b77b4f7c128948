// GENERATED FILE, do not edit (see schema-validator.generated.js).
import type { ErrorObject } from 'ajv';

/** ajv's validate function for bellgate.schema.json: true when valid, else the errors are in .errors. */
export declare const validate: ((data: unknown) => boolean) & { errors?: ErrorObject[] | null };
export default validate;
