// Synthetic data for the benchmark: a history of trusted runs (the stored JSON Lines layout,
// bellgate.history/3), the floor file (the same numbers as a plain JSON array of arrays, one array
// per run), one new run's metric file, and a config. Invented scenario: a render farm timing its
// scene builds ("scene-17/shade-3" in ms). Deterministic: the same sizes and seed give the same bytes.
import { closeSync, mkdirSync, openSync, writeFileSync, writeSync } from 'node:fs';
import { join } from 'node:path';
// The demo's generator (mulberry32): seeded, so every bench run writes the same bytes.
import { mulberry32 as seededRandom } from '../../examples/demo/generate.mjs';

/** A standard normal draw (Box-Muller). */
function gaussian(random) {
  const u = 1 - random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
}

export function metricName(m) {
  return `scene-${Math.floor(m / 20)}/shade-${m % 20}`;
}

/**
 * Writes history.jsonl, floor.json, run.json and bellgate.yml into `dir` for `runs` x `metrics`.
 * Each metric has its own level (1 to 10,000) and a 2% spread; about 1 value in 200 is missing
 * (null), as when a benchmark was skipped. Values keep 5 significant digits, as real timings do.
 * @returns the byte size of the history document.
 */
export function generate(dir, runs, metrics, seed = 7) {
  mkdirSync(dir, { recursive: true });
  const random = seededRandom(seed);
  const levels = Array.from({ length: metrics }, () => 10 ** (4 * random()));
  const names = Array.from({ length: metrics }, (_, m) => metricName(m));
  const history = openSync(join(dir, 'history.jsonl'), 'w');
  const floor = openSync(join(dir, 'floor.json'), 'w');
  const start = Date.UTC(2026, 0, 1);
  let bytes = writeSync(
    history,
    `${JSON.stringify({ schema: 'bellgate.history/3', series: 'bench', metrics: names.map((name) => ({ name, unit: 'ms' })) })}\n`,
  );
  writeSync(floor, '[\n');
  const row = new Array(metrics);
  for (let r = 0; r < runs; r++) {
    for (let m = 0; m < metrics; m++) {
      row[m] = random() < 0.005 ? null : Number((levels[m] * (1 + 0.02 * gaussian(random))).toPrecision(5));
    }
    const values = JSON.stringify(row);
    const info = { id: `${9000 + r}-1`, time: new Date(start + r * 3_600_000).toISOString(), event: 'push' };
    bytes += writeSync(history, `${JSON.stringify(info).slice(0, -1)},"values":${values},"n":${r + 1}}\n`);
    writeSync(floor, values + (r + 1 < runs ? ',\n' : '\n'));
  }
  writeSync(floor, ']\n');
  closeSync(history);
  closeSync(floor);
  // The new run: the same distributions, so nothing should move (a quiet pull request).
  const run = Object.create(null);
  for (let m = 0; m < metrics; m++)
    run[metricName(m)] = Number((levels[m] * (1 + 0.02 * gaussian(random))).toPrecision(5));
  writeFileSync(join(dir, 'run.json'), JSON.stringify(run));
  // keep well above the run count, so `record` appends instead of trimming; everything else default.
  writeFileSync(join(dir, 'bellgate.yml'), `keep: ${Math.max(2 * runs, 4000)}\n`);
  return bytes;
}
