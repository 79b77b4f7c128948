/**
 * Generated histories with known creep and known steps, for the release review's tests: every
 * value is level x exp(noise), the level multiplied by (1 + creep) per run after the reference and
 * by each step's factor from its run on. Seeded (mulberry32 and Box-Muller, test/model/random.ts),
 * so every figure a test asserts is repeatable.
 */
import type { History, RunInfo } from '../../../src/history/history.js';
import { seededNormal, seededUniform } from '../../model/random.js';

/** How a metric's noise is drawn: log-normal, Student-t (3 df), log-normal with slow-run outliers, or load regimes. */
export type NoiseKind = 'lognormal' | 'student' | 'outliers' | 'regimes';

export interface MetricPlan {
  /** Level at the start (the metric's unit). Default 100. */
  level?: number;
  /** Relative change per run after the reference (0.004 = +0.4% per run). */
  creep?: number;
  /** Steps: runs after the reference (1 = the first after it) and the factor from then on. */
  steps?: { offset: number; factor: number }[];
  /** Spread of the noise on the log scale. Default 0.015. */
  sd?: number;
  noise?: NoiseKind;
  unit?: string;
}

export interface HistoryPlan {
  before: number;
  after: number;
  seed: number;
  metrics: Record<string, MetricPlan>;
  /** Runs (by offset after the reference) whose run info carries these extras. */
  runInfo?: Record<number, Partial<RunInfo>>;
}

/** The reference run's id in a generated history. */
export const referenceId = (plan: HistoryPlan): string => `run-${plan.before}`;

/** A history of plan.before runs up to and including the reference and plan.after runs after it. */
export function generateHistory(plan: HistoryPlan): History {
  const total = plan.before + plan.after;
  const reference = plan.before - 1;
  const runs: RunInfo[] = Array.from({ length: total }, (_, i) => ({
    id: `run-${i + 1}`,
    sha: (0x1000000 + i * 7919).toString(16).padStart(7, '0') + 'abc',
    time: new Date(Date.UTC(2026, 0, 1, 0, 0, 0) + i * 3_600_000).toISOString(),
    pr: 100 + i,
    ...(plan.runInfo?.[i - reference] ?? {}),
  }));
  const columns = new Map<string, { unit?: string; values: number[] }>();
  Object.entries(plan.metrics).forEach(([name, m], k) => {
    const normal = seededNormal(plan.seed * 1009 + k);
    const uniform = seededUniform(plan.seed * 7919 + k);
    const sd = m.sd ?? 0.015;
    const noise = noiseSource(m.noise ?? 'lognormal', sd, normal, uniform);
    const values = runs.map((_, i) => {
      const offset = i - reference;
      let level = m.level ?? 100;
      if (offset > 0 && m.creep) level *= (1 + m.creep) ** offset;
      for (const s of m.steps ?? []) if (offset >= s.offset) level *= s.factor;
      return level * Math.exp(noise());
    });
    columns.set(name, { unit: m.unit ?? 'ms', values });
  });
  return { series: 'generated', runs, columns };
}

function noiseSource(kind: NoiseKind, sd: number, normal: () => number, uniform: () => number): () => number {
  if (kind === 'lognormal') return () => sd * normal();
  if (kind === 'student') {
    // Student-t with 3 degrees of freedom, scaled to the same sd (its variance is 3): Z / sqrt(chi2_3 / 3).
    return () => {
      const chi = normal() ** 2 + normal() ** 2 + normal() ** 2;
      return (sd / Math.sqrt(3)) * (normal() / Math.sqrt(chi / 3));
    };
  }
  if (kind === 'outliers') {
    // One run in ten lands on a busy moment and runs 30-100% slower (as in the recorded corpus, test/noise).
    return () => sd * normal() + (uniform() < 0.1 ? Math.log(1.3 + 0.7 * uniform()) : 0);
  }
  // Load regimes that come and go: a busy regime (+25%) entered with chance 0.1 per run and left
  // with chance 0.3, so it lasts about 3 runs and covers about a quarter of the runs.
  let busy = false;
  return () => {
    busy = busy ? uniform() >= 0.3 : uniform() < 0.1;
    return sd * normal() + (busy ? Math.log(1.25) : 0);
  };
}
