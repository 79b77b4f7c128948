import { afterAll, describe, expect, it } from 'vitest';
import { expectClose } from '../helpers/close.js';
import { bellgate, handHistory, scratch } from './helpers/cli-harness.js';

// A tiny history written by hand, and the numbers the gate must report for a run at 15, worked out
// by hand with a calculator (every step below; nothing here comes from Bellgate's own code):
//   baseline x = 10, 12, 11, 13, 9, 11, 10, 12        m = 8, sum = 88
//   mean mu = 88 / 8 = 11
//   squared deviations 1, 1, 0, 4, 4, 0, 1, 1          sum = 12
//   maximum-likelihood sd = sqrt(12 / 8) = sqrt(1.5) = 1.2247448714
//   z = (15 - 11) / sqrt(1.5) = 3.2659863237
//   density p(15) = exp(-z^2 / 2) / (sqrt(2 pi) sd) = exp(-16/3) / (2.5066282746 * 1.2247448714)
//                 = 0.0048279500 / 3.0699801238 = 0.0015726323
//   plug-in relative density = exp(-z^2 / 2) = exp(-16/3) = 0.0048279500          (< 0.01: regressed)
//   predictive (Student-t, nu = m - 1 = 7, scale s sqrt(1 + 1/m), s^2 = 12/7):
//     t^2 = 16 / ((12/7)(9/8)) = 224/27 = 8.2962963
//     relative density = (1 + t^2/nu)^(-(nu+1)/2) = (59/27)^-4 = 531441 / 12117361 = 0.0438578169 (> 0.01: ok)
//   change = (15 - 11) / 11 = 0.3636363636
const baseline = [10, 12, 11, 13, 9, 11, 10, 12];
const work = scratch();
afterAll(() => work.remove());

const history = work.write('history.json', handHistory('default', { 'api/latency': baseline }, 'ms'));
const run = work.write('run.json', JSON.stringify({ metrics: [{ name: 'api/latency', value: 15, unit: 'ms' }] }));
// change-points off: 8 values are too few for segmentation to mean anything, and the hand
// calculation above uses all of them.
const predictive = work.write('predictive.yml', 'defaults:\n  change-points: false\n');
const plugIn = work.write('plug-in.yml', 'defaults:\n  change-points: false\n  uncertainty: plug-in\n');

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
  it('reports the mean, ML sd, z, density and change computed by hand', async () => {
    const { metric } = await check(predictive);
    expect(metric.baseline.n).toBe(8);
    expectClose(metric.baseline.mean, 11, 1e-12); // computed by hand (above)
    expectClose(metric.baseline.sd, 1.2247448714, 1e-9); // sqrt(1.5), computed by hand
    expectClose(metric.z, 3.2659863237, 1e-9); // 4 / sqrt(1.5), computed by hand
    expectClose(metric.density, 0.0015726323, 1e-7); // exp(-16/3) / (sqrt(2 pi) sqrt(1.5)), calculator
    expectClose(metric.change, 4 / 11, 1e-12); // computed by hand
    expect(metric.cutoff).toBe(0.01); // DESIGN default cutoff
  });

  it('predictive relative density is (59/27)^-4, above the cutoff: ok, exit 0', async () => {
    const { code, verdict, metric, stderr } = await check(predictive);
    expectClose(metric.relativeDensity, 531441 / 12117361, 1e-9); // Student-t ratio, computed by hand (above)
    expect(metric.status).toBe('ok');
    expect(verdict).toBe('pass');
    expect(code).toBe(0);
    expect(stderr).toBe('');
  });

  it('plug-in relative density is exp(-16/3), below the cutoff: regressed, exit 1', async () => {
    const { code, verdict, metric } = await check(plugIn);
    expectClose(metric.relativeDensity, Math.exp(-16 / 3), 1e-9); // exp(-z^2/2), computed by hand
    expectClose(metric.relativeDensity, 0.00482795, 1e-6); // the same, from a calculator
    expect(metric.status).toBe('regressed');
    expect(verdict).toBe('regressed');
    expect(code).toBe(1);
  });
});
