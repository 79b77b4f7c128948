/**
 * Seeded simulators of a series' runs, for measuring the gate (issue 13 item 8): heavy tails,
 * bimodal "slow process" runs, load regimes that come and go, a shared runner factor, and the
 * issue's simulated project. Every generator returns a Scenario: history runs (oldest first),
 * clean test runs drawn from the same process after the history, and test runs carrying one
 * single-metric slowdown on the metric's worse side (higher: every simulated metric is a time or
 * a size). The parameters each one states are in `params`, and simulate.test.ts checks them.
 *
 * One model underlies all five. For metric j in run k, on the log scale:
 *   log v = log base_j + sens_j * shared_k + own_jk + log(1 + slowSens_j * slow_k) + step_jk
 * where shared_k is the run's common (runner or regime) log shift, own_jk the metric's own noise,
 * slow_k the extra time of a slow process (0 in a normal run) and step_jk a lasting level change.
 * Sizes have sens = slowSens = 0. Randomness comes only from test/model/random.ts (mulberry32).
 */
import { seededNormal, seededUniform } from '../model/random.js';

/** One metric of one simulated or recorded run. `samples` are the repetitions inside the run. */
export interface MetricSpec {
  value: number;
  unit?: string;
  samples?: number[];
}

/** What the generator put into a run: for checking the generator, never read by the gate. */
export interface RunTruth {
  /** The run's common log shift (runner speed, load regime level). */
  shared: number;
  /** Extra relative time of a slow process (0 = a normal run). */
  slow: number;
  /** Load regime: 0 = base level, 1 = the raised level (regime switches only). */
  regime: number;
}

export interface RunSpec {
  id: string;
  time: string;
  metrics: Map<string, MetricSpec>;
  truth?: RunTruth;
  /** Free-form facts about a recorded run (load regime, load average); not read by the gate. */
  note?: Record<string, string | number>;
}

/** A test run with one metric `factor` times its clean value (factor > 1: slower or larger). */
export interface Regression {
  run: RunSpec;
  metric: string;
  factor: number;
}

/** A metric of a simulated project: its noise-free value, its unit and what moves it. */
export interface MetricModel {
  name: string;
  unit: string;
  kind: 'time' | 'size';
  base: number;
  /** Multiplier of the run's shared log shift (0 for sizes). */
  sens: number;
  /** Multiplier of a slow process's extra time (0 for sizes). */
  slowSens: number;
}

export interface Scenario {
  name: string;
  description: string;
  params: Record<string, number | string | boolean>;
  metrics: MetricModel[];
  history: RunSpec[];
  clean: RunSpec[];
  regressed: Regression[];
}

/** Counts and shape of the test runs; the defaults match the recorded corpus (60 / 100 / 60). */
export interface Counts {
  seed?: number;
  history?: number;
  clean?: number;
  regressed?: number;
  /** Slowdown factors of the regressed runs, cycled in order. */
  factors?: readonly number[];
  /** Repetitions inside each run (0: one value, no samples); their own log sd is `withinSd`. */
  samples?: number;
  withinSd?: number;
}

const START = Date.UTC(2026, 2, 2, 6, 0, 0);
const HOUR = 3_600_000;

/** What one run's latent state is; a generator's `next` advances its own state (regimes). */
interface RunDraw {
  shared: number;
  slow: number;
  regime: number;
}

interface ProcessSpec {
  name: string;
  description: string;
  params: Record<string, number | string | boolean>;
  metrics: MetricModel[];
  /** Own log noise of metric j: a draw from the generator's own noise law. */
  own: (j: number) => number;
  next: () => RunDraw;
  step?: { metric: string; at: number; factor: number };
  /** Names a regression may fall on (default: every metric). */
  targets?: string[];
}

function resolved(counts: Counts, fallback: Required<Omit<Counts, 'seed'>>): Required<Omit<Counts, 'seed'>> {
  return {
    history: counts.history ?? fallback.history,
    clean: counts.clean ?? fallback.clean,
    regressed: counts.regressed ?? fallback.regressed,
    factors: counts.factors ?? fallback.factors,
    samples: counts.samples ?? fallback.samples,
    withinSd: counts.withinSd ?? fallback.withinSd,
  };
}

const CORPUS_SHAPE = { history: 60, clean: 100, regressed: 60, factors: [1.05, 1.1, 1.2], samples: 0, withinSd: 0.005 };

/**
 * Draws the history, then clean and regressed test runs alternately from the same continuing
 * process (so a regime process gives both kinds the same mix), and applies the slowdowns.
 */
