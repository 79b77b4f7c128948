import { compileGlobs } from './glob-matcher.js';
import type { Config, GroupSpec, MetricSettings } from './types.js';

/**
 * The settings that decide one metric: the defaults, then every `metrics:` rule whose globs match
 * the name, in file order, so a later match overrides an earlier one key by key. Pure.
 * Globs are picomatch globs over the whole name; `*` does not cross '/', `**` does; a glob starting
 * with '!' excludes (see compileGlobs). A metric is never relative to itself: when the resolved
 * `relative-to` names the metric (the calibration benchmark matched by its own rule), it is dropped.
 * @example settingsFor(config, 'throughput/home').worse // 'lower' with the rule { match: 'throughput/*', worse: lower }
 */
export function settingsFor(config: Config, metric: string): MetricSettings {
  const settings: MetricSettings = { ...config.defaults };
  for (const rule of config.rules) {
    if (compileGlobs(rule.match)(metric)) Object.assign(settings, rule.settings);
  }
  if (settings.relativeTo === metric) delete settings.relativeTo;
  return settings;
}

/**
 * The group a metric belongs to: the first `groups:` entry whose globs match, or undefined.
 * @example groupFor(config, 'latency/render')?.name // 'latency' with the group { name: latency, match: 'latency/*' }
 */
export function groupFor(config: Config, metric: string): GroupSpec | undefined {
  return config.groups.find((group) => compileGlobs(group.match)(metric));
}
