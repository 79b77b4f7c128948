import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bellgate, steadyFixture } from './helpers/cli-harness.js';

// Exit codes are README's ("Exit codes"): 0 pass/learning/accepted, 1 regressed, 2 bad input or usage,
// 3 store unreachable. Every failure must be one readable message, never a stack trace.
const { work, history, slow, config } = steadyFixture();
afterAll(() => work.remove());

describe('explain and report', () => {
  it('explain draws one metric of the newest run against the runs before it', async () => {
    const r = await bellgate(work.dir, ['explain', 'api/latency', '--history', history, '--config', config]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('api/latency');
    expect(r.stdout).toContain('▲'); // this run's mark in the picture
  });

  it('explain with --metrics judges that run', async () => {
    const r = await bellgate(work.dir, [
      'explain',
      'api/latency',
      '--history',
      history,
      '--metrics',
      slow,
      '--config',
      config,
    ]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('regressed');
  });

  it('explain of an unknown metric: exit 2 with a did-you-mean', async () => {
    const r = await bellgate(work.dir, ['explain', 'api/latensy', '--history', history]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('"api/latency"');
  });

  it('report --html writes one self-contained page', async () => {
    const r = await bellgate(work.dir, [
      'report',
      '--history',
      history,
      '--metrics',
      slow,
      '--html',
      'pages/report.html',
      '--config',
      config,
    ]);
    expect(r.code).toBe(0);
    const html = readFileSync(join(work.dir, 'pages/report.html'), 'utf8');
    expect(html).toContain('<svg');
    expect(html).toContain('api/latency');
    expect(html).not.toMatch(/<script[^>]+src=/); // nothing fetched from elsewhere
  });

  it('report on an empty history without --metrics: exit 2 saying what to pass', async () => {
    const r = await bellgate(work.dir, ['report', '--history', join(work.dir, 'none.json'), '--html', 'x.html']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--metrics');
  });
});
