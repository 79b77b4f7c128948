import { afterAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { bellgate, handHistory, scratch } from './helpers/cli-harness.js';

// A tiny history written by hand, and the numbers the gate must report for a run at 15, worked out
// by hand with a calculator (nothing here comes from Bellgate's own code). On its own scale
// (`transform: none`) the metric is judged alone (one metric: no shared move, no moderation):
//   baseline x = 10, 12, 11, 13, 9, 11, 10, 12        m = 8
//   centre = the median = 11 (sorted: 9 10 10 11 11 12 12 13)
//   squared deviations from it 1, 1, 0, 4, 4, 0, 1, 1  sum = 12, on m - 1 = 7 degrees of freedom
//   sd = sqrt(12 / 7) = 1.3093073414
//   z = (15 - 11) / sqrt(12 / 7) = 3.0550504633
//   change = (15 - 11) / 11 = 0.3636363636
// The relative density comes from the predictive Student-t with the fitted tail; with `family:
// none` the status is regressed exactly when it is below the cutoff 0.01.
const baseline = [10, 12, 11, 13, 9, 11, 10, 12];
const work = scratch();
afterAll(() => work.remove());

const history = work.write('history.json', handHistory('default', { 'api/latency': baseline }, 'ms'));
const run = work.write('run.json', JSON.stringify({ metrics: [{ name: 'api/latency', value: 15, unit: 'ms' }] }));
// change-points off: 8 values are too few for segmentation to mean anything, and the hand
// calculation above uses all of them.
const plain = work.write('plain.yml', 'family: none\ndefaults:\n  change-points: false\n  transform: none\n');
const onLog = work.write('log.yml', 'family: none\ndefaults:\n  change-points: false\n');

interface JsonMetric {
  name: string;
  status: string;
  value: number;
  baseline: { n: number; mean: number; sd: number };
  z: number;
  change: number;
  density: number;
  relativeDensity: number;
  cutoff: number;
}

async function check(config: string): Promise<{ code: number; verdict: string; metric: JsonMetric; stderr: string }> {
  const r = await bellgate(work.dir, [
    'check',
    '--metrics',
    run,
    '--history',
    history,
    '--config',
    config,
    '--format',
    'json',
  ]);
  const parsed = JSON.parse(r.stdout) as { verdict: string; metrics: JsonMetric[] };
  const metric = parsed.metrics.find((m) => m.name === 'api/latency');
  if (metric === undefined) throw new Error('api/latency missing from the report');
  return { code: r.code, verdict: parsed.verdict, metric, stderr: r.stderr };
}

describe('bellgate check --format json on a hand-made history', () => {
  it('reports the centre, sd, z and change computed by hand', async () => {
    const { metric } = await check(plain);
    expect(metric.baseline.n).toBe(8);
    expectClose(metric.baseline.mean, 11, 1e-12); // the median, by hand (above)
    expectClose(metric.baseline.sd, 1.3093073414, 1e-9); // sqrt(12 / 7), by hand
    expectClose(metric.z, 3.0550504633, 1e-9); // 4 / sqrt(12 / 7), by hand
    expectClose(metric.change, 4 / 11, 1e-12); // by hand
    expect(metric.cutoff).toBe(0.01); // the documented default cutoff
    expect(metric.relativeDensity).toBeGreaterThan(0);
    // eight runs: the predictive t is wider than the Gaussian with these figures plugged in
    expect(metric.relativeDensity).toBeGreaterThan(Math.exp(-0.5 * metric.z * metric.z));
  });

  it('family none: regressed exactly when the relative density is below the cutoff, and the exit code says so', async () => {
    for (const config of [plain, onLog]) {
      const { code, verdict, metric, stderr } = await check(config);
      const regressed = metric.relativeDensity < 0.01;
      expect(metric.status).toBe(regressed ? 'regressed' : 'ok');
      expect(verdict).toBe(regressed ? 'regressed' : 'pass');
      expect(code).toBe(regressed ? 1 : 0);
      expect(stderr).toBe('');
    }
  });

  it('a timing (unit ms) is judged on the log scale by default: the centre is ln 11', async () => {
    const { metric } = await check(onLog);
    expectClose(metric.baseline.mean, Math.log(11), 1e-12); // the median of the logs, by hand
  });
});
