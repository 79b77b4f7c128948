#!/usr/bin/env node
/**
 * Records the real-noise corpus (issue 13 item 8): runs test/noise/workload.mjs as separate
 * processes under one load regime and appends one compact JSON line per run to
 * test/fixtures/noise/<regime>.jsonl (format: test/fixtures/noise/README.md).
 *
 *   node test/noise/record.mjs --regime idle|quiet|loaded|blocks [--history 60] [--clean 100] [--slowed 60]
 *                              [--samples 5] [--seed N] [--out DIR]
 *
 * The plan of a regime is fixed by its seed: first the history runs, then the clean runs and the
 * slowed runs (a third each at +5%, +10%, +20% extra work in one seeded random benchmark)
 * interleaved in a seeded random order. A file that already holds runs is continued where it
 * stopped, so an interrupted recording resumes. Load regimes:
 *   quiet   no load of ours (other processes on the machine still run: see loadavg per run);
 *   loaded  one burn.mjs process keeps one of the two cores busy for the whole regime;
 *   blocks  the same load comes and goes in blocks of 4-12 runs (seeded), starting without it.
 */
import { spawn, spawnSync } from 'node:child_process';
import { appendFileSync, existsSync, mkdirSync, readFileSync } from 'node:fs';
import os from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { seededUniform, shuffled } from './seeded.mjs';

const HERE = dirname(fileURLToPath(import.meta.url));
const ROOT = join(HERE, '..', '..');
const REGIMES = {
  quiet: 'no load of ours; other processes on the shared machine still run (see loadavg)',
  idle: 'no load of ours, recorded while no other development session was running on the machine',
  loaded:
    'one busy process (test/noise/burn.mjs: sorting, hashing, string building) on one of the two cores for every run',
  blocks: "the loaded regime's busy process, on for blocks of 4-12 runs and off for blocks of 4-12 runs (seeded)",
};
const FACTORS = [1.05, 1.1, 1.2];
const RUN_TIMEOUT_MS = 180_000;

function parseArgs(argv) {
  const o = {
    history: 60,
    clean: 100,
    slowed: 60,
    samples: 5,
    seed: undefined,
    out: join(ROOT, 'test/fixtures/noise'),
  };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i].replace(/^--/, '');
    const value = argv[++i];
    if (value === undefined) throw new Error(`--${key} needs a value`);
    if (key === 'regime' || key === 'out') o[key] = value;
    else if (['history', 'clean', 'slowed', 'samples', 'seed'].includes(key)) o[key] = Number(value);
    else throw new Error(`unknown argument --${key}`);
  }
  if (!(o.regime in REGIMES)) throw new Error(`--regime must be one of ${Object.keys(REGIMES).join(', ')}`);
  o.seed ??= [...o.regime].reduce((h, c) => (h * 31 + c.charCodeAt(0)) >>> 0, 1313);
  return o;
}

function workload(args) {
  for (let attempt = 1; ; attempt++) {
    const started = performance.now();
    const out = spawnSync(process.execPath, [join(HERE, 'workload.mjs'), ...args], {
      encoding: 'utf8',
      timeout: RUN_TIMEOUT_MS,
      maxBuffer: 16 << 20,
    });
    if (out.status === 0) return { result: JSON.parse(out.stdout), seconds: (performance.now() - started) / 1000 };
    const why = out.error ? String(out.error) : `exit ${out.status} ${out.signal ?? ''}: ${out.stderr.slice(-500)}`;
    if (attempt >= 3) throw new Error(`workload failed 3 times: ${why}`);
    console.error(`workload attempt ${attempt} failed (${why}); again`);
  }
}

/** The regime's runs in order: kind, and for slowed runs the benchmark and factor. */
function plan(o, names) {
  const uniform = seededUniform(o.seed);
  const slowed = Array.from({ length: o.slowed }, (_, i) => ({
    kind: 'slowed',
    metric: names[Math.floor(uniform() * names.length)],
    factor: FACTORS[i % FACTORS.length],
  }));
  const clean = Array.from({ length: o.clean }, () => ({ kind: 'clean' }));
  const history = Array.from({ length: o.history }, () => ({ kind: 'history' }));
  const runs = [...history, ...shuffled([...clean, ...slowed], uniform)];
  // blocks: the load's on/off state per run, in blocks of 4-12 runs, starting off
  let on = false;
  let left = 0;
  for (const run of runs) {
    if (o.regime === 'blocks') {
      if (left === 0) {
        if (run !== runs[0]) on = !on;
        left = 4 + Math.floor(uniform() * 9);
      }
      left--;
      run.load = on ? 1 : 0;
    } else run.load = o.regime === 'loaded' ? 1 : 0;
  }
  return runs;
}

