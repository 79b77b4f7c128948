/** The resolved configuration, after YAML loading, schema validation and defaults. */

export type Worse = 'higher' | 'lower' | 'both';
/** `auto`: the log scale for metrics with a time unit, none for the rest. */
export type Transform = 'auto' | 'none' | 'log';
/** `auto`: the min for metrics with a time unit, the median for the rest. */
export type Aggregate = 'auto' | 'median' | 'mean' | 'min' | 'max';
export type Family = 'none' | 'bonferroni' | 'holm' | 'fdr';
/** What a run whose shared move is beyond the history (verdict `unsettled`) does to the check. */
export type UnsettledPolicy = 'pass' | 'block';

/** `tolerance: 512` is absolute (metric's unit); `tolerance: 1%` is a share of the baseline mean. */
export type Tolerance = { kind: 'absolute'; amount: number } | { kind: 'percent'; amount: number };

/** Everything that decides one metric. YAML keys are kebab-case (min-runs, relative-to, change-points, shared-move). */
export interface MetricSettings {
  cutoff: number;
  worse: Worse;
  tolerance: Tolerance;
  resolution: number;
  window: number;
  minRuns: number;
  transform: Transform;
  ignore: boolean;
  aggregate: Aggregate;
  /** The shared move of the run is this metric's move: it is judged on its own move beside it. */
  relativeTo?: string;
  /** Restart the metric's baseline at a detected lasting change of its own level. */
  changePoints: boolean;
  /** A timing takes part in (and has removed) the run's shared move of the timings. */
  sharedMove: boolean;
}

/** One `metrics:` entry: globs over metric names and the settings it overrides. */
export interface MetricRule {
  match: string[];
  settings: Partial<MetricSettings>;
  /** 1-based line of the rule in the config file, for messages. */
  line?: number;
}

export interface GroupSpec {
  name: string;
  match: string[];
  line?: number;
}

export interface InputLimits {
  maxFileBytes: number;
  maxLineLength: number;
  maxMetrics: number;
  maxSamples: number;
}

export interface Config {
  defaults: MetricSettings;
  rules: MetricRule[];
  /** Metrics that share a move of their own (instead of the timings' shared move). */
  groups: GroupSpec[];
  family: Family;
  /** The chance of any false alarm in a run that family control holds to (0.01 = 1%). */
  budget: number;
  unsettled: UnsettledPolicy;
  /** Newest runs kept in the history; trimming is the only deletion. */
  keep: number;
  inputFormat?: string;
  limits: InputLimits;
  /** Where it was read from, for messages ("<defaults>" when no file). */
  source: string;
}
