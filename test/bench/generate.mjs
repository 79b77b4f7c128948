// Synthetic data for the benchmark: a history of trusted runs (version-2 document), the floor
// file (the same numbers as a plain JSON array of arrays), one new run's metric file, a config.
// Invented scenario: a render farm timing its scene builds ("scene-17/shade-3" in ms).
// Deterministic: the same sizes and seed give the same bytes.
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
 * Writes history.json, floor.json, run.json and bellgate.yml into `dir` for `runs` x `metrics`.
 * Each metric has its own level (1 to 10,000) and a 2% spread; about 1 value in 200 is missing
 * (null), as when a benchmark was skipped. Values keep 5 significant digits, as real timings do.
 * @returns the byte size of the history document.
 */
export function generate(dir, runs, metrics, seed = 7) {
  mkdirSync(dir, { recursive: true });
  const random = seededRandom(seed);
  const levels = Array.from({ length: metrics }, () => 10 ** (4 * random()));
  const history = openSync(join(dir, 'history.json'), 'w');
  const floor = openSync(join(dir, 'floor.json'), 'w');
  const ids = Array.from({ length: runs }, (_, r) => `${9000 + r}-1`);
  const start = Date.UTC(2026, 0, 1);
  const times = ids.map((_, r) => new Date(start + r * 3_600_000).toISOString());
  const names = Array.from({ length: metrics }, (_, m) => metricName(m));
  writeSync(
    history,
    `{"schema":"bellgate.history/2","series":"bench",\n` +
      `"runs":${JSON.stringify({ id: ids, event: ids.map(() => 'push'), time: times })},\n` +
      `"metrics":{"names":${JSON.stringify(names)},"values":[\n`,
  );
  writeSync(floor, '[\n');
  let bytes = 0;
  const row = new Array(runs);
  for (let m = 0; m < metrics; m++) {
    const level = levels[m];
    for (let r = 0; r < runs; r++) {
      row[r] = random() < 0.005 ? null : Number((level * (1 + 0.02 * gaussian(random))).toPrecision(5));
    }
    const line = JSON.stringify(row) + (m + 1 < metrics ? ',\n' : '');
    writeSync(history, line);
    writeSync(floor, line);
    bytes += line.length;
  }
  writeSync(history, ']}}\n');
  writeSync(floor, ']\n');
  closeSync(history);
  closeSync(floor);
  // The new run: the same distributions, so nothing should move (a quiet pull request).
  const run = Object.create(null);
  for (let m = 0; m < metrics; m++)
    run[metricName(m)] = Number((levels[m] * (1 + 0.02 * gaussian(random))).toPrecision(5));
  writeFileSync(join(dir, 'run.json'), JSON.stringify(run));
  // keep above the run count, so `record` appends instead of trimming; everything else default.
  writeFileSync(join(dir, 'bellgate.yml'), `keep: ${Math.max(runs + 10, 500)}\n`);
  return bytes;
}