function running() {
  const fields = readFileSync('/proc/loadavg', 'utf8').split(' ');
  return Number(fields[3].split('/')[0]);
}

const r2 = (x) => Math.round(x * 100) / 100;

function main() {
  const o = parseArgs(process.argv.slice(2));
  mkdirSync(o.out, { recursive: true });
  const file = join(o.out, `${o.regime}.jsonl`);
  const names = spawnSync(process.execPath, [join(HERE, 'workload.mjs'), '--list'], { encoding: 'utf8' })
    .stdout.trim()
    .split('\n');
  const runs = plan(o, names);
  let done = 0;
  if (existsSync(file)) {
    const lines = readFileSync(file, 'utf8').trim().split('\n');
    const header = JSON.parse(lines[0]);
    if (header.timings.join() !== names.join()) throw new Error(`${file} was recorded with other benchmarks`);
    done = lines.length - 1;
  }
  let sizes;
  let burner;
  const stopLoad = () => {
    if (burner !== undefined) burner.kill('SIGTERM');
    burner = undefined;
  };
  process.on('exit', stopLoad);
  process.on('SIGINT', () => process.exit(130));
  process.on('SIGTERM', () => process.exit(143));
  for (let i = done; i < runs.length; i++) {
    const run = runs[i];
    if (run.load === 1 && (burner === undefined || burner.exitCode !== null)) {
      // the load ends by itself after an hour (bounded even if this recorder is killed); restarted when it did
      burner = spawn(process.execPath, [join(HERE, 'burn.mjs'), '--seconds', '3600'], { stdio: 'ignore' });
      // give the load a moment to be running before the measured process starts
      spawnSync('sleep', ['1']);
    } else if (run.load === 0) stopLoad();
    const loadavg = os.loadavg().map(r2);
    const runningNow = running();
    const args = ['--samples', String(o.samples)];
    if (run.kind === 'slowed') args.push('--slow', `${run.metric}=${run.factor}`);
    const time = new Date().toISOString();
    const { result, seconds } = workload(args);
    if (i === 0) {
      sizes = Object.entries(result.sizes).map(([name, s]) => ({ name, unit: s.unit }));
      const header = {
        schema: 'bellgate.noise-corpus/1',
        regime: o.regime,
        load: REGIMES[o.regime],
        started: time,
        machine: {
          cpu: os.cpus()[0]?.model,
          cores: os.cpus().length,
          memoryGiB: Math.round(os.totalmem() / 2 ** 30),
          os: `${os.type()} ${os.release()}`,
          node: process.version,
        },
        workload: { samples: o.samples, warmup: 1, unit: 'ms' },
        plan: { seed: o.seed, history: o.history, clean: o.clean, slowed: o.slowed, factors: FACTORS },
        timings: names,
        sizes,
      };
      appendFileSync(file, `${JSON.stringify(header)}\n`);
    }
    sizes ??= JSON.parse(readFileSync(file, 'utf8').split('\n', 1)[0]).sizes;
    const line = {
      seq: i + 1,
      kind: run.kind,
      ...(run.kind === 'slowed' ? { metric: run.metric, factor: run.factor } : {}),
      load: run.load,
      time,
      loadavg,
      running: runningNow,
      seconds: r2(seconds),
      wall: names.map((n) => result.timings[n].wall.map(r2)),
      cpu: names.map((n) => result.timings[n].cpu.map(r2)),
      sizes: sizes.map((s) => result.sizes[s.name].value),
    };
    appendFileSync(file, `${JSON.stringify(line)}\n`);
    console.log(
      `${o.regime} ${i + 1}/${runs.length} ${run.kind}${run.metric ? ` ${run.metric} x${run.factor}` : ''} load ${run.load} loadavg ${loadavg[0]} ${r2(seconds)} s`,
    );
  }
  stopLoad();
}

main();
