import { describe, expect, it } from 'vitest';
import { reviewSince } from '../../../src/gate/since/review-since.js';
import { InputError } from '../../../src/errors/input-error.js';
import { generateHistory, referenceId, type HistoryPlan, type MetricPlan, type NoiseKind } from './generate.js';

// The "Done when": 40 runs before the reference and 40 after, 1.5% log-normal noise.
const STEP = { offset: 20, factor: 1.08 };
const review = (metrics: Record<string, MetricPlan>, seed: number, extra: Partial<HistoryPlan> = {}) => {
  const plan: HistoryPlan = { before: 40, after: 40, seed, metrics, ...extra };
  return reviewSince(generateHistory(plan), { run: referenceId(plan) });
};
const within = (x: number, truth: number, share: number): boolean => Math.abs(x - truth) <= share * Math.abs(truth);

describe('reviewSince on generated histories (Done when of issue 16)', () => {
  const seeds = Array.from({ length: 20 }, (_, i) => i + 1);

  // Each case over seeds: the slope's own noise (about 0.0004 per run within 20-run segments) puts a
  // few seeds in 100 past 25% when two segments share it; `npm run bench`-sized sweeps stay out.
  it('+0.4% per run of creep after the reference: slope within 25% of the truth, no step', () => {
    let good = 0;
    for (const seed of seeds) {
      const m = review({ creep: { creep: 0.004 } }, seed).metrics[0]!;
      if (m.creep!.reported && within(m.creep!.slope, 0.004, 0.25) && m.steps.length === 0) good++;
      expect(m.status).toBe('worse');
      // 40 runs of +0.4%: 1.004^40 = 1.173 at the newest run; the window of the newest 10 centres ~1.15.
      expect(m.ratio!).toBeGreaterThan(1.1);
    }
    expect(good).toBeGreaterThanOrEqual(19);
  });

  it('one +8% step: found within 2 runs, its size near 8%, no creep', () => {
    for (const seed of seeds) {
      const m = review({ step: { steps: [STEP] } }, seed).metrics[0]!;
      expect(m.steps).toHaveLength(1);
      expect(Math.abs(m.steps[0]!.offset - STEP.offset)).toBeLessThanOrEqual(2);
      expect(m.steps[0]!.ratio).toBeGreaterThan(1.05);
      expect(m.steps[0]!.ratio).toBeLessThan(1.11);
      expect(m.creep!.reported).toBe(false);
      expect(m.ratio!).toBeGreaterThan(1.05);
    }
  });

  it('creep and a step together: both, the slope measured within the segments between steps', () => {
    let good = 0;
    for (const seed of seeds) {
      const m = review({ both: { creep: 0.004, steps: [STEP] } }, seed).metrics[0]!;
      expect(m.steps).toHaveLength(1);
      expect(Math.abs(m.steps[0]!.offset - STEP.offset)).toBeLessThanOrEqual(2);
      expect(m.creep!.reported).toBe(true);
      expect(m.creep!.segments).toBe(2);
      if (within(m.creep!.slope, 0.004, 0.25)) good++;
    }
    expect(good).toBeGreaterThanOrEqual(18);
  });

  it('flat noise: creep reported on at most 5 of 100 seeds (level 0.01), steps on at most 2', () => {
    let creep = 0;
    let steps = 0;
    for (let seed = 1; seed <= 100; seed++) {
      const m = review({ flat: {} }, 1000 + seed).metrics[0]!;
      if (m.creep!.reported) creep++;
      if (m.steps.length > 0) steps++;
    }
    expect(creep).toBeLessThanOrEqual(5);
    expect(steps).toBeLessThanOrEqual(2);
  });
});

describe('reviewSince under heavy-tailed noise', () => {
  const rates = (noise: NoiseKind, seeds: number) => {
    let found = 0;
    let falseCreep = 0;
    let falseSteps = 0;
    for (let seed = 1; seed <= seeds; seed++) {
      const [step, flat] = review({ step: { steps: [STEP], noise }, flat: { noise } }, 500 + seed).metrics;
      if (step!.steps.length === 1 && Math.abs(step!.steps[0]!.offset - STEP.offset) <= 2) found++;
      if (flat!.creep!.reported) falseCreep++;
      if (flat!.steps.length > 0) falseSteps++;
    }
    return { found, falseCreep, falseSteps };
  };

  it('Student-t noise (3 degrees of freedom): the step found, flat noise quiet', () => {
    const r = rates('student', 40);
    expect(r.found).toBeGreaterThanOrEqual(38);
    expect(r.falseCreep + r.falseSteps).toBeLessThanOrEqual(3);
  });

  it('one run in ten 30-100% slower: the slow runs are set aside, the step found', () => {
    const r = rates('outliers', 40);
    expect(r.found).toBeGreaterThanOrEqual(36);
    expect(r.falseCreep + r.falseSteps).toBeLessThanOrEqual(3);
  });

  it('load regimes that come and go (+25%, about 3 runs each): no creep from them', () => {
    const r = rates('regimes', 40);
    expect(r.falseCreep).toBeLessThanOrEqual(3);
  });

  it('a 10-run regime at +30% in the middle of the range is no step', () => {
    let flagged = 0;
    for (let seed = 1; seed <= 40; seed++) {
      const m = review(
        {
          t: {
            steps: [
              { offset: 12, factor: 1.3 },
              { offset: 22, factor: 1 / 1.3 },
            ],
          },
        },
        seed,
      ).metrics[0]!;
      if (m.steps.length > 0) flagged++;
    }
    expect(flagged).toBeLessThanOrEqual(2);
  });
});