function buildScenario(spec: ProcessSpec, shape: Required<Omit<Counts, 'seed'>>, seed: number): Scenario {
  const normal = seededNormal(seed ^ 0x5bd1e995);
  const uniform = seededUniform(seed ^ 0x27d4eb2f);
  let index = 0;
  const draw = (id: string): RunSpec => {
    const k = index++;
    const state = spec.next();
    const metrics = new Map<string, MetricSpec>();
    spec.metrics.forEach((m, j) => {
      let log = Math.log(m.base) + m.sens * state.shared + spec.own(j) + Math.log1p(m.slowSens * state.slow);
      if (spec.step !== undefined && spec.step.metric === m.name && k >= spec.step.at)
        log += Math.log(spec.step.factor);
      const value = m.kind === 'size' ? Math.round(Math.exp(log)) : Math.exp(log);
      if (shape.samples <= 0) metrics.set(m.name, { value, unit: m.unit });
      else {
        const samples = Array.from({ length: shape.samples }, () =>
          m.kind === 'size' ? value : value * Math.exp(shape.withinSd * normal()),
        );
        metrics.set(m.name, { value: medianOf(samples), unit: m.unit, samples });
      }
    });
    return { id, time: new Date(START + k * HOUR).toISOString(), metrics, truth: { ...state } };
  };
  const history = Array.from({ length: shape.history }, (_, i) => draw(`h-${pad(i + 1)}`));
  const clean: RunSpec[] = [];
  const regressed: Regression[] = [];
  const targets = spec.targets ?? spec.metrics.map((m) => m.name);
  for (let i = 0; i < Math.max(shape.clean, shape.regressed); i++) {
    if (i < shape.clean) clean.push(draw(`c-${pad(i + 1)}`));
    if (i < shape.regressed) {
      const run = draw(`r-${pad(i + 1)}`);
      const metric = targets[Math.floor(uniform() * targets.length)]!;
      const factor = shape.factors[i % shape.factors.length]!;
      regressed.push({ run: slowed(run, metric, factor), metric, factor });
    }
  }
  return {
    name: spec.name,
    description: spec.description,
    params: { ...spec.params, seed, history: shape.history, clean: shape.clean, regressed: shape.regressed },
    metrics: spec.metrics,
    history,
    clean,
    regressed,
  };
}

/** The run with one metric (value and samples) multiplied by factor. */
export function slowed(run: RunSpec, metric: string, factor: number): RunSpec {
  const metrics = new Map(run.metrics);
  const m = metrics.get(metric);
  if (m === undefined) throw new Error(`run ${run.id} has no metric ${metric}`);
  metrics.set(metric, {
    ...m,
    value: m.value * factor,
    ...(m.samples === undefined ? {} : { samples: m.samples.map((s) => s * factor) }),
  });
  return { ...run, metrics };
}

function pad(i: number): string {
  return String(i).padStart(4, '0');
}

