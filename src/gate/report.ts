/**
 * The report object: the gate's whole answer, which every renderer (text, markdown, json, html)
 * and the action read. Field names of the JSON report are part of the product (DESIGN.md).
 */
import type { Family, Worse } from '../config/types.js';

export type Status = 'ok' | 'regressed' | 'improved' | 'learning' | 'new' | 'missing' | 'ignored';
export type Verdict = 'pass' | 'regressed' | 'learning' | 'accepted';

export const REPORT_SCHEMA = 'bellgate.report/1';

export interface BaselineSummary {
  n: number;
  /** Fitted centre and spread; on the log scale when scale === 'log'. */
  mean: number;
  sd: number;
  scale?: 'log';
  /** Set when change-point detection shortened the baseline: id of the first run used. */
  since?: string;
  /** When relative-to applies: values are ratios to this metric. */
  relativeTo?: string;
}

export interface MetricResult {
  name: string;
  status: Status;
  value?: number;
  unit?: string;
  /** Samples behind this run's value. */
  count?: number;
  baseline?: BaselineSummary;
  z?: number;
  /** (value - baseline mean) / baseline mean, on the metric's own scale. */
  change?: number;
  density?: number;
  relativeDensity?: number;
  cutoff: number;
  worse: Worse;
  /** Tail probability of the deviation (family control); `adjusted` after Holm/BH/Bonferroni. */
  tail?: number;
  adjusted?: number;
  /** Name of the joint group that judged this metric. */
  group?: string;
  /** Newest baseline values on the metric's own scale, oldest first (for sparklines). */
  recent?: number[];
  /** One sentence on why the status is what it is. */
  reason: string;
}

export interface GroupMember {
  name: string;
  /** Share of the Mahalanobis distance this member accounts for (sums to about 1). */
  share: number;
  /** The member's own move after the group's common move is taken out, in its own sd. */
  ownZ: number;
}

export interface GroupResult {
  name: string;
  status: 'ok' | 'regressed' | 'improved' | 'learning';
  members: GroupMember[];
  n: number;
  /** Squared Mahalanobis distance of this run from the baseline mean. */
  distance: number;
  tail: number;
  level: number;
  /** The common move of all members (mean of standardised values), judged against its own history. */
  common: { z: number; tail: number; status: 'ok' | 'regressed' | 'improved' };
  shrinkage: number;
  /** Tail of the Mahalanobis distance alone (Hotelling's T^2), one part of `tail`. */
  distanceTail?: number;
  /** Bonferroni tail of the largest own move alone, the other part of `tail`. */
  ownTail?: number;
  /** `tail` after family control, when `family` is not none. */
  adjusted?: number;
  reason: string;
}

/** A metric value this run holds but never judged nor records (a NaN sample, a failed test). */
export interface NotJudged {
  name: string;
  reason: string;
}

export interface Report {
  schema: typeof REPORT_SCHEMA;
  verdict: Verdict;
  series: string;
  family: Family;
  metrics: MetricResult[];
  groups: GroupResult[];
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
