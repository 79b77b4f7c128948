import { createRequire } from 'node:module';
import { mean, median, quantile, sampleCorrelation, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { bimodal, heavyTails, regimes, sharedRunner, simulatedProject, type Scenario } from './simulate.js';

// Each generator is checked against what it states, with simple-statistics (median, quantile,
// sampleStandardDeviation, sampleCorrelation) and jStat's Student-t quantiles as the reference
// computations. Long histories keep the sampling error well inside the tolerances, which are
// several standard errors wide (the standard error of each check is worked out beside it).
const jStat = createRequire(import.meta.url)('jstat') as {
  studentt: { inv(p: number, df: number): number };
  normal: { inv(p: number, mean: number, sd: number): number };
};

/** log(value / base) of every run of the history, per metric: the noise the generator added. */
function logRatios(s: Scenario, names = s.metrics.map((m) => m.name)): Map<string, number[]> {
  const out = new Map<string, number[]>();
  for (const name of names) {
    const base = s.metrics.find((m) => m.name === name)!.base;
    out.set(
      name,
      s.history.map((r) => Math.log(r.metrics.get(name)!.value / base)),
    );
  }
  return out;
}

/** Per run, the median over its timings of log(value / base): the run's common shift. */
function runShifts(s: Scenario): number[] {
  const ratios = [...logRatios(s).values()];
  return s.history.map((_, k) => median(ratios.map((r) => r[k]!)));
}

describe('simulators produce the noise they state', () => {
  it('the same seed gives the same runs, another seed other runs', () => {
    const a = sharedRunner({ seed: 7 });
    const b = sharedRunner({ seed: 7 });
    const c = sharedRunner({ seed: 8 });
    const first = (s: Scenario) => [...s.clean[0]!.metrics.values()].map((m) => m.value);
    expect(first(a)).toEqual(first(b));
    expect(first(a)).not.toEqual(first(c));
  });

  it('every scenario has the stated counts, ids oldest first and one slowed metric per regressed run', () => {
    const s = heavyTails({ history: 61, clean: 17, regressed: 9 });
    expect([s.history.length, s.clean.length, s.regressed.length]).toEqual([61, 17, 9]);
    const times = s.history.map((r) => Date.parse(r.time));
    expect(times.every((t, i) => i === 0 || t > times[i - 1]!)).toBe(true);
    expect(new Set([...s.history, ...s.clean, ...s.regressed.map((r) => r.run)].map((r) => r.id)).size).toBe(87);
    // factors cycle through 1.05, 1.1, 1.2
    expect(s.regressed.map((r) => r.factor).slice(0, 4)).toEqual([1.05, 1.1, 1.2, 1.05]);
    for (const r of s.regressed) expect(r.run.metrics.has(r.metric)).toBe(true);
  });

  it('heavy tails: own log noise / scale has the quantiles of Student-t(3) (jStat studentt.inv)', () => {
    const s = heavyTails({ history: 1000, sharedSd: 0 });
    const z = [...logRatios(s).values()].flat().map((x) => x / 0.03);
    const abs = z.map(Math.abs);
    // 20,000 draws: the standard error of the 0.99 quantile of t(3) (density 0.0061 at 4.54) is
    // sqrt(0.01 * 0.99 / 20000) / 0.0061 = 0.11, i.e. 2.5%; of the 0.75 quantile about 1%.
    for (const p of [0.75, 0.95, 0.99]) {
      const expected = jStat.studentt.inv(0.5 + p / 2, 3);
      expect(Math.abs(quantile(abs, p) / expected - 1)).toBeLessThan(0.1);
    }
    // and the tails are heavy: a Gaussian with the same MAD would put 0.05% beyond 3.5 robust sd
    const robustSd = 1.4826 * median(abs);
    const beyond = abs.filter((x) => x > 3.5 * robustSd).length / abs.length;
    expect(beyond).toBeGreaterThan(0.015);
  });

  it('bimodal: 25% of runs on a slow process, 30-100% slower, visible in the values', () => {
    const s = bimodal({ history: 2000 });
    const slowTruth = s.history.filter((r) => r.truth!.slow > 0).length / s.history.length;
    // binomial standard error at n = 2000: sqrt(0.25 * 0.75 / 2000) = 0.0097
    expect(Math.abs(slowTruth - 0.25)).toBeLessThan(0.035);
    const shifts = runShifts(s);
    // the runs' median shift separates them: own noise 2% cannot reach log(1.1)
    const slowSeen = shifts.filter((x) => x > Math.log(1.1)).length / shifts.length;
    expect(Math.abs(slowSeen - slowTruth)).toBeLessThan(0.01);
    const slowShifts = shifts.filter((x) => x > Math.log(1.1)).map(Math.expm1);
    // process slowness 0.3..1.0 times a median sensitivity near 1
    expect(Math.min(...slowShifts)).toBeGreaterThan(0.15);
    expect(Math.max(...slowShifts)).toBeLessThan(1.3);
    expect(Math.abs(mean(slowShifts) - 0.65)).toBeLessThan(0.1);
  });

  it('regime switches: 30% of runs raised by 25% in blocks of 8 runs on average', () => {
    const s = regimes({ history: 4000 });
    const states = s.history.map((r) => r.truth!.regime);
    const raised = states.filter((x) => x === 1).length / states.length;
    // a Markov chain's share varies more than a binomial one: with blocks of 8 and gaps of 18.7,
    // about 150 cycles in 4000 runs; the share's standard error is near 0.02
    expect(Math.abs(raised - 0.3)).toBeLessThan(0.06);
    const blocks: number[] = [];
    let length = 0;
    for (const x of [...states, 0]) {
      if (x === 1) length++;
      else if (length > 0) {
        blocks.push(length);
        length = 0;
      }
    }
    // geometric lengths: sd about 7.5, over ~150 blocks the mean's standard error is about 0.6
    expect(Math.abs(mean(blocks) - 8)).toBeLessThan(2);
    const shifts = runShifts(s);
    const up = mean(shifts.filter((_, k) => states[k] === 1));
    const down = mean(shifts.filter((_, k) => states[k] === 0));
    // the median sensitivity over 20 timings is near 1 (uniform 0.5..1.5)
    expect(Math.abs((up - down) / Math.log(1.25) - 1)).toBeLessThan(0.25);
  });

  it('shared runner factor: explains 0.03^2 / (0.03^2 + 0.02^2) = 69% of each timing log variance', () => {
    const s = sharedRunner({ history: 1500 });
    const ratios = [...logRatios(s).values()];
    const correlations: number[] = [];
    for (let a = 0; a < ratios.length; a++)
      for (let b = a + 1; b < ratios.length; b++) correlations.push(sampleCorrelation(ratios[a]!, ratios[b]!));
    // the correlation of two timings is the shared share of the variance
    expect(Math.abs(mean(correlations) - (s.params.sharedShare as number))).toBeLessThan(0.04);
    const sds = ratios.map((r) => sampleStandardDeviation(r));
    expect(Math.abs(mean(sds) / Math.hypot(0.03, 0.02) - 1)).toBeLessThan(0.05);
  });

  it('simulated project: 40 timings at 3.6% log sd, 10 sizes (7 constant), a lasting +15% step, +10% regressions', () => {
    const s = simulatedProject();
    expect(s.metrics.filter((m) => m.kind === 'time')).toHaveLength(40);
    expect(s.metrics.filter((m) => m.kind === 'size')).toHaveLength(10);
    expect([s.history.length, s.clean.length, s.regressed.length]).toEqual([60, 300, 300]);
    const step = s.params.stepMetric as string;
    const sizes = s.metrics.filter((m) => m.kind === 'size').map((m) => m.name);
    const constant = sizes.filter((n) => new Set(s.history.map((r) => r.metrics.get(n)!.value)).size === 1);
    expect(constant).toHaveLength(7);

    const long = simulatedProject({ history: 2000, stepAt: 1000 });
    const ratios = logRatios(long);
    const timings = long.metrics.filter((m) => m.kind === 'time' && m.name !== long.params.stepMetric);
    const sds = timings.map((m) => sampleStandardDeviation(ratios.get(m.name)!));
    expect(Math.abs(mean(sds) / Math.hypot(0.03, 0.02) - 1)).toBeLessThan(0.05);
    const stepped = ratios.get(long.params.stepMetric as string)!;
    // the step's size, net of the shared factor (the other timings' mean log ratio in each run)
    const common = long.history.map((_, k) => mean(timings.map((m) => ratios.get(m.name)![k]!)));
    const before = mean(stepped.slice(0, 1000).map((x, k) => x - common[k]!));
    const after = mean(stepped.slice(1000).map((x, k) => x - common[k + 1000]!));
    expect(Math.abs(after - before - Math.log(1.15))).toBeLessThan(0.01);
    // the step lasts into the test runs
    expect(s.clean.every((r) => r.metrics.has(step))).toBe(true);

    expect(s.regressed.every((r) => r.factor === 1.1)).toBe(true);
    const onSizes = s.regressed.filter((r) => sizes.includes(r.metric)).length;
    // a random metric of 50: a size with chance 0.2, binomial sd over 300 = 0.023
    expect(Math.abs(onSizes / 300 - 0.2)).toBeLessThan(0.08);
  });

  it('samples inside a run: the value is their median, their spread the stated within-run sd', () => {
    const s = sharedRunner({ samples: 7, withinSd: 0.01, history: 300 });
    const spreads: number[] = [];
    for (const run of s.history)
      for (const m of run.metrics.values()) {
        expect(m.samples).toHaveLength(7);
        expect(m.value).toBe(median(m.samples!));
        spreads.push(sampleStandardDeviation(m.samples!.map(Math.log)));
      }
    // the mean of sample sds is below sigma (c4 = 0.959 at n = 7, from memory)
    expect(Math.abs(mean(spreads) / (0.959 * 0.01) - 1)).toBeLessThan(0.03);
  });

  it('simulated project: an oracle that knows the runner factor, bases and sds catches about 89.5% of +10% at a 1% run budget', () => {
    // Issue 13 quotes the limit on this project (runner factor, mean and sd known, 1% chance of any
    // false alarm per run): 0.9 false alarms per 100 and 89.5% caught. The oracle here judges each
    // metric's own move with Bonferroni over the 50 metrics, one-sided: z > Phi^-1(1 - 0.01 / 50).
    const s = simulatedProject({ clean: 2000, regressed: 2000, seed: 99 });
    const step = { metric: s.params.stepMetric as string, factor: s.params.stepFactor as number };
    const sd = (m: { kind: string; name: string }, j: number) =>
      m.kind === 'time' ? 0.02 : j - 40 < (s.params.noisySizes as number) ? (s.params.sizeSd as number) : 0;
    const limit = jStat.normal.inv(1 - 0.01 / s.metrics.length, 0, 1);
    const flagged = (run: (typeof s.clean)[number]) =>
      s.metrics.filter((m, j) => {
        const expected =
          Math.log(m.base) + m.sens * run.truth!.shared + (m.name === step.metric ? Math.log(step.factor) : 0);
        const own = Math.log(run.metrics.get(m.name)!.value) - expected;
        const spread = sd(m, j);
        // sizes are rounded to whole bytes: half a byte is no move
        return spread === 0 ? own > 0.5 / m.base : own / spread > limit;
      });
    const falseAlarms = s.clean.filter((r) => flagged(r).length > 0).length / s.clean.length;
    const caught =
      s.regressed.filter((r) => flagged(r.run).some((m) => m.name === r.metric)).length / s.regressed.length;
    // sampling error over 2000 runs: about 0.2 points on the alarms and 0.7 points on the catch
    expect(falseAlarms).toBeLessThan(0.015);
    expect(Math.abs(caught - 0.895)).toBeLessThan(0.025);
  });
});
