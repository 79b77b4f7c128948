import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { InputError } from '../errors/input-error.js';
import { whereInJson } from './json-where.js';

/**
 * The JSON reader stores a cheap place with each reading, `file (metrics[3])` or `file (name)`,
 * and finds the line only when an error needs it. For an error raised after reading (a unit the
 * history refuses), this reads the file again and gives `file:line:col (metrics[3])`; any other
 * place, or a file that changed or cannot be read, is returned as it was.
 * @example await exactPlace('bench.json (metrics[0])', cwd) // 'bench.json:2:5 (metrics[0])'
 */
export async function exactPlace(place: string, cwd: string): Promise<string> {
  const m = /^(.+) \((?:metrics\[(\d+)\]|(.+))\)$/.exec(place);
  if (!m) return place;
  const [, file = '', index, name] = m;
  try {
    const text = await readFile(path.resolve(cwd, file), 'utf8');
    return whereInJson(text, file, index !== undefined ? ['metrics', Number(index)] : [name ?? '']);
  } catch {
    return place;
  }
}

/**
 * Runs `align` (a check after reading, such as alignRunUnits) and, when it refuses with an
 * InputError at a JSON reading's cheap place, says the exact line instead.
 * @example const run = await withExactPlace(() => alignRunUnits(read, unitOf), cwd)
 */
export async function withExactPlace<T>(align: () => T | Promise<T>, cwd: string): Promise<T> {
  try {
    return await align();
  } catch (error) {
    if (!(error instanceof InputError) || error.where === undefined) throw error;
    throw new InputError(error.message, {
      where: await exactPlace(error.where, cwd),
      ...(error.fix === undefined ? {} : { fix: error.fix }),
      cause: error,
    });
  }
}
