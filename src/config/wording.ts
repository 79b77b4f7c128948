/** Words for config values and schema nodes, shared by the schema and cross-field checks. */

type SchemaNode = Record<string, unknown>;

/**
 * A value as a user wrote it, short: strings quoted and cut at 60 characters.
 * @example describeValue(null) // 'an empty value'
 */
export function describeValue(value: unknown): string {
  if (value === null || value === undefined) return 'an empty value';
  if (typeof value === 'string') return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object' && Object.getPrototypeOf(value) === null) return 'a mapping';
  return 'a value of an unsupported type';
}

const TYPE_WORDS: Record<string, string> = {
  object: 'a mapping',
  array: 'a list',
  string: 'a string',
  number: 'a number',
  integer: 'a whole number',
  boolean: 'true or false',
};

/**
 * What a schema node allows, in words: "one of higher, lower, both", "a whole number of at
 * least 2", "a number greater than 0 and less than 1".
 * @example describeAllowed({ type: 'integer', minimum: 2 }) // 'a whole number of at least 2'
 */
export function describeAllowed(node: SchemaNode): string {
  if (Array.isArray(node.anyOf)) return (node.anyOf as SchemaNode[]).map(describeAllowed).join(', or ');
  if (Array.isArray(node.enum)) return `one of ${(node.enum as unknown[]).join(', ')}`;
  if (node.type === 'string' && typeof node.pattern === 'string' && typeof node.description === 'string') {
    return node.description;
  }
  const types = (Array.isArray(node.type) ? node.type : [node.type]).filter((t) => t !== 'null') as string[];
  let words = types.map((t) => TYPE_WORDS[t] ?? t).join(' or ');
  const bounds: string[] = [];
  if (typeof node.minimum === 'number') bounds.push(`at least ${node.minimum}`);
  if (typeof node.exclusiveMinimum === 'number') bounds.push(`greater than ${node.exclusiveMinimum}`);
  if (typeof node.maximum === 'number') bounds.push(`at most ${node.maximum}`);
  if (typeof node.exclusiveMaximum === 'number') bounds.push(`less than ${node.exclusiveMaximum}`);
  if (bounds.length > 0) words += `${bounds[0]!.startsWith('at ') ? ' of' : ''} ${bounds.join(' and ')}`;
  if (node.minLength === 1) words = words.replace(/^a /, 'a non-empty ');
  if (typeof node.maxLength === 'number') words += ` of at most ${node.maxLength} characters`;
  if (node.type === 'array' && typeof node.items === 'object' && node.items !== null) {
    words = `${node.minItems === 1 ? 'a non-empty list' : 'a list'} of ${plural(describeAllowed(node.items as SchemaNode))}`;
  }
  return words;
}

function plural(words: string): string {
  return words.replace(/^an? (non-empty )?(\w+)/, (_, ne: string | undefined, noun: string) => `${ne ?? ''}${noun}s`);
}
