import { existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { InputError } from '../errors/input-error.js';

/** The files of the demo scenario, all in examples/demo. */
export const DEMO_FILES = { history: 'history.jsonl', run: 'pr-run.json', config: 'bellgate.yml' } as const;

/**
 * Finds examples/demo. The same code runs from src/cli/ (tests), from the bundle dist/cli/index.js
 * and from an installed package, so the folder is looked for two and three levels above this
 * module and above the running script, then in the working folder.
 * @throws InputError naming the places tried when none holds the demo data.
 */
export function locateDemo(cwd: string, script: string | undefined, moduleUrl: string = import.meta.url): string {
  const starts: string[] = [];
  try {
    starts.push(dirname(fileURLToPath(moduleUrl)));
  } catch {
    // A bundler may leave a non-file URL here; the script path and cwd still work.
  }
  if (script) starts.push(dirname(resolve(script)));
  const candidates = [
    ...starts.flatMap((s) => [
      resolve(s, '..', '..', 'examples', 'demo'),
      resolve(s, '..', '..', '..', 'examples', 'demo'),
    ]),
    resolve(cwd, 'examples', 'demo'),
  ];
  const unique = [...new Set(candidates)];
  const found = unique.find((dir) => Object.values(DEMO_FILES).every((f) => existsSync(join(dir, f))));
  if (found === undefined) {
    throw new InputError('cannot find the demo data (examples/demo)', {
      where: unique.join(', '),
      fix: 'run the demo from a Bellgate checkout (npm run demo), where examples/demo holds history.jsonl, pr-run.json and bellgate.yml',
    });
  }
  return found;
}
