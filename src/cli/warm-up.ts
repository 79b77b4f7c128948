import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { DEFAULT_CONFIG_PATHS } from '../config/locate.js';

/** What a warm-up can start loading: a command's module, the config reader, the JSON metric reader. */
export type WarmUpPart = 'check' | 'record' | 'config' | 'json';

/**
 * The check flow's module. `check`, `demo` and the warm-up all import it through here: one import
 * site gives the bundle one set of chunks for it (two sites in different chunks got two sets, and
 * `check` then waited for a second copy of check-flow after the warm-up had loaded the first).
 * @example const { performCheck } = await importCheckFlow();
 */
export const importCheckFlow = () => import('./check-flow.js');

/** The record command's module, through one import site for the same reason as importCheckFlow. */
export const importRecord = () => import('./run/record.js');

const LOADERS: Record<WarmUpPart, () => Promise<unknown>> = {
  check: importCheckFlow,
  record: importRecord,
  config: () => import('../config/read.js'),
  json: () => import('../inputs/json.js'),
};

/**
 * Starts loading the code `check` or `record` will need — the command's own module, the config
 * reader when there is a config file (the schema validator; the YAML library loads one wave later,
 * and only for a config that is not plain, see plain-yaml.ts: measured no slower for a config with
 * `metrics:` rules), the JSON metric reader when a metric file ends in `.json` — all at once,
 * while commander is still loading and parsing.
 * Without it they load one after another (command -> config reader -> metric reader), each wave
 * waiting for the one before. Only a head start: the modules are imported again where they are
 * used, a guess that turns out wrong costs a little time and nothing else, and a failed load is
 * left to that later import to report.
 * @example warmUp(['check', '--metrics', 'bench.json', '--config', 'b.yml'], '/repo') // 3 loads started
 */
export function warmUp(argv: readonly string[], cwd: string): void {
  const plan = warmUpPlan(argv, () => DEFAULT_CONFIG_PATHS.some((p) => existsSync(resolve(cwd, p))));
  for (const part of plan) LOADERS[part]().catch(() => undefined);
}

/**
 * Which parts a command line will load (warmUp). Only `check` and `record` warm up, and not when
 * asking for help; the config reader when `--config` is given or `defaultConfigPresent()`; the JSON
 * reader when a `--metrics` value ends in `.json` and no other `--input-format` is named.
 * @example warmUpPlan(['check', '--metrics', 'a.json'], () => false) // ['check', 'json']
 */
export function warmUpPlan(argv: readonly string[], defaultConfigPresent: () => boolean): WarmUpPart[] {
  const command = argv[0];
  if ((command !== 'check' && command !== 'record') || argv.includes('--help') || argv.includes('-h')) return [];
  const plan: WarmUpPart[] = [command];
  if (argv.some((a) => a === '--config' || a.startsWith('--config=')) || defaultConfigPresent()) plan.push('config');
  if (readsJson(argv)) plan.push('json');
  return plan;
}

function readsJson(argv: readonly string[]): boolean {
  const format = argv.indexOf('--input-format');
  if (format >= 0 && argv[format + 1] !== 'json') return false;
  let inMetrics = false;
  for (const arg of argv) {
    if (arg.startsWith('-')) inMetrics = arg === '--metrics';
    else if (inMetrics && arg.toLowerCase().endsWith('.json')) return true;
  }
  return false;
}
