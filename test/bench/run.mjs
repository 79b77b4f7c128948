// The benchmark (`npm run bench`): times whole processes on synthetic histories and prints the
// median wall time, CPU time and peak memory of each, then the targets of issue 14:
// - check at 10,000 runs <= 0.25 x the whole-history parse floor at that size (node reading and
//   JSON-parsing the same numbers as a plain array of arrays), and <= 1.3 x check at 100 runs;
// - record at 10,000 runs <= 1.3 x record at 100 runs;
// - the action's PR check, against a loopback stand-in of the GitHub API, under 0.3 s.
// `--only tune` instead measures `bellgate tune`'s written config on the simulated project and the
// recorded corpus (test/bench/tune.bench.ts, through vitest: it needs no bundle).
//
//   node test/bench/run.mjs [--runs 100,1000,10000] [--metrics 1000] [--repeat 5] [--dist dist]
//                           [--only floor,check,record,action] [--keep-files] [--profile DIR] [--trace]
//
// --dist names the folder the bundles were built into (node test/build-dist.mjs DIR).
// --profile DIR writes a CPU profile of every timed process into DIR (node --cpu-prof).
// --trace prints every output line of the timed processes, and every call the API stand-in gets,
// with the time it came (for finding where a process waits).
// Every timed process is a fresh `node`; the processes of one table are run interleaved (one run
// of each per round, the order turning each round), so a change in the machine's load falls on
// every side of a ratio alike. Each line carries the 1-minute load average at its start.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import {
  closeSync,
  copyFileSync,
  existsSync,
  fsyncSync,
  mkdtempSync,
  openSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { createServer } from 'node:http';
import { cpus, loadavg, tmpdir, totalmem } from 'node:os';
import { join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { strToU8, zipSync } from 'fflate';
import { generate } from './generate.mjs';

const root = resolve(new URL('../..', import.meta.url).pathname);
const { values: flags } = parseArgs({
  options: {
    runs: { type: 'string', default: '100,1000,10000' },
    metrics: { type: 'string', default: '1000' },
    repeat: { type: 'string', default: '5' },
    dist: { type: 'string', default: join(root, 'dist') },
    only: { type: 'string', default: 'floor,check,record,action' },
    'keep-files': { type: 'boolean', default: false },
    profile: { type: 'string' },
    trace: { type: 'boolean', default: false },
  },
});

function positive(name, text) {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1) {
    console.error(`bench: --${name} must be positive whole numbers, got "${flags[name]}"`);
    process.exit(2);
  }
  return n;
}
const sizes = flags.runs.split(',').map((r) => positive('runs', r));
const metrics = positive('metrics', flags.metrics);
const repeat = positive('repeat', flags.repeat);
const only = new Set(flags.only.split(','));
if (only.has('tune')) {
  const vitest = join(root, 'node_modules', 'vitest', 'vitest.mjs');
  const code = await new Promise((done) =>
    spawn(process.execPath, [vitest, 'run', '--config', join(root, 'test', 'bench', 'tune.vitest.config.ts')], {
      cwd: root,
      stdio: 'inherit',
    }).on('close', done),
  );
  if (code !== 0) process.exit(1);
  only.delete('tune');
  if (only.size === 0) process.exit(0);
}
const dist = resolve(flags.dist);
const cli = join(dist, 'cli', 'index.js');
const action = join(dist, 'index.js');
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

function fail(message) {
  if (!flags['keep-files']) rmSync(work, { recursive: true, force: true });
  console.error(`bench: ${message}`);
  process.exit(1);
}

/**
 * A process to time: `node ...args` in `cwd`, after `before()` (untimed) each time; an exit code
 * outside `okCodes` fails the bench loudly with the process's output.
 */
function task(label, args, { env = {}, cwd = work, before = () => {}, okCodes = [0] } = {}) {
  return { label, args, env, cwd, before, okCodes, ms: [], cpu: [], peaks: [], load: 0 };
}

