import type { Config, InputLimits, MetricSettings } from './types.js';

/**
 * Settings of a metric that no rule touches (README "Configuration"). A 1% tolerance keeps a
 * metric with a tiny spread from failing on a change nobody would act on.
 */
export const DEFAULT_SETTINGS: Readonly<MetricSettings> = Object.freeze({
  cutoff: 0.01,
  worse: 'higher',
  tolerance: Object.freeze({ kind: 'percent', amount: 0.01 }),
  resolution: 0,
  window: 60,
  minRuns: 8,
  transform: 'auto',
  ignore: false,
  aggregate: 'auto',
  changePoints: true,
  sharedMove: true,
} satisfies MetricSettings);

/**
 * Limits that fit ordinary CI output: 64 MiB files, 1 MiB lines, 100,000 metrics and 250,000
 * samples a run (a sample is one value of a metric, before repeated values are aggregated). The
 * sample cap bounds the memory and time a hostile file can take: readers hold every sample.
 */
export const DEFAULT_LIMITS: Readonly<InputLimits> = Object.freeze({
  maxFileBytes: 64 * 1024 * 1024,
  maxLineLength: 1024 * 1024,
  maxMetrics: 100_000,
  maxSamples: 250_000,
});

/** The chance of any false alarm in a run that family control holds to by default (README "The run's budget"). */
export const DEFAULT_BUDGET = 0.01;

/**
 * Newest runs kept in a history document: six months of a busy repository (20 recorded runs a
 * day is 3,660 runs in 183 days). A record appends one line whatever the length, so only the
 * file's size (about 4,000 x 100 values) speaks against more.
 */
export const DEFAULT_KEEP = 4000;

/**
 * The configuration used when there is no file (or it is empty): a fresh, mutable copy each call.
 * @example defaultConfig().defaults.cutoff // 0.01
 */
export function defaultConfig(): Config {
  return {
    defaults: { ...DEFAULT_SETTINGS, tolerance: { ...DEFAULT_SETTINGS.tolerance } },
    rules: [],
    groups: [],
    family: 'holm',
    budget: DEFAULT_BUDGET,
    unsettled: 'pass',
    keep: DEFAULT_KEEP,
    limits: { ...DEFAULT_LIMITS },
    source: '<defaults>',
  };
}
