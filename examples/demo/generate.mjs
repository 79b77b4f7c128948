// Generates the demo scenario: Kestrel Post, an invented postal-address geocoding service, with
// 120 trusted CI runs on main and one pull-request run. Deterministic (seeded), so the committed
// files can be checked against a fresh generation (test/cli/demo-data.test.ts).
//
// Usage: node examples/demo/generate.mjs
// Writes runs.jsonl (the past runs, in the import format), pr-run.json (the pull request's metric
// file), bellgate.yml (the config), and then history.jsonl through the CLI's own import path:
// `bellgate import --history history.jsonl --runs runs.jsonl --series kestrel-post/ci`
// (needs the built CLI, dist/cli/index.js — run `npm run build` first).
import { execFileSync } from 'node:child_process';
import { existsSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const SEED = 20260611;
export const SERIES = 'kestrel-post/ci';
export const BASELINE_RUNS = 120;
/** The run at which the reverse-geocoding index rebuild was merged (a lasting step down). */
export const STEP_AT = 74;

/** mulberry32: a small, well-mixed 32-bit PRNG (Tommy Ettinger's public-domain generator). */
export function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal draws by the Box-Muller transform (both values of each pair are used). */
function normalSource(random) {
  let spare;
  return () => {
    if (spare !== undefined) {
      const v = spare;
      spare = undefined;
      return v;
    }
    const u = 1 - random(); // (0, 1]: log(u) stays finite
    const r = Math.sqrt(-2 * Math.log(u));
    const theta = 2 * Math.PI * random();
    spare = r * Math.sin(theta);
    return r * Math.cos(theta);
  };
}

const round = (x, digits) => Number(x.toFixed(digits));

/**
 * The metrics. Timings share the runner's speed factor (a slower machine slows all of them) and
 * have right-skewed own noise (a few slow outliers, never a much faster one); throughput moves
 * against the runner; sizes change only when code changes; memory has its own small noise.
 */
const TIMINGS = [
  { name: 'latency/geocode-p50', unit: 'ms', base: 12.4, noise: 0.012, digits: 2 },
  { name: 'latency/geocode-p95', unit: 'ms', base: 38.0, noise: 0.02, digits: 2 },
  { name: 'latency/reverse-p50', unit: 'ms', base: 8.1, noise: 0.012, digits: 2, stepTo: 7.3 },
  { name: 'latency/batch-1k', unit: 'ms', base: 640, noise: 0.01, digits: 1 },
  { name: 'build/compile', unit: 's', base: 94, noise: 0.015, digits: 1 },
  { name: 'test/suite', unit: 's', base: 212, noise: 0.02, digits: 1 },
];

function makeState() {
  const random = mulberry32(SEED);
  const normal = normalSource(random);
  return { random, normal, serverBinary: 18_400_512, webBundle: 142_311 };
}

/** Right-skewed own noise: a log-normal core times an occasional exponential slow-down. */
function timingNoise(state, sigma) {
  const slow = -Math.log(1 - state.random()) * sigma * 0.5;
  return Math.exp(sigma * state.normal()) * (1 + slow);
}

/** One run's values on a runner with speed factor `runner` (1 = typical, 1.05 = 5% slower). */
function measure(state, index, runner) {
  const values = [];
  for (const t of TIMINGS) {
    const base = t.stepTo !== undefined && index >= STEP_AT ? t.stepTo : t.base;
    values.push({ name: t.name, unit: t.unit, value: round(base * runner * timingNoise(state, t.noise), t.digits) });
  }
  values.push({
    name: 'throughput/geocode',
    unit: 'req/s',
    value: Math.round((5200 / runner) * Math.exp(0.012 * state.normal())),
  });
  // Sizes follow the code, not the runner: most commits leave them alone, some add a little.
  if (state.random() < 0.3) state.serverBinary += Math.round(600 + 900 * state.normal());
  if (state.random() < 0.25) state.webBundle += Math.round(40 + 150 * state.normal());
  values.push({ name: 'size/server-binary', unit: 'B', value: state.serverBinary });
  values.push({ name: 'size/web-bundle.js.gz', unit: 'B', value: state.webBundle });
  values.push({ name: 'memory/peak-rss', unit: 'MiB', value: round(412 * Math.exp(0.008 * state.normal()), 1) });
  return values;
}

function hex(random, length) {
  let s = '';
  while (s.length < length) s += Math.floor(random() * 16).toString(16);
  return s;
}

/** A runner's speed: mostly within a few percent, now and then a busy machine. */
function runnerFactor(state) {
  const busy = state.random() < 0.06 ? 1.05 : 1;
  return Math.exp(0.03 * state.normal()) * busy;
}

/** The whole scenario: the baseline runs (oldest first) and the pull request's metrics. */
export function generateScenario() {
  const state = makeState();
  const start = Date.parse('2026-03-02T08:00:00Z');
  const runs = [];
  let time = start;
  for (let i = 0; i < BASELINE_RUNS; i++) {
    time += Math.round((10 + 8 * state.random()) * 60) * 60_000; // every 10-18 hours, whole minutes
    runs.push({
      id: `${4_180_200 + i * 3}-1`,
      time: new Date(time).toISOString(),
      sha: hex(state.random, 40),
      ref: 'refs/heads/main',
      // Merges to main, plus a nightly scheduled run now and then.
      event: i % 7 === 6 ? 'schedule' : 'push',
      metrics: measure(state, i, runnerFactor(state)),
    });
  }
  const pr = measure(state, BASELINE_RUNS, runnerFactor(state))
    // The pull request removes the batch endpoint's benchmark (so it is missing) ...
    .filter((m) => m.name !== 'latency/batch-1k')
    .map((m) => {
      // ... makes the p95 latency clearly worse (a cache bypass on long addresses) ...
      if (m.name === 'latency/geocode-p95') return { ...m, value: round(m.value * 1.24, 2) };
      // ... and lowers peak memory (a smaller in-memory street index).
      if (m.name === 'memory/peak-rss') return { ...m, value: round(m.value * 0.89, 1) };
      return m;
    });
  // ... and adds a benchmark for the new autocomplete endpoint, measured three times.
  pr.push({ name: 'latency/autocomplete-p50', unit: 'ms', samples: [4.62, 4.58, 4.71] });
  return { runs, pr };
}

/** runs.jsonl: one past run a line, in the format `bellgate import` reads. */
export function renderRunsJsonl(runs) {
  return runs
    .map((r) => JSON.stringify({ id: r.id, time: r.time, sha: r.sha, ref: r.ref, event: r.event, metrics: r.metrics }))
    .join('\n')
    .concat('\n');
}

/** pr-run.json: the pull request's metric file, in Bellgate's own JSON metric format. */
export function renderPrRun(pr) {
  return `${JSON.stringify({ metrics: pr }, null, 2)}\n`;
}

/** bellgate.yml: the demo project's config. */
export function renderConfig() {
  return `# Bellgate config of the Kestrel Post demo (invented project; see examples/demo/generate.mjs).
defaults:
  cutoff: 0.01          # flag a metric whose relative density falls below 1%
  min-runs: 8
  window: 60
metrics:
  - match: ["latency/**", "build/*", "test/*"]
    transform: log      # timings are right-skewed: fit them on the log scale
  - match: "throughput/*"
    worse: lower        # fewer requests per second is the bad side
  - match: "size/**"
    tolerance: 4096     # bytes: smaller moves are never worth a red build
    resolution: 1
  - match: "memory/*"
    tolerance: 2%
`;
}

function main() {
  const here = dirname(fileURLToPath(import.meta.url));
  const { runs, pr } = generateScenario();
  writeFileSync(join(here, 'runs.jsonl'), renderRunsJsonl(runs));
  writeFileSync(join(here, 'pr-run.json'), renderPrRun(pr));
  writeFileSync(join(here, 'bellgate.yml'), renderConfig());
  const cli = resolve(here, '..', '..', 'dist', 'cli', 'index.js');
  if (!existsSync(cli)) {
    console.error(
      `wrote runs.jsonl, pr-run.json, bellgate.yml; build the CLI (npm run build) and run again to write history.jsonl`,
    );
    process.exitCode = 2;
    return;
  }
  const history = join(here, 'history.jsonl');
  rmSync(history, { force: true });
  execFileSync(
    process.execPath,
    [cli, 'import', '--history', history, '--runs', join(here, 'runs.jsonl'), '--series', SERIES],
    {
      stdio: 'inherit',
    },
  );
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) main();
