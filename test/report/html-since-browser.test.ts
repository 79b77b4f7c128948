// The release review's section of the HTML report, laid out by headless Chromium (Debian
// `chromium`): the browser's own parser and layout are the referee, and the generated history's
// truths (test/gate/since/generate.ts) the expected answer: a +8% step from the 20th run after
// the reference, a +0.4%/run creep, a flat metric, and a hostile metric name that also steps.
import { existsSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { reviewSince } from '../../src/gate/since/review-since.js';
import { cleanText } from '../../src/report/clean.js';
import { renderHtmlReport } from '../../src/report/html.js';
import { generateHistory, referenceId, type HistoryPlan } from '../gate/since/generate.js';
import { HOSTILE, makeFixture } from './fixture.js';

const CHROMIUM = '/usr/bin/chromium';
const present = existsSync(CHROMIUM);
if (!present) console.warn(`skipping the since section's browser checks: ${CHROMIUM} is absent`);

const STEP = { offset: 20, factor: 1.08 };
const plan: HistoryPlan = {
  before: 40,
  after: 40,
  seed: 11,
  metrics: {
    'latency/step': { steps: [STEP] },
    'latency/creep': { creep: 0.004 },
    'size/flat': { unit: 'B', level: 142311 },
    [HOSTILE.img]: { steps: [STEP] },
  },
};

describe.skipIf(!present)('the release review section in headless Chromium', () => {
  let browser: Browser;
  let page: Page;
  const problems: string[] = [];
  let dir = '';

  beforeAll(async () => {
    const history = generateHistory(plan);
    const since = reviewSince(history, { run: referenceId(plan) });
    const { report, history: checked } = makeFixture();
    const html = renderHtmlReport({ report, history: checked, since: { report: since, history } });
    dir = join(tmpdir(), `bellgate-since-report-${process.pid}`);
    mkdirSync(dir, { recursive: true });
    const file = join(dir, 'report.html');
    writeFileSync(file, html);
    const url = pathToFileURL(file).href;
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--no-first-run'],
    });
    page = await browser.newPage({ viewport: { width: 1100, height: 900 } });
    page.on('console', (msg) => {
      if (msg.type() === 'error') problems.push(msg.text());
    });
    page.on('pageerror', (err) => problems.push(String(err)));
    page.on('request', (req) => {
      if (req.url() !== url) problems.push(`request ${req.url()}`);
    });
    page.on('dialog', async (d) => {
      problems.push(`dialog ${d.message()}`);
      await d.dismiss();
    });
    await page.goto(url, { waitUntil: 'load' });
  });

  afterAll(async () => {
    await browser?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('draws a path for each changed metric and lists the quiet one, names as plain text', async () => {
    await page.waitForTimeout(100);
    expect(problems).toEqual([]);
    const names = await page.$$eval('#since .since-metric', (els) => els.map((e) => e.getAttribute('data-metric')));
    expect(new Set(names)).toEqual(new Set(['latency/step', 'latency/creep', cleanText(HOSTILE.img, 300)]));
    expect(await page.locator('#since svg.chart').count()).toBe(3);
    expect(await page.locator('#since').textContent()).toContain('size/flat');
    expect(await page.locator('#since img').count()).toBe(0);
  });

  it("places each step's line at the generated step (within 2 runs), and the level now above the level then", async () => {
    for (const name of ['latency/step', cleanText(HOSTILE.img, 300)]) {
      const laid = await page.$$eval(
        '#since .since-metric',
        (els, wanted) => {
          type Box = { left: number; right: number; top: number; bottom: number; width: number };
          interface El {
            getAttribute(n: string): string | null;
            getBoundingClientRect(): Box;
            querySelectorAll(s: string): El[];
            querySelector(s: string): El | null;
            textContent: string | null;
          }
          const el = (els as unknown as El[]).find((e) => e.getAttribute('data-metric') === wanted)!;
          const centre = (b: Box) => (b.left + b.right) / 2;
          return {
            steps: Array.from(el.querySelectorAll('line.since-step')).map((l) => centre(l.getBoundingClientRect())),
            runs: Array.from(el.querySelectorAll('circle.point')).map((c) => ({
              x: centre(c.getBoundingClientRect()),
              run: /^run (\S+)/.exec(c.querySelector('title')?.textContent ?? '')?.[1] ?? '',
            })),
            then: el.querySelector('line.since-then')!.getBoundingClientRect().top,
            now: el.querySelector('line.since-now')!.getBoundingClientRect().top,
          };
        },
        name,
      );
      expect(laid.steps).toHaveLength(1);
      const nearest = laid.runs.reduce((a, b) =>
        Math.abs(b.x - laid.steps[0]!) < Math.abs(a.x - laid.steps[0]!) ? b : a,
      );
      // run-N is the N-th run; the reference is run-40, so the step's first run is run-60.
      const offset = Number(nearest.run.replace('run-', '')) - plan.before;
      expect(Math.abs(offset - STEP.offset)).toBeLessThanOrEqual(2);
      // Screen y grows downwards: a higher level is drawn nearer the top.
      expect(laid.now).toBeLessThan(laid.then);
    }
  });
});