/** Runs one task once (not blocking this process, whose stand-in server must answer) and keeps its times. */
async function runOnce(t) {
  const peakFile = join(work, 'peak.txt');
  t.before();
  rmSync(peakFile, { force: true });
  const profile = flags.profile ? ['--cpu-prof', '--cpu-prof-dir', resolve(flags.profile)] : [];
  const t0 = process.hrtime.bigint();
  if (flags.trace) console.log(`  ${t.label} started at ${performance.now().toFixed(0)} ms`);
  const { code, out } = await new Promise((done) => {
    const child = spawn(process.execPath, [...profile, ...t.args], {
      cwd: t.cwd,
      env: {
        PATH: process.env.PATH,
        HOME: process.env.HOME,
        ...t.env,
        NODE_OPTIONS: `--require ${peakPreload}`,
        BENCH_PEAK_FILE: peakFile,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let text = '';
    const keep = (d) => {
      if (flags.trace)
        for (const l of d.toString().split('\n'))
          if (l) console.log(`  +${(Number(process.hrtime.bigint() - t0) / 1e6).toFixed(0)} ms ${l.slice(0, 120)}`);
      text = (text + d.toString()).slice(-8000);
    };
    child.stdout.on('data', keep);
    child.stderr.on('data', keep);
    child.on('close', (c) => done({ code: c, out: text }));
  });
  const elapsed = Number(process.hrtime.bigint() - t0) / 1e6;
  if (!t.okCodes.includes(code)) fail(`${t.label} exited with ${code}:\n${out}`);
  const [kib, cpuMicros] = readFileSync(peakFile, 'utf8').split(' ').map(Number);
  t.ms.push(elapsed);
  t.peaks.push(kib / 1024);
  t.cpu.push(cpuMicros / 1000);
}

/** Times the tasks `times` rounds, interleaved, and returns each task's medians. */
async function measureTogether(tasks, times = repeat) {
  for (const t of tasks) t.load = loadavg()[0];
  for (let round = 0; round < times; round++) {
    for (let k = 0; k < tasks.length; k++) await runOnce(tasks[(k + round) % tasks.length]);
  }
  return tasks.map((t) => {
    const result = { label: t.label, ms: median(t.ms), cpu: median(t.cpu), mib: median(t.peaks), load: t.load };
    console.log(
      `${t.label.padEnd(26)} ${result.ms.toFixed(0).padStart(7)} ms wall ${result.cpu.toFixed(0).padStart(7)} ms cpu ${result.mib.toFixed(0).padStart(6)} MiB peak  ` +
        `(load ${t.load.toFixed(1)}; runs: ${t.ms.map((x) => x.toFixed(0)).join(' ')})`,
    );
    return result;
  });
}

/**
 * A copy of the history for one record, on disk before the record starts: otherwise the record's
 * fsync would wait for the whole fresh copy to be written, which no real record does.
 */
function freshCopy(from, to) {
  copyFileSync(from, to);
  const fd = openSync(to, 'r+');
  fsyncSync(fd);
  closeSync(fd);
}

/** The floor, check and record tasks of one history size. */
function sizeTasks(runs) {
  const dir = join(work, `${runs}x${metrics}`);
  const t0 = Date.now();
  const bytes = generate(dir, runs, metrics);
  console.log(
    `# ${runs} runs x ${metrics} metrics: history.jsonl ${(bytes / 2 ** 20).toFixed(1)} MiB (generated in ${((Date.now() - t0) / 1000).toFixed(1)} s)`,
  );
  const tasks = {};
  if (only.has('floor')) tasks.floor = task(`floor ${runs}`, ['-e', floorScript, join(dir, 'floor.json')]);
  if (only.has('check'))
    tasks.check = task(
      `check ${runs}`,
      [
        cli,
        'check',
        '--metrics',
        'run.json',
        '--history',
        'history.jsonl',
        '--config',
        'bellgate.yml',
        '--series',
        'bench',
      ],
      { cwd: dir, okCodes: [0, 1] },
    );
  if (only.has('record'))
    tasks.record = task(
      `record ${runs}`,
      [
        cli,
        'record',
        '--metrics',
        'run.json',
        '--history',
        'h.jsonl',
        '--config',
        'bellgate.yml',
        '--series',
        'bench',
        '--id',
        '99999-1',
      ],
      { cwd: dir, before: () => freshCopy(join(dir, 'history.jsonl'), join(dir, 'h.jsonl')) },
    );
  return { runs, bytes, tasks };
}

/**
 * A loopback stand-in of the GitHub REST API for the action's PR check: the artifact list, the
 * download's 302 to storage and the zip, the labels and comments of the pull request.
 */
async function apiStandin(zip, name) {
  const server = createServer((req, res) => {
    const url = new URL(req.url, 'http://127.0.0.1');
    if (flags.trace) console.log(`  api at ${performance.now().toFixed(0)} ms: ${req.method} ${url.pathname}`);
    const json = (status, body) => {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    req.resume();
    if (url.pathname === '/repos/render/farm/actions/artifacts')
      return json(200, {
        total_count: 1,
        artifacts: [
          {
            id: 1,
            name,
            size_in_bytes: zip.length,
            expired: false,
            created_at: '2026-01-05T00:00:00Z',
            workflow_run: { id: 77, repository_id: 1, head_repository_id: 1, head_branch: 'main' },
          },
        ],
      });
    if (url.pathname === '/repos/render/farm/actions/artifacts/1/zip') {
      res.writeHead(302, { location: `http://127.0.0.1:${server.address().port}/storage/1.zip` });
      return res.end();
    }
    if (url.pathname === '/storage/1.zip') {
      res.writeHead(200, { 'content-type': 'application/zip', 'content-length': String(zip.length) });
      return res.end(Buffer.from(zip));
    }
    if (/\/issues\/7\/(comments|labels)$/.test(url.pathname))
      return req.method === 'POST'
        ? json(201, { id: 5, body: '', user: { login: 'github-actions[bot]' } })
        : json(200, []);
    if (/\/issues\/comments\/\d+$/.test(url.pathname)) return json(200, { id: 5 });
    json(404, { message: 'Not Found' });
  });
  await new Promise((r) => server.listen(0, '127.0.0.1', r));
  return server;
}

/** The action bundle on a pull_request event: 100 runs x 50 metrics in an artifact, the PR comment. */
async function actionTask() {
  const dir = join(work, 'action');
  generate(dir, 100, 50);
  const name = `bellgate-history-bench-${createHash('sha256').update('bench').digest('hex').slice(0, 8)}`;
  const zip = zipSync({
    'history.jsonl': strToU8(readFileSync(join(dir, 'history.jsonl'), 'utf8')),
    'merged.json': strToU8('{"artifacts":[]}\n'),
  });
  const server = await apiStandin(zip, name);
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
  const api = `http://127.0.0.1:${server.address().port}`;
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
    GITHUB_API_URL: api,
    GITHUB_SERVER_URL: api,
    INPUT_METRICS: 'run.json',
    INPUT_CONFIG: 'bellgate.yml',
    INPUT_SERIES: 'bench',
    INPUT_STORE: 'artifact',
    INPUT_HISTORY: 'bellgate-history',
    INPUT_RECORD: 'auto',
    INPUT_BLOCK: 'false',
    INPUT_COMMENT: 'always',
    INPUT_TOKEN: 'ghs_bench',
    'INPUT_HISTORY-FAILURE': 'fail',
  };
  // The runner creates the output and summary files; @actions/core refuses missing ones.
  const before = () => {
    writeFileSync(env.GITHUB_OUTPUT, '');
    writeFileSync(env.GITHUB_STEP_SUMMARY, '');
  };
  return {
    server,
    output: env.GITHUB_OUTPUT,
    task: task('action PR check 100x50', [action], { cwd: dir, env, before }),
  };
}

console.log(
  `bellgate bench: node ${process.version}, ${cpus().length} x ${cpus()[0]?.model ?? '?'}, ${(totalmem() / 2 ** 30).toFixed(1)} GiB, ` +
    `${new Date().toISOString()}; median of ${repeat}; dist ${dist}`,
);
const bySize = sizes.map((runs) => sizeTasks(runs));
const all = bySize.flatMap((s) => Object.values(s.tasks));
if (all.length > 0) await measureTogether(all);
const result = (runs, kind) => {
  const t = bySize.find((s) => s.runs === runs)?.tasks[kind];
  return t && t.ms.length > 0 ? { ms: median(t.ms), cpu: median(t.cpu), mib: median(t.peaks) } : undefined;
};

let actionResult;
if (only.has('action')) {
  const { server, output, task: t } = await actionTask();
  [actionResult] = await measureTogether([t]);
  server.closeAllConnections();
  server.close();
  if (!/verdict/.test(readFileSync(output, 'utf8'))) fail('the action wrote no verdict output');
}

const lines = [];
const ratio = (a, b) => `${(a.ms / b.ms).toFixed(2)} (cpu time ${(a.cpu / b.cpu).toFixed(2)})`;
const target = (value, limit) => `; target <= ${limit}: ${value <= limit ? 'met' : 'NOT met'}`;
const [small, large] = [Math.min(...sizes), Math.max(...sizes)];
const f = result(large, 'floor');
const c = result(large, 'check');
const c0 = result(small, 'check');
const r = result(large, 'record');
const r0 = result(small, 'record');
if (f && c) lines.push(`check ${large}/floor ${large}: ${ratio(c, f)}${target(c.ms / f.ms, 0.25)}`);
if (c && c0 && large !== small)
  lines.push(`check ${large}/check ${small}: ${ratio(c, c0)}${target(c.ms / c0.ms, 1.3)}`);
if (r && r0 && large !== small)
  lines.push(`record ${large}/record ${small}: ${ratio(r, r0)}${target(r.ms / r0.ms, 1.3)}`);
if (actionResult)
  lines.push(
    `action PR check: ${actionResult.ms.toFixed(0)} ms${target(actionResult.ms / 1000, 0.3).replace('<= 0.3', '< 0.3 s')}`,
  );

// One table for test/bench/README.md.
const table = [
  `| runs x ${metrics} metrics | history | floor | check | record | check / floor | peak MiB (floor, check, record) |`,
  '| ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
];
for (const s of bySize) {
  const [fl, ch, re] = ['floor', 'check', 'record'].map((k) => result(s.runs, k));
  const ms = (x) => (x ? `${x.ms.toFixed(0)} ms` : '-');
  table.push(
    `| ${s.runs.toLocaleString('en')} | ${(s.bytes / 2 ** 20).toFixed(1)} MiB | ${ms(fl)} | ${ms(ch)} | ${ms(re)} | ${fl && ch ? (ch.ms / fl.ms).toFixed(2) : '-'} | ${[fl, ch, re].map((x) => (x ? x.mib.toFixed(0) : '-')).join(', ')} |`,
  );
}
console.log(`\n${table.join('\n')}\n`);
for (const line of lines) console.log(line);
if (!flags['keep-files']) rmSync(work, { recursive: true, force: true });
else console.log(`files kept in ${work} (${statSync(work).isDirectory() ? 'folder' : '?'})`);
