/**
 * The release review's answer (`bellgate since`): what changed in each metric between a reference
 * run and now. Every renderer (text, markdown, json) reads this object; the JSON field names are
 * part of the product (schema bellgate.since/1) and only grow.
 */
import type { Worse } from '../../config/types.js';

export const SINCE_SCHEMA = 'bellgate.since/1';

/**
 * worse / better: the level now differs from the level then (family-controlled test) on the
 * metric's worse or better side; unchanged: no such evidence; new: no value at or before the
 * reference; gone: no value after it.
 */
export type SinceStatus = 'worse' | 'better' | 'unchanged' | 'new' | 'gone';

/** A run as the review names it. */
export interface RunRef {
  run: string;
  sha?: string;
  pr?: number;
  time?: string;
}

/** How the reference given was matched to a recorded run. */
export interface ResolvedReference extends RunRef {
  /** Position of the run in the history (0 = oldest run kept). */
  index: number;
  /** What was asked for, as given. */
  requested: { run?: string; sha?: string; time?: string };
  /** false when no run matched exactly and the nearest earlier recorded run stands in. */
  exact: boolean;
  /** One sentence on how the reference was matched, when not exactly. */
  note?: string;
}

/** A level fitted on a window of runs: the median on the review's scale, back on the metric's own. */
export interface LevelWindow {
  n: number;
  level: number;
  /** First and last run of the window. */
  from: string;
  to: string;
}

/** A sustained level change between the reference and now. */
export interface SinceStep extends RunRef {
  /** Runs after the reference at which the new level starts (1 = the first run after it). */
  offset: number;
  /** Level after the step over level before it (creep taken out), e.g. 1.08 for +8%. */
  ratio: number;
  /** p-value of the hold test: the level since the step against the level before it. */
  p: number;
  /** A level mark within 2 runs of the step: the change was accepted (or marked) there. */
  mark?: SinceMark;
}

/** A trend over runs inside the segments between steps. */
export interface SinceCreep {
  /** Relative change per run (0.004 = +0.4% per run), Theil-Sen within segments. */
  slope: number;
  /** Confidence interval of the slope, relative per run (null when too few runs). */
  lower: number | null;
  upper: number | null;
  /** Mann-Kendall p-value (two-sided) within the segments, and after Holm across metrics. */
  p: number;
  adjusted: number;
  /** Kendall's S and its tau over the pairs compared. */
  s: number;
  tau: number;
  /** Runs measured and segments they fall into. */
  runs: number;
  segments: number;
  /** adjusted < the creep level: the trend is reported. */
  reported: boolean;
}

/** A level mark (accepted pull request or manual mark) on a run in the range. */
export interface SinceMark extends RunRef {
  offset: number;
  reason: 'accepted' | 'manual';
  note?: string;
}

export interface SinceMetric {
  name: string;
  unit?: string;
  status: SinceStatus;
  worse: Worse;
  /** log: levels compared as ratios of logs (positive values); raw: as differences. */
  scale: 'log' | 'raw';
  then?: LevelWindow;
  now?: LevelWindow;
  /** Level now over level then (Hodges-Lehmann shift), with its confidence interval. */
  ratio: number | null;
  lower: number | null;
  upper: number | null;
  /** Rank-sum p-value of now against then (two-sided), and after Holm across metrics. */
  p: number | null;
  adjusted: number | null;
  steps: SinceStep[];
  creep: SinceCreep | null;
  accepted: SinceMark[];
}

export interface SinceSettings {
  window: number;
  minSegment: number;
  stepLevel: number;
  creepLevel: number;
  level: number;
  confidence: number;
  family: 'holm';
}

export interface SinceReport {
  schema: typeof SINCE_SCHEMA;
  series: string;
  reference: ResolvedReference;
  latest: RunRef;
  /** Runs after the reference (the newest included). */
  runs: number;
  settings: SinceSettings;
  metrics: SinceMetric[];
}
