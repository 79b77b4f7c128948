/** The resolved configuration, after YAML loading, schema validation and defaults. */

export type Worse = 'higher' | 'lower' | 'both';
export type Transform = 'none' | 'log';
export type FitMethod = 'mle' | 'unbiased' | 'robust';
export type Uncertainty = 'predictive' | 'plug-in';
export type Aggregate = 'median' | 'mean' | 'min' | 'max';
export type Family = 'none' | 'bonferroni' | 'holm' | 'fdr';

/** `tolerance: 512` is absolute (metric's unit); `tolerance: 1%` is a share of the baseline mean. */
export type Tolerance = { kind: 'absolute'; amount: number } | { kind: 'percent'; amount: number };

/** Everything that decides one metric. YAML keys are kebab-case (min-runs, relative-to, change-points). */
export interface MetricSettings {
  cutoff: number;
  worse: Worse;
  tolerance: Tolerance;
  resolution: number;
  window: number;
  minRuns: number;
  transform: Transform;
  fit: FitMethod;
  uncertainty: Uncertainty;
  ignore: boolean;
  aggregate: Aggregate;
  /** Divide by this metric of the same run before fitting (a calibration benchmark). */
  relativeTo?: string;
  /** Fit only the runs since the last detected level change (PELT), once there are min-runs of them. */
  changePoints: boolean;
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
}

export interface Config {
  defaults: MetricSettings;
  rules: MetricRule[];
  groups: GroupSpec[];
  family: Family;
  /** Newest runs kept in the history; trimming is the only deletion. */
  keep: number;
  inputFormat?: string;
  limits: InputLimits;
  /** Where it was read from, for messages ("<defaults>" when no file). */
  source: string;
}
