import { afterAll, describe, expect, it } from 'vitest';
import { seededNormal } from '../model/random.js';
import { bellgate, scratch } from './helpers/cli-harness.js';

// Issue 13 item 4: `check` knows this machine's runner fingerprint (the ImageOS part of it here)
// and judges timings against baseline runs of the same runner when there are min-runs of them.
describe('bellgate check and the runner fingerprint', () => {
  const work = scratch();
  afterAll(() => work.remove());
  const normal = seededNormal(7);
  const metricsFile = (k: number): string =>
    work.write(
      `run-${k}.json`,
      JSON.stringify({
        metrics: ['a', 'b', 'c', 'd'].map((n, j) => ({
          name: `time/${n}`,
          value: (10 + j) * Math.exp(0.01 * normal()),
          unit: 'ms',
        })),
      }),
    );
  const history = `${work.dir}/history.jsonl`;
  const image = (os: string) => ({ ImageOS: os, ImageVersion: '20261110.1' });

  it('against runs of another image the report says the runner differs; of the same image it does not', async () => {
    for (let k = 0; k < 12; k++) {
      const r = await bellgate(
        work.dir,
        ['record', '--metrics', metricsFile(k), '--history', history, '--id', `r${k}`],
        {
          env: image('ubuntu22'),
        },
      );
      expect(r.code).toBe(0);
    }
    const check = async (os: string) =>
      JSON.parse(
        (
          await bellgate(work.dir, ['check', '--metrics', metricsFile(99), '--history', history, '--format', 'json'], {
            env: image(os),
          })
        ).stdout,
      ) as { metrics: { baseline?: { runner?: string } }[] };
    expect((await check('ubuntu24')).metrics.map((m) => m.baseline?.runner)).toEqual(Array(4).fill('other'));
    expect((await check('ubuntu22')).metrics.map((m) => m.baseline?.runner)).toEqual(Array(4).fill('same'));
  });
});
