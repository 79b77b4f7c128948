#!/usr/bin/env node
/**
 * The noise workload (issue 13 item 8): the benchmarks of an invented tide-gauge data service,
 * "tide", run once per process. Each benchmark does a fixed amount of real library or built-in
 * work (about 10-60 ms), first untimed (warm-up), then timed SAMPLES times by wall clock
 * (performance.now) and by process CPU time (process.cpuUsage, user + system). Three compiled C
 * kernels (kernels.cpp, built with g++ on first use) run as child processes and time themselves
 * the same two ways. A few sizes are reported beside the timings: byte counts of deterministic
 * outputs, and the process's peak resident memory in MiB (which varies).
 *
 *   node test/noise/workload.mjs [--samples 5] [--warmup 1] [--slow NAME=FACTOR] [--only NAME,...] [--list]
 *
 * --slow makes one benchmark do FACTOR times its work (1.05 = 5% more repetitions): a real
 * slowdown. Output: one JSON line
 *   {"timings":{"tide/...":{"wall":[ms...],"cpu":[ms...]}},"sizes":{"tide/...":{"value":N,"unit":"B"}},"slow":{...}}
 */
import { spawnSync } from 'node:child_process';
import { createCipheriv, createHash } from 'node:crypto';
import { existsSync, mkdirSync, renameSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { deflateSync, inflateSync, brotliCompressSync } from 'node:zlib';
import { parse as parseCsv } from 'csv-parse/sync';
import { XMLParser } from 'fast-xml-parser';
import YAML from 'yaml';
import { seededUniform } from './seeded.mjs';

const HERE = dirname(fileURLToPath(import.meta.url));

// ---------------------------------------------------------------- the station log (seeded data)
const random = seededUniform(20260302);
const STATIONS = ['harbour-north', 'pier-7', 'estuary-gate', 'lighthouse-rock', 'old-quay', 'salt-marsh'];
const readings = Array.from({ length: 4000 }, (_, i) => ({
  station: STATIONS[i % STATIONS.length],
  at: new Date(Date.UTC(2026, 0, 1) + i * 360_000).toISOString(),
  level: Math.round((2 + 1.5 * Math.sin(i / 40) + random()) * 1000) / 1000,
  temperature: Math.round((9 + 4 * random()) * 100) / 100,
  flags: random() < 0.1 ? ['spike'] : [],
  note: random() < 0.05 ? `gauge ${Math.floor(random() * 90)} cleaned` : null,
}));
const logText = JSON.stringify(readings);
const logBuffer = Buffer.from(logText);
const deflated = deflateSync(logBuffer);
const packSlice = logBuffer.subarray(0, 128 * 1024);
const quarter = readings.slice(0, 1000);
const quarterText = JSON.stringify(quarter);
const yamlText = YAML.stringify(readings.slice(0, 25));
const csvText = [
  'station,at,level,temperature,flags',
  ...readings.slice(0, 600).map((r) => `${r.station},${r.at},${r.level},${r.temperature},${r.flags.join('|')}`),
].join('\n');
const xmlText = `<log>${readings
  .slice(0, 100)
  .map(
    (r) =>
      `<reading station="${r.station}" at="${r.at}"><level>${r.level}</level><temperature>${r.temperature}</temperature></reading>`,
  )
  .join('')}</log>`;
const megabyte = Buffer.alloc(1 << 20);
for (let i = 0; i < megabyte.length; i++) megabyte[i] = Math.floor(random() * 256);
const quarterMegabyte = megabyte.subarray(0, 256 * 1024);
const cloneSource = readings.slice(0, 1000);
const levels = readings.map((r) => r.level * 1000 + random());
const names = readings.map((r, i) => `${r.station}/${(i * 7919) % 4000}`);
const urls = readings
  .slice(0, 500)
  .map((r, i) => `https://tide.example/stations/${r.station}/readings?at=${encodeURIComponent(r.at)}&page=${i}#level`);
const key = Buffer.alloc(32, 7);
const iv = Buffer.alloc(16, 3);
let sink = 0;

/**
 * The benchmarks: `reps` units of work each (chosen so one sample takes 10-60 ms here); --slow
 * multiplies reps, so every unit is the same work and the slowdown is real.
 */
const BENCHMARKS = {
  'tide/pack-deflate': { reps: 20, unit: () => (sink += deflateSync(packSlice).length) },
  'tide/unpack-inflate': { reps: 40, unit: () => (sink += inflateSync(deflated).length) },
  'tide/seal-sha256': { reps: 40, unit: () => (sink += createHash('sha256').update(megabyte).digest()[0]) },
  'tide/cipher-aes': {
    reps: 40,
    unit: () => {
      const cipher = createCipheriv('aes-256-cbc', key, iv);
      sink += cipher.update(quarterMegabyte).length + cipher.final().length;
    },
  },
  'tide/json-parse': { reps: 60, unit: () => (sink += JSON.parse(quarterText).length) },
  'tide/json-stringify': { reps: 60, unit: () => (sink += JSON.stringify(quarter).length) },
  'tide/regex-scan': {
    reps: 40,
    unit: () => {
      for (const m of logText.matchAll(/"at":"(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})[^"]*","level":([\d.]+)/g))
        sink += m[6].length;
    },
  },
  'tide/sort-levels': { reps: 40, unit: () => (sink += [...levels].sort((a, b) => a - b)[0]) },
  'tide/sort-names': { reps: 20, unit: () => (sink += [...names].sort()[0].length) },
  'tide/map-churn': {
    reps: 20,
    unit: () => {
      const map = new Map();
      for (let i = 0; i < 6000; i++) map.set(`k${i}`, i);
      for (let i = 0; i < 6000; i += 2) map.delete(`k${i}`);
      for (let i = 0; i < 6000; i++) sink += map.get(`k${i}`) ?? 0;
    },
  },
  'tide/set-overlap': {
    reps: 120,
    unit: () => {
      const a = new Set(names.slice(0, 3000));
      let shared = 0;
      for (const n of names) if (a.has(n)) shared++;
      sink += shared;
    },
  },
  'tide/yaml-parse': { reps: 20, unit: () => (sink += YAML.parse(yamlText).length) },
  'tide/csv-parse': { reps: 20, unit: () => (sink += parseCsv(csvText, { columns: true }).length) },
  'tide/xml-parse': {
    reps: 20,
    unit: () => (sink += new XMLParser({ ignoreAttributes: false }).parse(xmlText).log.reading.length),
  },
  'tide/base64-roundtrip': {
    reps: 20,
    unit: () => (sink += Buffer.from(quarterMegabyte.toString('base64'), 'base64').length),
  },
  'tide/bigint-power': {
    reps: 40,
    unit: () => {
      let x = 1n;
      for (let i = 1n; i < 1500n; i++) x *= i;
      sink += Number(x % 1000003n);
    },
  },
  'tide/structured-clone': { reps: 20, unit: () => (sink += structuredClone(cloneSource).length) },
  'tide/url-parse': {
    reps: 40,
    unit: () => {
      for (const u of urls) sink += new URL(u).searchParams.get('page').length;
    },
  },
  'tide/string-build': {
    reps: 40,
    unit: () => {
      let s = '';
      for (const r of readings) s += `${r.station};${r.at};${r.level.toFixed(3)}\n`;
      sink += s.length;
    },
  },
};

/** The compiled kernels: name in kernels.cpp and units per sample. */
const KERNELS = {
  'tide/c-matmul': { kernel: 'matmul', reps: 80 },
  'tide/c-sieve': { kernel: 'sieve', reps: 60 },
  'tide/c-bodies': { kernel: 'bodies', reps: 140 },
};

export const TIMING_NAMES = [...Object.keys(BENCHMARKS), ...Object.keys(KERNELS)];

// ---------------------------------------------------------------- timing
function cpuMs() {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

function timeBenchmark(bench, factor, samples, warmup) {
  const reps = Math.round(bench.reps * factor);
  for (let w = 0; w < warmup; w++) for (let r = 0; r < reps; r++) bench.unit();
  const wall = [];
  const cpu = [];
  for (let s = 0; s < samples; s++) {
    const w0 = performance.now();
    const c0 = cpuMs();
    for (let r = 0; r < reps; r++) bench.unit();
    cpu.push(cpuMs() - c0);
    wall.push(performance.now() - w0);
  }
  return { wall, cpu };
}

/** Builds kernels.cpp once per source version into the temp folder (g++ -O2). */
function kernelBinary() {
  const source = join(HERE, 'kernels.cpp');
  const binary = join(tmpdir(), `bellgate-noise-kernels-${Math.floor(statSync(source).mtimeMs)}`);
  if (existsSync(binary)) return binary;
  mkdirSync(dirname(binary), { recursive: true });
  const partial = `${binary}.${process.pid}`;
  const built = spawnSync('g++', ['-O2', '-o', partial, source], { encoding: 'utf8', timeout: 120_000 });
  if (built.status !== 0) throw new Error(`g++ failed on ${source}: ${built.stderr || built.error}`);
  renameSync(partial, binary);
  return binary;
}

function timeKernel(spec, factor, samples, warmup) {
  const reps = Math.round(spec.reps * factor);
  const out = spawnSync(kernelBinary(), [spec.kernel, String(reps), String(samples), String(warmup)], {
    encoding: 'utf8',
    timeout: 60_000,
  });
  if (out.status !== 0) throw new Error(`kernel ${spec.kernel} failed: ${out.stderr || out.error}`);
  const { wall, cpu } = JSON.parse(out.stdout);
  return { wall, cpu };
}

// ---------------------------------------------------------------- main
function parseArgs(argv) {
  const options = { samples: 5, warmup: 1, slow: new Map(), only: undefined, list: false };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    const value = () => {
      if (i + 1 >= argv.length) throw new Error(`${arg} needs a value`);
      return argv[++i];
    };
    if (arg === '--samples') options.samples = Number(value());
    else if (arg === '--warmup') options.warmup = Number(value());
    else if (arg === '--slow') {
      const [name, factor] = value().split('=');
      if (!TIMING_NAMES.includes(name) || !(Number(factor) > 0))
        throw new Error(`--slow wants NAME=FACTOR with NAME one of: ${TIMING_NAMES.join(', ')}`);
      options.slow.set(name, Number(factor));
    } else if (arg === '--only') options.only = new Set(value().split(','));
    else if (arg === '--list') options.list = true;
    else throw new Error(`unknown argument ${arg}`);
  }
  if (!(options.samples >= 1) || !(options.warmup >= 0)) throw new Error('--samples >= 1 and --warmup >= 0');
  return options;
}

const round = (x) => Math.round(x * 1e4) / 1e4;

function main() {
  const options = parseArgs(process.argv.slice(2));
  if (options.list) {
    console.log(TIMING_NAMES.join('\n'));
    return;
  }
  const timings = {};
  const wanted = (name) => options.only === undefined || options.only.has(name);
  for (const [name, bench] of Object.entries(BENCHMARKS))
    if (wanted(name))
      timings[name] = timeBenchmark(bench, options.slow.get(name) ?? 1, options.samples, options.warmup);
  for (const [name, spec] of Object.entries(KERNELS))
    if (wanted(name)) timings[name] = timeKernel(spec, options.slow.get(name) ?? 1, options.samples, options.warmup);
  for (const t of Object.values(timings)) {
    t.wall = t.wall.map(round);
    t.cpu = t.cpu.map(round);
  }
  const sizes = {
    'tide/size-archive': { value: deflated.length, unit: 'B' },
    'tide/size-archive-brotli': { value: brotliCompressSync(logBuffer).length, unit: 'B' },
    'tide/size-yaml': { value: Buffer.byteLength(yamlText), unit: 'B' },
    'tide/peak-rss': { value: Math.round((process.resourceUsage().maxRSS / 1024) * 100) / 100, unit: 'MiB' },
  };
  process.stdout.write(
    `${JSON.stringify({ timings, sizes, slow: Object.fromEntries(options.slow), check: sink % 1000 })}\n`,
  );
}

main();