export function medianOf(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Timings "timing/tNN" with log-uniform bases 2..200 ms, and sizes "size/sNN" of 10 kB..2 MB. */
function projectMetrics(
  uniform: () => number,
  timings: number,
  sizes: number,
  sens: () => number,
  slowSens: () => number,
): MetricModel[] {
  const list: MetricModel[] = [];
  for (let j = 0; j < timings; j++) {
    const base = Math.exp(Math.log(2) + uniform() * Math.log(100));
    list.push({ name: `timing/t${pad2(j)}`, unit: 'ms', kind: 'time', base, sens: sens(), slowSens: slowSens() });
  }
  for (let j = 0; j < sizes; j++) {
    const base = Math.round(Math.exp(Math.log(1e4) + uniform() * Math.log(200)));
    list.push({ name: `size/s${pad2(j)}`, unit: 'B', kind: 'size', base, sens: 0, slowSens: 0 });
  }
  return list;
}

function pad2(j: number): string {
  return String(j).padStart(2, '0');
}

/** Student-t with integer df: Z / sqrt(chi2_df / df), the chi-square as a sum of df squared normals. */
function studentT(normal: () => number, df: number): number {
  let chi = 0;
  for (let i = 0; i < df; i++) chi += normal() ** 2;
  return normal() / Math.sqrt(chi / df);
}

export interface HeavyTailOptions extends Counts {
  timings?: number;
  /** Degrees of freedom of the own noise (integer). */
  df?: number;
  /** Scale of the own noise's Student-t on the log scale (its sd is scale * sqrt(df / (df - 2))). */
  scale?: number;
  /** Sd of a Gaussian shared log factor on all timings (0 = none). */
  sharedSd?: number;
}

/** 1. Heavy tails: each timing's own log noise is scale x Student-t(df = 3), plus a small shared factor. */
export function heavyTails(options: HeavyTailOptions = {}): Scenario {
  const seed = options.seed ?? 1301;
  const { timings = 20, df = 3, scale = 0.03, sharedSd = 0.01 } = options;
  const normal = seededNormal(seed);
  const uniform = seededUniform(seed + 1);
  return buildScenario(
    {
      name: 'heavy tails',
      description: `${timings} timings, own log noise ${scale} x Student-t(${df}), shared log sd ${sharedSd}`,
      params: { timings, df, scale, sharedSd },
      metrics: projectMetrics(
        uniform,
        timings,
        0,
        () => 1,
        () => 0,
      ),
      own: () => scale * studentT(normal, df),
      next: () => ({ shared: sharedSd * normal(), slow: 0, regime: 0 }),
    },
    resolved(options, CORPUS_SHAPE),
    seed,
  );
}

export interface BimodalOptions extends Counts {
  timings?: number;
  /** Share of runs that land on a slow process. */
  slowShare?: number;
  /** A slow process is slowMin..slowMax (uniform) slower: 0.3..1.0 = 30-100%. */
  slowMin?: number;
  slowMax?: number;
  /** Each timing's sensitivity to a slow process, uniform in sensMin..sensMax. */
  sensMin?: number;
  sensMax?: number;
  ownSd?: number;
}

/**
 * 2. Bimodal slow runs: a share of runs (25%) land on a slow process, 30-100% slower; timing j
 * takes (1 + c_j * s) times as long, c_j its own sensitivity (0.5..1.5); own log noise 2%.
 */
export function bimodal(options: BimodalOptions = {}): Scenario {
  const seed = options.seed ?? 1302;
  const { timings = 20, slowShare = 0.25, slowMin = 0.3, slowMax = 1, sensMin = 0.5, sensMax = 1.5 } = options;
  const ownSd = options.ownSd ?? 0.02;
  const normal = seededNormal(seed);
  const uniform = seededUniform(seed + 1);
  const episodes = seededUniform(seed + 2);
  return buildScenario(
    {
      name: 'bimodal slow runs',
      description: `${timings} timings, ${100 * slowShare}% of runs ${100 * slowMin}-${100 * slowMax}% slower (sensitivity ${sensMin}-${sensMax}), own log sd ${ownSd}`,
      params: { timings, slowShare, slowMin, slowMax, sensMin, sensMax, ownSd },
      metrics: projectMetrics(
        uniform,
        timings,
        0,
        () => 1,
        () => sensMin + (sensMax - sensMin) * uniform(),
      ),
      own: () => ownSd * normal(),
      next: () => ({
        shared: 0,
        slow: episodes() < slowShare ? slowMin + (slowMax - slowMin) * episodes() : 0,
        regime: 0,
      }),
    },
    resolved(options, CORPUS_SHAPE),
    seed,
  );
}

export interface RegimeOptions extends Counts {
  timings?: number;
  /** Relative rise of the shared level in the raised regime (0.25 = 25% slower). */
  lift?: number;
  /** Long-run share of runs in the raised regime. */
  raisedShare?: number;
  /** Mean length of a raised block, in runs (geometric). */
  blockMean?: number;
  sensMin?: number;
  sensMax?: number;
  sharedSd?: number;
  ownSd?: number;
}

/**
 * 3. Regime switches: a two-state Markov chain of load; in the raised state the shared log level is
 * log(1 + lift) higher for a block of runs (mean blockMean) and then comes back. Timing j feels it
 * with sensitivity 0.5..1.5; a Gaussian shared factor (1%) and own noise (2%) on top.
 */
export function regimes(options: RegimeOptions = {}): Scenario {
  const seed = options.seed ?? 1303;
  const { timings = 20, lift = 0.25, raisedShare = 0.3, blockMean = 8, sensMin = 0.5, sensMax = 1.5 } = options;
  const { sharedSd = 0.01, ownSd = 0.02 } = options;
  const normal = seededNormal(seed);
  const uniform = seededUniform(seed + 1);
  const chain = seededUniform(seed + 2);
  const leave = 1 / blockMean;
  const enter = (leave * raisedShare) / (1 - raisedShare);
  let state = 0;
  return buildScenario(
    {
      name: 'regime switches',
      description: `${timings} timings, raised load +${100 * lift}% in blocks (mean ${blockMean} runs, ${100 * raisedShare}% of runs), shared sd ${sharedSd}, own sd ${ownSd}`,
      params: { timings, lift, raisedShare, blockMean, sensMin, sensMax, sharedSd, ownSd },
      metrics: projectMetrics(
        uniform,
        timings,
        0,
        () => sensMin + (sensMax - sensMin) * uniform(),
        () => 0,
      ),
      own: () => ownSd * normal(),
      next: () => {
        state = state === 0 ? (chain() < enter ? 1 : 0) : chain() < leave ? 0 : 1;
        return { shared: state * Math.log1p(lift) + sharedSd * normal(), slow: 0, regime: state };
      },
    },
    resolved(options, CORPUS_SHAPE),
    seed,
  );
}

export interface SharedRunnerOptions extends Counts {
  timings?: number;
  sharedSd?: number;
  ownSd?: number;
}

/**
 * 4. A shared runner factor: every timing of a run is multiplied by one log-normal factor
 * exp(N(0, 3%)), and by its own exp(N(0, 2%)). The shared share of each timing's log variance is
 * sharedSd^2 / (sharedSd^2 + ownSd^2) = 0.69.
 */
export function sharedRunner(options: SharedRunnerOptions = {}): Scenario {
  const seed = options.seed ?? 1304;
  const { timings = 20, sharedSd = 0.03, ownSd = 0.02 } = options;
  const normal = seededNormal(seed);
  const uniform = seededUniform(seed + 1);
  return buildScenario(
    {
      name: 'shared runner factor',
      description: `${timings} timings, shared log sd ${sharedSd}, own log sd ${ownSd}`,
      params: { timings, sharedSd, ownSd, sharedShare: sharedSd ** 2 / (sharedSd ** 2 + ownSd ** 2) },
      metrics: projectMetrics(
        uniform,
        timings,
        0,
        () => 1,
        () => 0,
      ),
      own: () => ownSd * normal(),
      next: () => ({ shared: sharedSd * normal(), slow: 0, regime: 0 }),
    },
    resolved(options, CORPUS_SHAPE),
    seed,
  );
}

export interface ProjectOptions extends Counts {
  timings?: number;
  sizes?: number;
  /** Sizes that vary a little (the rest are constant), and their own log sd. */
  noisySizes?: number;
  sizeSd?: number;
  sharedSd?: number;
  ownSd?: number;
  /** The lasting step: its factor and the history run (0-based) it starts at. */
  stepFactor?: number;
  stepAt?: number;
}

/**
 * 5. The simulated project of issue 13: 40 log-normal timings with 2% own and 3% shared runner
 * noise, 10 byte sizes (7 constant, 3 with 0.2% noise), one lasting +15% step in one timing at
 * history run 30 of 60; clean test runs and runs with one +10% regression on a random timing or
 * size. 300 clean and 300 regressed runs by default (the "at least 300").
 */
export function simulatedProject(options: ProjectOptions = {}): Scenario {
  const seed = options.seed ?? 1305;
  const { timings = 40, sizes = 10, noisySizes = 3, sizeSd = 0.002, sharedSd = 0.03, ownSd = 0.02 } = options;
  const { stepFactor = 1.15, stepAt = 30 } = options;
  const normal = seededNormal(seed);
  const uniform = seededUniform(seed + 1);
  const metrics = projectMetrics(
    uniform,
    timings,
    sizes,
    () => 1,
    () => 0,
  );
  const stepMetric = metrics[Math.floor(uniform() * timings)]!.name;
  const ownSds = metrics.map((m, j) => (m.kind === 'time' ? ownSd : j - timings < noisySizes ? sizeSd : 0));
  return buildScenario(
    {
      name: 'simulated project',
      description: `${timings} timings (own ${ownSd}, shared ${sharedSd}), ${sizes} sizes (${noisySizes} with sd ${sizeSd}), +${Math.round(100 * (stepFactor - 1))}% step in ${stepMetric} at run ${stepAt}`,
      params: { timings, sizes, noisySizes, sizeSd, sharedSd, ownSd, stepFactor, stepAt, stepMetric },
      metrics,
      own: (j) => (ownSds[j] === 0 ? 0 : ownSds[j]! * normal()),
      next: () => ({ shared: sharedSd * normal(), slow: 0, regime: 0 }),
      step: { metric: stepMetric, at: stepAt, factor: stepFactor },
    },
    resolved(options, { ...CORPUS_SHAPE, clean: 300, regressed: 300, factors: [1.1] }),
    seed,
  );
}

/** The four noise shapes and the project, at their stated defaults. */
export function allSimulations(seed?: number): Scenario[] {
  const s = seed === undefined ? {} : { seed };
  return [heavyTails(s), bimodal(s), regimes(s), sharedRunner(s), simulatedProject(s)];
}
