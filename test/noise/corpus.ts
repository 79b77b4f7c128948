/**
 * Reader of the recorded real-noise corpus (test/fixtures/noise/<regime>.jsonl, format in the
 * README there): turns each load regime's runs into scenarios for the evaluation harness, per
 * timing source (wall clock or process CPU time), plus a cross-regime scenario (history from one
 * regime, test runs from another) and a mixed one.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  medianOf,
  type MetricModel,
  type MetricSpec,
  type Regression,
  type RunSpec,
  type Scenario,
} from './simulate.js';

export const CORPUS_DIR = fileURLToPath(new URL('../fixtures/noise/', import.meta.url));

export type Source = 'wall' | 'cpu';

export interface CorpusHeader {
  schema: string;
  regime: string;
  load: string;
  started: string;
  machine: Record<string, string | number>;
  workload: { samples: number; warmup: number; unit: string };
  plan: { seed: number; history: number; clean: number; slowed: number; factors: number[] };
  timings: string[];
  sizes: { name: string; unit: string }[];
}

export interface CorpusRun {
  seq: number;
  kind: 'history' | 'clean' | 'slowed';
  metric?: string;
  factor?: number;
  /** Busy processes of ours running beside this run (0 or 1). */
  load: number;
  time: string;
  loadavg: [number, number, number];
  running: number;
  seconds: number;
  /** wall[j] / cpu[j]: the samples of timing j (header.timings[j]), in ms. */
  wall: number[][];
  cpu: number[][];
  sizes: number[];
}

export interface Regime {
  name: string;
  header: CorpusHeader;
  runs: CorpusRun[];
}

/** Every regime file of the corpus, by name (quiet, loaded, blocks), in file-name order. */
export function readCorpus(dir = CORPUS_DIR): Regime[] {
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.jsonl'))
    .sort();
  return files.map((file) => {
    const lines = readFileSync(join(dir, file), 'utf8')
      .split('\n')
      .filter((l) => l.trim() !== '');
    const header = JSON.parse(lines[0]!) as CorpusHeader;
    if (header.schema !== 'bellgate.noise-corpus/1') throw new Error(`${file}:1: not a noise corpus file`);
    const runs = lines.slice(1).map((l, i) => {
      const run = JSON.parse(l) as CorpusRun;
      if (run.wall.length !== header.timings.length || run.sizes.length !== header.sizes.length)
        throw new Error(`${file}:${i + 2}: a run does not match the header's metrics`);
      return run;
    });
    return { name: header.regime, header, runs };
  });
}

/** One recorded run as a scenario run: each timing is the median of its samples (the default aggregate). */
export function toSpec(regime: Regime, run: CorpusRun, source: Source): RunSpec {
  const metrics = new Map<string, MetricSpec>();
  regime.header.timings.forEach((name, j) => {
    const samples = run[source][j]!;
    metrics.set(name, { value: medianOf(samples), unit: regime.header.workload.unit, samples });
  });
  regime.header.sizes.forEach((s, j) => metrics.set(s.name, { value: run.sizes[j]!, unit: s.unit }));
  return {
    id: `${regime.name}-${run.seq}`,
    time: run.time,
    metrics,
    note: { regime: regime.name, kind: run.kind, load: run.load, loadavg: run.loadavg[0] },
  };
}

function metricModels(regime: Regime): MetricModel[] {
  return [
    ...regime.header.timings.map((name) => ({
      name,
      unit: 'ms',
      kind: 'time' as const,
      base: NaN,
      sens: 1,
      slowSens: 1,
    })),
    ...regime.header.sizes.map((s) => ({
      name: s.name,
      unit: s.unit,
      kind: 'size' as const,
      base: NaN,
      sens: 0,
      slowSens: 0,
    })),
  ];
}

function tests(regime: Regime, source: Source): { clean: RunSpec[]; regressed: Regression[] } {
  const clean = regime.runs.filter((r) => r.kind === 'clean').map((r) => toSpec(regime, r, source));
  const regressed = regime.runs
    .filter((r) => r.kind === 'slowed')
    .map((r) => ({ run: toSpec(regime, r, source), metric: r.metric!, factor: r.factor! }));
  return { clean, regressed };
}

function historyOf(regime: Regime, source: Source): RunSpec[] {
  return regime.runs.filter((r) => r.kind === 'history').map((r) => toSpec(regime, r, source));
}

/** One regime: its history runs, then its clean and slowed runs (recorded interleaved, after the history). */
export function regimeScenario(regime: Regime, source: Source): Scenario {
  return {
    name: `${regime.name} ${source}`,
    description: `recorded, ${regime.header.load}; ${source === 'wall' ? 'wall clock' : 'process CPU time'}`,
    params: { regime: regime.name, source, started: regime.header.started },
    metrics: metricModels(regime),
    history: historyOf(regime, source),
    ...tests(regime, source),
  };
}

/** History from one regime, test runs from another: the load moved between the baseline and the PR. */
export function crossScenario(from: Regime, to: Regime, source: Source): Scenario {
  return {
    name: `${from.name}->${to.name} ${source}`,
    description: `history recorded ${from.header.load}; test runs ${to.header.load}`,
    params: { history: from.name, tests: to.name, source },
    metrics: metricModels(from),
    history: historyOf(from, source),
    ...tests(to, source),
  };
}

/**
 * Every regime's history runs interleaved (alternately, oldest first) and every regime's test
 * runs: a baseline that mixes load regimes, as a shared runner pool does.
 */
export function mixedScenario(regimes: readonly Regime[], source: Source): Scenario {
  const histories = regimes.map((r) => historyOf(r, source));
  const history: RunSpec[] = [];
  for (let k = 0; k < Math.max(...histories.map((h) => h.length)); k++)
    for (const h of histories) if (k < h.length) history.push(h[k]!);
  const all = regimes.map((r) => tests(r, source));
  return {
    name: `mixed ${source}`,
    description: `history runs of ${regimes.map((r) => r.name).join(', ')} interleaved; their test runs`,
    params: { regimes: regimes.map((r) => r.name).join(','), source },
    metrics: metricModels(regimes[0]!),
    history,
    clean: all.flatMap((t) => t.clean),
    regressed: all.flatMap((t) => t.regressed),
  };
}

/**
 * The scenarios the noise test judges: every regime by wall and CPU time, quiet->loaded and
 * loaded->quiet, and the mixed one. Regimes still being recorded (no test runs yet) are left out.
 */
export function corpusScenarios(regimes = readCorpus()): Scenario[] {
  const complete = regimes.filter((r) => r.runs.some((x) => x.kind !== 'history'));
  const out: Scenario[] = [];
  const quiet = complete.find((r) => r.name === 'quiet');
  const loaded = complete.find((r) => r.name === 'loaded');
  for (const source of ['cpu', 'wall'] as const) {
    for (const r of complete) out.push(regimeScenario(r, source));
    if (quiet !== undefined && loaded !== undefined) {
      out.push(crossScenario(quiet, loaded, source));
      out.push(crossScenario(loaded, quiet, source));
    }
    if (complete.length > 1) out.push(mixedScenario(complete, source));
  }
  return out;
}
