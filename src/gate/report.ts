/**
 * The report object: the gate's whole answer, which every renderer (text, markdown, json, html)
 * and the action read. Field names of the JSON report (schema REPORT_SCHEMA) are part of the
 * product: scripts read them. The gate gives numbers and reasons as data; the words are
 * src/report's (reason.ts).
 */
import type { Family, Tolerance, UnsettledPolicy, Worse } from '../config/types.js';

export type Status = 'ok' | 'regressed' | 'improved' | 'learning' | 'new' | 'missing' | 'ignored';
/**
 * `unsettled`: no metric regressed on its own, but the run's shared move is beyond what the
 * history has shown (a slower runner, or a change that slowed everything: one run cannot tell).
 */
export type Verdict = 'pass' | 'regressed' | 'learning' | 'accepted' | 'unsettled';

export const REPORT_SCHEMA = 'bellgate.report/1';

/** Why a metric's baseline starts where it does (absent: the whole window). */
export type SinceReason = 'accepted' | 'manual' | 'change';

export interface BaselineSummary {
  /** Baseline runs behind the spread (the whole window, every level). */
  n: number;
  /** Centre of the current level, and the spread of the metric's own moves; on the log scale when scale === 'log'. */
  mean: number;
  sd: number;
  scale?: 'log';
  /** First run of the current level, when the baseline's centre starts later than its window. */
  since?: string;
  sinceReason?: SinceReason;
  /** For `accepted`: the pull request that carried the accept label. */
  sincePr?: number;
  /** Runs of the current level (the centre's evidence). */
  levelRuns?: number;
  /** When relative-to applies: the reference metric whose move is taken out. */
  relativeTo?: string;
  /** The run's runner fingerprint against the baseline's: `same` (only runs of that runner), `other` (none of it), `mixed`. */
  runner?: 'same' | 'other' | 'mixed';
  /** Degrees of freedom of the predictive Student-t on the worse side. */
  dof?: number;
}

/** What would make a metric's `detectable` smaller, from its history. */
export interface NoiseNote {
  /** The spread of the metric's own moves between runs, as a share of its centre. */
  betweenRuns: number;
  /** The spread of this run's samples, as a share (present when the run had 2 or more samples). */
  insideRun?: number;
  /** Baseline runs that would bring `detectable` within a tenth of its limit, and that limit (absent when it already is). */
  moreRuns?: { runs: number; detectable: number };
}

/** Why a result has the status it has, where the numbers alone do not say. */
export type Note =
  | { kind: 'ignored' }
  | { kind: 'missing'; runs: number; notJudged?: string }
  | { kind: 'new' }
  | { kind: 'learning'; runs: number; minRuns: number; levelRuns?: number }
  | { kind: 'no-reference'; reference: string; value?: number }
  | { kind: 'constant' }
  | { kind: 'within-tolerance'; tolerance: Tolerance };

export interface MetricResult {
  name: string;
  status: Status;
  value?: number;
  unit?: string;
  /** Samples behind this run's value. */
  count?: number;
  baseline?: BaselineSummary;
  /** This run's own move in sd of the own moves (value - centre - shared move, on the fit scale). */
  z?: number;
  /** (value - baseline centre) / baseline centre, on the metric's own scale. */
  change?: number;
  /** The run's shared move taken out of this metric, as a relative change (0.031 = 3.1% slower). */
  shared?: number;
  /** This metric's own move beside the shared one, as a relative change. */
  own?: number;
  /** Density of the predictive distribution at this run's value, on the fit scale. */
  density?: number;
  relativeDensity?: number;
  cutoff: number;
  /** The relative density this metric was compared with under family control (Holm's level at its rank). */
  effectiveCutoff?: number;
  worse: Worse;
  /** One-sided tail on the worse side (two-sided for worse: both); `adjusted` after family control. */
  tail?: number;
  adjusted?: number;
  /** The tail level it was compared with under family control. */
  level?: number;
  /** Smallest relative move on the worse side flagged with at least 80% probability (0.07 = 7%). */
  detectable?: number;
  noise?: NoiseNote;
  /** The shared move (group) this metric was judged beside. */
  group?: string;
  /** Newest baseline values on the metric's own scale, oldest first (for sparklines). */
  recent?: number[];
  note?: Note;
}

/** A run's shared move in one group of metrics, judged against the shared moves of the history. */
export interface SharedMoveResult {
  /** `timings` (the default group), a configured group's name, or `relative-to <metric>`. */
  name: string;
  status: 'ok' | 'unsettled' | 'learning';
  /** Metrics that took part in this run. */
  members: number;
  /** The shared move of this run as a relative change (0.12 = every timing about 12% slower). */
  move: number;
  /** Baseline runs with a shared move. */
  n: number;
  /** Its tail on the slow side against the history's shared moves. */
  tail?: number;
  /** The largest shared move of the history, as a relative change. */
  largest?: number;
  /** This run is a slow episode (several members far out at once; gate.ts holdEpisodes). */
  episode?: boolean;
  /** Members that would have regressed but were held because the run is a slow episode. */
  held?: string[];
}

/** A metric value this run holds but never judged nor records (a NaN sample, a failed test). */
export interface NotJudged {
  name: string;
  reason: string;
}

export interface Report {
  schema: typeof REPORT_SCHEMA;
  verdict: Verdict;
  /** Whether the verdict fails the check (regressed; unsettled with `unsettled: block`). */
  blocks: boolean;
  series: string;
  family: Family;
  /** The chance of any false alarm in a run that family control held to. */
  budget: number;
  unsettled: UnsettledPolicy;
  /** The run's runner fingerprint, when the caller knew it. */
  runner?: string;
  metrics: MetricResult[];
  shared: SharedMoveResult[];
  /**
   * Lines every rendering opens with, before the verdict: set by the adapters for what the gate
   * cannot know (the history was not used, this run was not recorded, and why).
   */
  notes?: string[];
  /** Baseline metrics this run lacks (missing-metrics.ts); absent when the history is empty. */
  missing?: { count: number; of: number };
  /** Values of this run that were never judged (Run.notFitted), by name. */
  notJudged?: NotJudged[];
}
