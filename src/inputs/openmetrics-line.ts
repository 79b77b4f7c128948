import { InputError } from '../errors/input-error.js';
import { truncate } from './numbers.js';

/** One sample line, split but not interpreted: name, labels in written order, value text. */
export interface SampleLine {
  name: string;
  labels: [string, string][];
  value: string;
}

const NAME = /[a-zA-Z_:][a-zA-Z0-9_:]*/y;
const LABEL_NAME = /[a-zA-Z_][a-zA-Z0-9_]*/y;

/**
 * Splits `name{label="value",...} value [timestamp] [# exemplar]` (OpenMetrics 1.0 "ABNF";
 * Prometheus text format 0.0.4). Label values may hold the escapes `\\`, `\"` and `\n`.
 * @throws InputError naming the line and what was expected where.
 * @example parseSampleLine('a{x="1"} 2 1700000000', 'f:1') // { name: 'a', labels: [['x', '1']], value: '2' }
 */
export function parseSampleLine(line: string, where: string): SampleLine {
  const fail = (what: string): never => {
    throw new InputError(`expected ${what} in sample line ${JSON.stringify(truncate(line))}`, {
      where,
      fix: 'write samples as name{label="value"} 1.5 (see the OpenMetrics text format)',
    });
  };
  NAME.lastIndex = 0;
  const name = NAME.exec(line)?.[0] ?? fail('a metric name at the start');
  let at = name.length;
  const labels: [string, string][] = [];
  if (line[at] === '{') {
    at++;
    const keys = new Set<string>();
    for (;;) {
      at = skipSpaces(line, at);
      if (line[at] === '}') break;
      LABEL_NAME.lastIndex = at;
      const key = LABEL_NAME.exec(line)?.[0] ?? fail(`a label name at column ${at + 1}`);
      at = skipSpaces(line, at + key.length);
      if (line[at] !== '=') fail(`"=" after label ${key}`);
      at = skipSpaces(line, at + 1);
      if (line[at] !== '"') fail(`a quoted value for label ${key}`);
      const [value, end] = readQuoted(line, at + 1) ?? fail(`a closing quote for label ${key}`);
      if (keys.has(key)) fail(`label ${key} only once`);
      keys.add(key);
      labels.push([key, value]);
      at = skipSpaces(line, end);
      if (line[at] === ',') at++;
      else if (line[at] !== '}') fail(`"," or "}" after label ${key}`);
    }
    at++;
  }
  if (line[at] !== ' ' && line[at] !== '\t') fail('a space and a value after the name');
  const exemplar = line.indexOf(' #', at);
  const fields = (exemplar < 0 ? line.slice(at) : line.slice(at, exemplar)).trim().split(/[ \t]+/);
  if (fields[0] === '' || fields.length > 2) fail('a value and at most a timestamp');
  return { name, labels, value: fields[0]! };
}

function skipSpaces(line: string, at: number): number {
  while (line[at] === ' ' || line[at] === '\t') at++;
  return at;
}

/** Reads an escaped label value starting after its opening quote; returns it and the index after the closing quote. */
function readQuoted(line: string, start: number): [string, number] | undefined {
  let out = '';
  for (let i = start; i < line.length; i++) {
    const c = line[i]!;
    if (c === '"') return [out, i + 1];
    if (c === '\\') {
      const next = line[++i];
      if (next === 'n') out += '\n';
      else if (next === '\\' || next === '"') out += next;
      else if (next === undefined) return undefined;
      else out += `\\${next}`; // Prometheus keeps unknown escapes as written
    } else {
      out += c;
    }
  }
  return undefined;
}
