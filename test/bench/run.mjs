// The benchmark (`npm run bench`): times whole processes on a synthetic history and prints the
// median wall time and peak memory of each, against the floor (node reading and JSON-parsing the
// same numbers as a plain array of arrays) and against bare node.
//
//   node test/bench/run.mjs [--runs 1000] [--metrics 1000] [--repeat 5] [--dist dist]
//                           [--only floor,check,record,action] [--growth] [--keep-files]
//
// --dist names the folder the bundles were built into (node test/build-dist.mjs DIR).
// --growth adds the growth table: check and floor at 250/500/1000 runs and metrics.
// --profile DIR writes a CPU profile of every timed process into DIR (node --cpu-prof).
// Peak memory is ru_maxrss of each process, written at exit by peak-memory.cjs (preloaded).
// Each line carries the 1-minute load average at its start, since a busy machine slows everything.
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, totalmem, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { generate } from './generate.mjs';

const root = resolve(new URL('../..', import.meta.url).pathname);
const { values: flags } = parseArgs({
  options: {
    runs: { type: 'string', default: '1000' },
    metrics: { type: 'string', default: '1000' },
    repeat: { type: 'string', default: '5' },
    dist: { type: 'string', default: join(root, 'dist') },
    only: { type: 'string', default: 'floor,check,record,action' },
    growth: { type: 'boolean', default: false },
    'keep-files': { type: 'boolean', default: false },
    profile: { type: 'string' },
  },
});

function positive(name) {
  const n = Number(flags[name]);
  if (!Number.isInteger(n) || n < 1) {
    console.error(`bench: --${name} must be a positive whole number, got "${flags[name]}"`);
    process.exit(2);
  }
  return n;
}
const runs = positive('runs');
const metrics = positive('metrics');
const repeat = positive('repeat');
const only = new Set(flags.only.split(','));
const dist = resolve(flags.dist);
const cli = join(dist, 'cli', 'index.js');
const action = join(dist, 'index.cjs');
for (const file of [cli, action]) {
  if (!existsSync(file)) {
    console.error(`bench: ${file} is missing; build the bundles first: node test/build-dist.mjs ${dist}`);
    process.exit(2);
  }
}
const peakPreload = join(root, 'test', 'bench', 'peak-memory.cjs');
const work = mkdtempSync(join(tmpdir(), 'bellgate-bench-'));
const floorScript =
  "const a=JSON.parse(require('fs').readFileSync(process.argv[1],'utf8'));if(!Array.isArray(a))process.exit(9)";

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
};

/**
 * A process to time: `node ...args` in `cwd`, after `before()` (untimed) each time; an exit code
 * outside `okCodes` fails the bench loudly with the process's output.
 */
function task(label, args, { env = {}, cwd = work, before = () => {}, okCodes = [0] } = {}) {
  return { label, args, env, cwd, before, okCodes, ms: [], cpu: [], peaks: [], load: loadavg()[0] };
}

