/** A line and column (both 1-based) in a config file. */
export interface Position {
  line: number;
  col: number;
}

/**
 * A YAML document as plain data (null-prototype objects), with where each value and key was written.
 * Built by readYamlTree (yaml-tree.ts).
 */
export interface YamlTree {
  /** undefined when the document is empty or only comments. */
  value: unknown;
  /** Position of the value at a JSON pointer ("/metrics/0/match"). */
  valueAt: Map<string, Position>;
  /** Position of the key whose value sits at a JSON pointer. */
  keyAt: Map<string, Position>;
}

/**
 * JSON pointer segment escaping (RFC 6901: "~" -> "~0", "/" -> "~1"), the same as ajv's instancePath.
 * @example pointerSegment('size/app.js') // 'size~1app.js'
 */
export function pointerSegment(key: string | number): string {
  return String(key).replace(/~/g, '~0').replace(/\//g, '~1');
}
