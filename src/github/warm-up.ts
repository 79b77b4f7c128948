import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { DEFAULT_CONFIG_PATHS } from '../config/locate.js';

/** What the action's warm-up can start loading: the config reader, the JSON metric reader. */
export type ActionWarmUpPart = 'config' | 'json';

const LOADERS: Record<ActionWarmUpPart, () => Promise<unknown>> = {
  config: () => import('../config/read.js'),
  json: () => import('../inputs/json.js'),
};

/**
 * Starts loading, beside the action's own chunk, the code its run will need: the config reader
 * (schema validator; the YAML library loads later, only for a config that is not plain, which
 * measured no slower than preloading it) when a config file exists, the JSON metric reader when a
 * `metrics` line ends in `.json`. Without it they load one after another, each waiting for the
 * step before. Only a head start: the modules are imported again where they are used, a wrong
 * guess costs a little time and nothing else, and a failed load is left to that later import.
 * Reads the inputs straight from the environment and never throws.
 * @example warmUpAction(process.env) // with INPUT_METRICS=bench.json: the JSON reader starts loading
 */
export function warmUpAction(env: Record<string, string | undefined>): void {
  const cwd = env.GITHUB_WORKSPACE || process.cwd();
  for (const part of actionWarmUpPlan(env, (p) => existsSync(resolve(cwd, p)))) LOADERS[part]().catch(() => undefined);
}

/**
 * Which parts the action's inputs will load (warmUpAction): the config reader when the `config`
 * input's file or a default config (`.github/bellgate.yml`/`.yaml`) exists; the JSON reader when a
 * `metrics` line ends in `.json` and `input-format` is empty or `json`.
 * @example actionWarmUpPlan({ INPUT_METRICS: 'out/a.json' }, () => false) // ['json']
 */
export function actionWarmUpPlan(
  env: Record<string, string | undefined>,
  exists: (path: string) => boolean,
): ActionWarmUpPart[] {
  // The variables of the inputs `config`, `input-format` and `metrics` (inputVariable in inputs.ts,
  // not imported: this module sits in the entry file and should pull nothing else in).
  const config = (env.INPUT_CONFIG ?? '').trim();
  const format = (env['INPUT_INPUT-FORMAT'] ?? '').trim().toLowerCase();
  const metrics = (env.INPUT_METRICS ?? '').split(/\r?\n/).map((l) => l.trim().toLowerCase());
  const plan: ActionWarmUpPart[] = [];
  if ((config === '' ? DEFAULT_CONFIG_PATHS : [config, ...DEFAULT_CONFIG_PATHS]).some(exists)) plan.push('config');
  if ((format === '' || format === 'json') && metrics.some((m) => m.endsWith('.json'))) plan.push('json');
  return plan;
}