describe('reviewSince: levels, family control, marks, references', () => {
  it('levels then and now with an interval for the ratio that covers the truth', () => {
    const m = review({ step: { steps: [{ offset: 3, factor: 1.1 }] } }, 7).metrics[0]!;
    expect(m.then!.n).toBe(10);
    expect(m.now!.n).toBe(10);
    expect(m.then!.to).toBe('run-40');
    expect(m.now!.to).toBe('run-80');
    expect(m.lower!).toBeLessThan(1.1);
    expect(m.upper!).toBeGreaterThan(1.1);
    expect(m.p!).toBeLessThan(1e-3);
    expect(m.scale).toBe('log');
  });

  it('Holm across metrics: the adjusted p is at least the raw one, and flat metrics stay unchanged', () => {
    const metrics: Record<string, MetricPlan> = { step: { steps: [STEP] } };
    for (let k = 0; k < 8; k++) metrics[`flat/${k}`] = {};
    const r = review(metrics, 3);
    for (const m of r.metrics) expect(m.adjusted!).toBeGreaterThanOrEqual(m.p!);
    expect(r.metrics[0]!.status).toBe('worse');
    expect(r.metrics.filter((m) => m.status !== 'unchanged')).toHaveLength(1);
  });

  it('a metric where lower is worse: a faster level is better', () => {
    const plan: HistoryPlan = { before: 40, after: 40, seed: 2, metrics: { rps: { steps: [STEP] } } };
    const r = reviewSince(generateHistory(plan), { run: referenceId(plan) }, { worse: () => 'lower' });
    expect(r.metrics[0]!.status).toBe('better');
  });

  it('accepted marks in the range, and the step they explain', () => {
    const r = review({ step: { steps: [STEP] }, other: {} }, 4, {
      runInfo: {
        [STEP.offset]: { marks: [{ reason: 'accepted', pr: 4321, metrics: ['step'] }] },
        [-5]: { marks: [{ reason: 'manual' }] },
      },
    });
    const [step, other] = r.metrics;
    expect(step!.accepted).toEqual([expect.objectContaining({ pr: 4321, reason: 'accepted', offset: STEP.offset })]);
    expect(step!.steps[0]!.mark?.pr).toBe(4321);
    // The mark names only "step"; the manual mark lies before the reference.
    expect(other!.accepted).toEqual([]);
  });

  it('the steps name the first run, its sha and its pull request', () => {
    const m = review({ step: { steps: [STEP] } }, 5).metrics[0]!;
    const step = m.steps[0]!;
    expect(step.run).toBe(`run-${40 + step.offset}`);
    expect(step.sha).toMatch(/^[0-9a-f]{10}$/);
    expect(step.pr).toBe(100 + 39 + step.offset);
  });

  it('a time without a run uses the nearest earlier run and says so; a sha matches its run', () => {
    const h = generateHistory({ before: 40, after: 40, seed: 1, metrics: { m: {} } });
    const byTime = reviewSince(h, { time: '2026-01-02T15:30:00Z' });
    expect(byTime.reference.run).toBe('run-40');
    expect(byTime.reference.exact).toBe(false);
    expect(byTime.reference.note).toMatch(/nearest earlier recorded run/);
    const sha = h.runs[39]!.sha!;
    expect(reviewSince(h, { sha: sha.slice(0, 7) }).reference.run).toBe('run-40');
    const unknown = reviewSince(h, { sha: 'fedcba9', time: '2026-01-02T15:30:00Z' });
    expect(unknown.reference).toMatchObject({ run: 'run-40', exact: false });
    expect(() => reviewSince(h, { sha: 'fedcba9' })).toThrow(InputError);
    expect(() => reviewSince(h, { run: 'nope' })).toThrow(/no run "nope"/);
    expect(() => reviewSince(h, { time: '2025-01-01' })).toThrow(/no recorded run at or before/);
  });

  it('new and gone metrics, and a reference at the newest run', () => {
    const h = generateHistory({ before: 40, after: 40, seed: 1, metrics: { m: {}, late: {}, dropped: {} } });
    h.columns.get('late')!.values.fill(Number.NaN, 0, 50);
    h.columns.get('dropped')!.values.fill(Number.NaN, 40);
    const r = reviewSince(h, { run: 'run-40' });
    expect(r.metrics.map((m) => m.status)).toEqual(['unchanged', 'new', 'gone']);
    const newest = reviewSince(h, { run: 'run-80' });
    expect(newest.runs).toBe(0);
    expect(newest.metrics[0]!.steps).toEqual([]);
  });
});
