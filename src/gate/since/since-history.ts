/**
 * What the review reads from a history: History with the RunInfo fields agreed in PLAN.md
 * (pr, marks). Declared here, as that contract spells them, until src/history carries them; a
 * History whose runs have them is a SinceHistory as it is.
 */
import type { History, RunInfo } from '../../history/history.js';

export interface LevelMark {
  /** Globs over metric names; absent = every metric. */
  metrics?: string[];
  reason: 'accepted' | 'manual';
  /** For 'accepted': the pull request that carried the accept label. */
  pr?: number;
  note?: string;
}

export interface SinceRunInfo extends RunInfo {
  pr?: number;
  marks?: LevelMark[];
}

export type SinceHistory = Omit<History, 'runs'> & { runs: readonly SinceRunInfo[] };
