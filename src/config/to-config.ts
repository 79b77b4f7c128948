import { defaultConfig } from './defaults.js';
import { compileGlobs, isLiteralGlob } from './glob-matcher.js';
import type { ConfigProblem } from './problems.js';
import { parseTolerance } from './tolerance.js';
import type { Config, Family, GroupSpec, MetricRule, MetricSettings } from './types.js';
import type { Position, YamlTree } from './tree.js';

type Data = Record<string, unknown>;

/** YAML key -> MetricSettings field. */
const FIELDS: ReadonlyArray<[string, keyof MetricSettings]> = [
  ['cutoff', 'cutoff'],
  ['worse', 'worse'],
  ['tolerance', 'tolerance'],
  ['resolution', 'resolution'],
  ['window', 'window'],
  ['min-runs', 'minRuns'],
  ['transform', 'transform'],
  ['aggregate', 'aggregate'],
  ['change-points', 'changePoints'],
  ['ignore', 'ignore'],
  ['relative-to', 'relativeTo'],
  ['shared-move', 'sharedMove'],
];

function settingsOf(data: Data): Partial<MetricSettings> {
  const out: Record<string, unknown> = {};
  for (const [key, field] of FIELDS) {
    if (data[key] === undefined) continue;
    out[field] = field === 'tolerance' ? parseTolerance(data[key]) : data[key];
  }
  return out as Partial<MetricSettings>;
}

/** A `match:` value (one glob or a list) as a list. */
export function globList(value: unknown): string[] {
  return Array.isArray(value) ? value.map(String) : [String(value)];
}

/**
 * Builds the Config from schema-valid plain data, and checks what the schema cannot: globs that
 * do not compile, a `relative-to` naming its own rule's metric, group names used twice, and
 * window or keep too small for min-runs (such metrics could never leave learning).
 * @example toConfig({ defaults: { tolerance: '2%' } }, tree, 'bellgate.yml').config.defaults.tolerance // { kind: 'percent', amount: 0.02 }
 */
export function toConfig(
  value: unknown,
  tree: YamlTree,
  source: string,
): { config: Config; problems: ConfigProblem[] } {
  const config = defaultConfig();
  config.source = source;
  const problems: ConfigProblem[] = [];
  const at = (pointer: string, key = false): Position => {
    for (let p = pointer; ; p = p.slice(0, p.lastIndexOf('/'))) {
      const found = (key ? tree.keyAt.get(p) : undefined) ?? tree.valueAt.get(p);
      if (found || p === '') return found ?? { line: 1, col: 1 };
    }
  };
  const root = (value ?? {}) as Data;

  Object.assign(config.defaults, settingsOf((root.defaults ?? {}) as Data));
  if (root.family !== undefined) config.family = root.family as Family;
  if (root.budget !== undefined) config.budget = parseTolerance(root.budget)?.amount ?? config.budget;
  if (root.unsettled !== undefined) config.unsettled = root.unsettled as Config['unsettled'];
  if (root.keep !== undefined) config.keep = root.keep as number;
  if (root['input-format'] !== undefined) config.inputFormat = root['input-format'] as string;
  const limits = (root.limits ?? {}) as Data;
  if (limits['max-file-bytes'] !== undefined) config.limits.maxFileBytes = limits['max-file-bytes'] as number;
  if (limits['max-line-length'] !== undefined) config.limits.maxLineLength = limits['max-line-length'] as number;
  if (limits['max-metrics'] !== undefined) config.limits.maxMetrics = limits['max-metrics'] as number;
  if (limits['max-samples'] !== undefined) config.limits.maxSamples = limits['max-samples'] as number;

  const checkGlobs = (list: string[], pointer: string): void => {
    try {
      compileGlobs(list);
    } catch (err) {
      problems.push({
        ...at(pointer),
        message: `a glob cannot be used: ${(err as Error).message}`,
        fix: 'write a shorter, simpler glob',
      });
    }
  };

  ((root.metrics ?? []) as Data[]).forEach((item, i) => {
    const pointer = `/metrics/${i}`;
    const rule: MetricRule = { match: globList(item.match), settings: settingsOf(item), line: at(pointer).line };
    checkGlobs(rule.match, `${pointer}/match`);
    const target = rule.settings.relativeTo;
    if (target !== undefined && rule.match.length === 1 && isLiteralGlob(rule.match[0]!) && rule.match[0] === target) {
      problems.push({
        ...at(`${pointer}/relative-to`),
        message: `relative-to names the rule's own metric "${target}"; it would be divided by itself`,
        fix: 'name a different metric of the same run, such as a calibration benchmark',
      });
    }
    config.rules.push(rule);
  });

  const names = new Map<string, number>();
  ((root.groups ?? []) as Data[]).forEach((item, i) => {
    const pointer = `/groups/${i}`;
    const name = String(item.name);
    const group: GroupSpec = {
      name,
      match: item.match === undefined ? [`${name}/**`] : globList(item.match),
      line: at(pointer).line,
    };
    checkGlobs(group.match, `${pointer}/match`);
    const earlier = names.get(name);
    if (earlier !== undefined) {
      problems.push({
        ...at(`${pointer}/name`),
        message: `group name "${name}" is used twice (first on line ${earlier})`,
        fix: 'give each group its own name',
      });
    } else {
      names.set(name, at(`${pointer}/name`).line);
    }
    config.groups.push(group);
  });

  checkRunCounts(config, root, at, problems);
  return { config, problems };
}

/** window and keep below min-runs leave a metric in learning for ever; say so where it was set. */
function checkRunCounts(
  config: Config,
  root: Data,
  at: (p: string, key?: boolean) => Position,
  problems: ConfigProblem[],
): void {
  const levels = [
    { pointer: '/defaults', own: (root.defaults ?? {}) as Data, settings: config.defaults, label: 'defaults' },
    ...config.rules.map((rule, i) => ({
      pointer: `/metrics/${i}`,
      own: ((root.metrics ?? []) as Data[])[i] ?? {},
      settings: { ...config.defaults, ...rule.settings },
      label: `metrics rule #${i + 1}`,
    })),
  ];
  for (const { pointer, own, settings, label } of levels) {
    const setHere = own.window !== undefined || own['min-runs'] !== undefined;
    if (settings.window < settings.minRuns && (setHere || pointer === '/defaults')) {
      const key = own.window !== undefined ? 'window' : own['min-runs'] !== undefined ? 'min-runs' : '';
      problems.push({
        ...at(key ? `${pointer}/${key}` : pointer, true),
        message: `window (${settings.window}) is smaller than min-runs (${settings.minRuns}) in ${label}, so its metrics would never leave learning`,
        fix: 'make window at least as large as min-runs',
      });
    }
    if (config.keep < settings.minRuns && (own['min-runs'] !== undefined || pointer === '/defaults')) {
      const pointerOfKeep = root.keep !== undefined ? '/keep' : `${pointer}/min-runs`;
      problems.push({
        ...at(pointerOfKeep, true),
        message: `keep (${config.keep}) is smaller than min-runs (${settings.minRuns}) in ${label}, so the history could never hold enough runs`,
        fix: 'make keep at least as large as every min-runs',
      });
    }
  }
}