/** Runs one task once and keeps its wall time, CPU time and peak memory. */
function runOnce(t) {
  const peakFile = join(work, 'peak.txt');
  t.before();
  rmSync(peakFile, { force: true });
  const profile = flags.profile ? ['--cpu-prof', '--cpu-prof-dir', resolve(flags.profile)] : [];
  const t0 = process.hrtime.bigint();
  const out = spawnSync(process.execPath, [...profile, ...t.args], {
    cwd: t.cwd,
    env: {
      PATH: process.env.PATH,
      HOME: process.env.HOME,
      ...t.env,
      NODE_OPTIONS: `--require ${peakPreload}`,
      BENCH_PEAK_FILE: peakFile,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
    maxBuffer: 64 * 1024 * 1024,
  });
  const elapsed = Number(process.hrtime.bigint() - t0) / 1e6;
  if (!t.okCodes.includes(out.status)) {
    if (!flags['keep-files']) rmSync(work, { recursive: true, force: true });
    console.error(
      `bench: ${t.label} exited with ${out.status ?? out.signal}:\n${out.stdout.toString().slice(-4000)}\n${out.stderr.toString().slice(0, 4000)}`,
    );
    process.exit(1);
  }
  const [rss, cpuMicros] = readFileSync(peakFile, 'utf8').split(' ').map(Number);
  t.ms.push(elapsed);
  t.peaks.push(rss / 1024);
  t.cpu.push(cpuMicros / 1000);
}

/**
 * Times the tasks `times` rounds, interleaved (one run of each per round, the order turning each
 * round), so a change in the machine's load falls on every side of a ratio alike. Prints and
 * returns each task's medians: wall ms, CPU ms, peak MiB, with the load when it began.
 */
function measureTogether(tasks, times = repeat) {
  for (let round = 0; round < times; round++) {
    for (let k = 0; k < tasks.length; k++) runOnce(tasks[(k + round) % tasks.length]);
  }
  return tasks.map((t) => {
    const result = {
      label: t.label,
      ms: median(t.ms),
      cpu: median(t.cpu),
      mib: median(t.peaks),
      load: t.load,
      all: t.ms,
    };
    console.log(
      `${t.label.padEnd(28)} ${result.ms.toFixed(0).padStart(7)} ms wall ${result.cpu.toFixed(0).padStart(7)} ms cpu ${result.mib.toFixed(0).padStart(6)} MiB peak  ` +
        `(load ${t.load.toFixed(1)}; runs: ${t.ms.map((x) => x.toFixed(0)).join(' ')})`,
    );
    return result;
  });
}

/** Floor and check (and optionally record) at one size, in a folder of its own. */
function sizeRun(r, m, parts, times = repeat) {
  const dir = join(work, `${r}x${m}`);
  const t0 = Date.now();
  const bytes = generate(dir, r, m);
  console.log(
    `# ${r} runs x ${m} metrics: history ${(bytes / 2 ** 20).toFixed(1)} MiB of values (generated in ${((Date.now() - t0) / 1000).toFixed(1)} s)`,
  );
  const tasks = {};
  if (parts.has('floor')) tasks.floor = task(`floor ${r}x${m}`, ['-e', floorScript, join(dir, 'floor.json')]);
  if (parts.has('check')) {
    tasks.check = task(
      `check ${r}x${m}`,
      [
        cli,
        'check',
        '--metrics',
        'run.json',
        '--history',
        'history.json',
        '--config',
        'bellgate.yml',
        '--series',
        'bench',
      ],
      { cwd: dir, okCodes: [0, 1] },
    );
  }
  if (parts.has('record')) {
    tasks.record = task(
      `record ${r}x${m}`,
      [
        cli,
        'record',
        '--metrics',
        'run.json',
        '--history',
        'h.json',
        '--config',
        'bellgate.yml',
        '--series',
        'bench',
        '--id',
        'bench-new',
      ],
      { cwd: dir, before: () => copyFileSync(join(dir, 'history.json'), join(dir, 'h.json')) },
    );
  }
  const names = Object.keys(tasks);
  const results = measureTogether(
    names.map((k) => tasks[k]),
    times,
  );
  const out = Object.fromEntries(names.map((k, i) => [k, results[i]]));
  rmSync(dir, { recursive: true, force: true });
  return out;
}

/** The action bundle on a pull_request event: 100 runs x 50 metrics, store file, no network. */
function actionRun() {
  const dir = join(work, 'action');
  generate(dir, 100, 50);
  const event = join(dir, 'event.json');
  writeFileSync(
    event,
    JSON.stringify({
      pull_request: {
        number: 7,
        labels: [],
        head: { repo: { full_name: 'render/farm' } },
        base: { repo: { full_name: 'render/farm' } },
      },
      repository: { id: 1, default_branch: 'main', full_name: 'render/farm' },
    }),
  );
  const env = {
    GITHUB_ACTIONS: 'true',
    GITHUB_REPOSITORY: 'render/farm',
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: event,
    GITHUB_RUN_ID: '4242',
    GITHUB_RUN_ATTEMPT: '1',
    GITHUB_REF: 'refs/pull/7/merge',
    GITHUB_SHA: 'a'.repeat(40),
    GITHUB_WORKFLOW: 'bench',
    GITHUB_JOB: 'scenes',
    GITHUB_WORKSPACE: dir,
    RUNNER_TEMP: dir,
    GITHUB_OUTPUT: join(dir, 'output.txt'),
    GITHUB_STEP_SUMMARY: join(dir, 'summary.md'),
    GITHUB_API_URL: 'http://127.0.0.1:9',
    GITHUB_SERVER_URL: 'http://127.0.0.1:9',
    INPUT_METRICS: 'run.json',
    INPUT_CONFIG: 'bellgate.yml',
    INPUT_SERIES: 'bench',
    INPUT_STORE: 'file',
    INPUT_HISTORY: 'history.json',
    INPUT_RECORD: 'auto',
    INPUT_BLOCK: 'false',
    INPUT_COMMENT: 'never',
    INPUT_TOKEN: '',
    'INPUT_HISTORY-FAILURE': 'fail',
  };

  // The runner creates the output and summary files; @actions/core refuses missing ones.
  const before = () => {
    writeFileSync(env.GITHUB_OUTPUT, '');
    writeFileSync(env.GITHUB_STEP_SUMMARY, '');
  };
  const [bare, version, pr] = measureTogether([
    task('bare node (node -e 0)', ['-e', '0']),
    task('cli start-up (--version)', [cli, '--version']),
    task('action PR check 100x50', [action], { cwd: dir, env, before }),
  ]);
  const output = readFileSync(join(dir, 'output.txt'), 'utf8');
  if (!/verdict/.test(output)) {
    if (!flags['keep-files']) rmSync(work, { recursive: true, force: true });
    console.error(`bench: the action wrote no verdict output:\n${output}`);
    process.exit(1);
  }
  return { bare, version, pr };
}

console.log(
  `bellgate bench: node ${process.version}, ${cpus().length} x ${cpus()[0]?.model ?? '?'}, ${(totalmem() / 2 ** 30).toFixed(1)} GiB, ` +
    `${new Date().toISOString()}; median of ${repeat}; dist ${dist}`,
);
const lines = [];
let ratio;
/** "wall X.XX (cpu Y.YY)": the wall-time ratio is the target; the CPU ratio is steadier on a busy machine. */
const ratios = (a, b) => `${(a.ms / b.ms).toFixed(2)} (cpu time ${(a.cpu / b.cpu).toFixed(2)})`;
/** "; target <= T: met" (or "NOT met"), judged on the wall-time or memory ratio. */
const target = (value, limit) => `; target <= ${limit}: ${value <= limit ? 'met' : 'NOT met'}`;
const main = sizeRun(runs, metrics, only);
if (main.floor && main.check) {
  ratio = main.check.ms / main.floor.ms;
  lines.push(`check/floor time: ${ratios(main.check, main.floor)}${target(ratio, 1.5)}`);
  lines.push(
    `check/floor peak memory: ${(main.check.mib / main.floor.mib).toFixed(2)}${target(main.check.mib / main.floor.mib, 2)}`,
  );
}
if (main.floor && main.record) {
  lines.push(`record/floor time: ${ratios(main.record, main.floor)}${target(main.record.ms / main.floor.ms, 2)}`);
  lines.push(
    `record/floor peak memory: ${(main.record.mib / main.floor.mib).toFixed(2)}${target(main.record.mib / main.floor.mib, 2)}`,
  );
}
if (only.has('action')) {
  const { bare, version, pr } = actionRun();
  lines.push(`cli start-up/bare node: ${ratios(version, bare)}`);
  lines.push(`action PR check/bare node: ${ratios(pr, bare)}${target(pr.ms / bare.ms, 3)}`);
}
if (flags.growth) {
  const table = [
    '| size (runs x metrics) | floor ms | check ms | check/floor | check cpu ms | floor cpu ms | load |',
    '| --- | --- | --- | --- | --- | --- | --- |',
  ];
  const sizes = [
    [250, 1000],
    [500, 1000],
    [1000, 1000],
    [1000, 250],
    [1000, 500],
  ];
  for (const [r, m] of sizes) {
    const { floor, check } = sizeRun(r, m, new Set(['floor', 'check']));
    table.push(
      `| ${r} x ${m} | ${floor.ms.toFixed(0)} | ${check.ms.toFixed(0)} | ${(check.ms / floor.ms).toFixed(2)} | ${check.cpu.toFixed(0)} | ${floor.cpu.toFixed(0)} | ${check.load.toFixed(1)} |`,
    );
  }
  console.log(table.join('\n'));
}
if (!flags['keep-files']) rmSync(work, { recursive: true, force: true });
else console.log(`files kept in ${work}`);
for (const line of lines) console.log(line);
if (ratio !== undefined) console.log(`check/floor ratio: ${ratio.toFixed(2)}`);
