/**
 * The "Done when" figures, measured on 100 seeds each and printed (so `npx vitest run
 * test/gate/since/done-when.test.ts` shows them): 40 runs before the reference and 40 after, 1.5%
 * log-normal noise (test/gate/since/generate.ts). The truths are the generator's own parameters:
 * +0.4% per run of creep is a slope of ln(1.004) per run on the log scale, reported as the
 * relative change exp(slope) - 1 = 0.004; the +8% step starts at the 20th run after the reference.
 */
import { describe, expect, it } from 'vitest';
import { reviewSince } from '../../../src/gate/since/review-since.js';
import type { SinceMetric } from '../../../src/gate/since/since-report.js';
import { generateHistory, referenceId, type MetricPlan } from './generate.js';

const SEEDS = 100;
const CREEP = 0.004;
const STEP = { offset: 20, factor: 1.08 };

function sweep(plan: MetricPlan, first: number): SinceMetric[] {
  return Array.from({ length: SEEDS }, (_, k) => {
    const h = { before: 40, after: 40, seed: first + k, metrics: { m: plan } };
    return reviewSince(generateHistory(h), { run: referenceId(h) }).metrics[0]!;
  });
}
const slopeWithin = (m: SinceMetric): boolean =>
  m.creep !== null && m.creep.reported && Math.abs(m.creep.slope - CREEP) <= 0.25 * CREEP;
const stepWithin = (m: SinceMetric): boolean => m.steps.length === 1 && Math.abs(m.steps[0]!.offset - STEP.offset) <= 2;
const share = (ms: SinceMetric[], test: (m: SinceMetric) => boolean): number => ms.filter(test).length;
const medianSlope = (ms: SinceMetric[]): number => {
  const s = ms.map((m) => m.creep?.slope ?? Number.NaN).sort((a, b) => a - b);
  return (s[49]! + s[50]!) / 2;
};

describe('Done when of issue 16, on 100 seeds each', () => {
  it('creep, step, both, flat: the figures', () => {
    const creep = sweep({ creep: CREEP }, 1);
    const step = sweep({ steps: [STEP] }, 201);
    const both = sweep({ creep: CREEP, steps: [STEP] }, 401);
    const flat = sweep({}, 1001);
    const figures = {
      creepSlopeWithin25: share(creep, slopeWithin),
      creepMedianSlope: medianSlope(creep),
      creepFalseSteps: share(creep, (m) => m.steps.length > 0),
      stepFoundWithin2: share(step, stepWithin),
      stepFalseCreep: share(step, (m) => m.creep?.reported === true),
      bothStepWithin2: share(both, stepWithin),
      bothSlopeWithin25: share(both, slopeWithin),
      bothTwoSegments: share(both, (m) => m.creep?.segments === 2),
      flatCreepReported: share(flat, (m) => m.creep?.reported === true),
      flatStepReported: share(flat, (m) => m.steps.length > 0),
    };
    console.log(`issue 16 Done-when figures (of ${SEEDS} seeds):\n${JSON.stringify(figures, null, 2)}`);
    // The targets, per seed (each case should hold on almost every seed; the flat case
    // caps false creep at 5 of 100).
    expect(figures.creepSlopeWithin25).toBeGreaterThanOrEqual(90);
    expect(figures.stepFoundWithin2).toBeGreaterThanOrEqual(95);
    expect(figures.bothStepWithin2).toBeGreaterThanOrEqual(95);
    expect(figures.bothSlopeWithin25).toBeGreaterThanOrEqual(85);
    expect(figures.flatCreepReported).toBeLessThanOrEqual(5);
  });
});
