import { existsSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { cleanText } from '../../src/report/clean.js';
import { renderHtmlReport } from '../../src/report/html.js';
import { HOSTILE, makeFixture } from './fixture.js';

const CHROMIUM = '/usr/bin/chromium';
const present = existsSync(CHROMIUM);
if (!present) console.warn(`skipping the HTML browser checks: ${CHROMIUM} is absent (apt-get install -y chromium)`);

// .ci/run installs Chromium and sets BELLGATE_NEEDS_BROWSER: there a missing browser is a failure, not a skip.
it.runIf(process.env.BELLGATE_NEEDS_BROWSER === '1')('has the Chromium that CI installs', () => {
  expect(present, `${CHROMIUM} is missing: apt-get install -y chromium`).toBe(true);
});

describe.skipIf(!present)('HTML report in headless Chromium', () => {
  let browser: Browser;
  let page: Page;
  const consoleErrors: string[] = [];
  const requests: string[] = [];
  const dialogs: string[] = [];
  let url = '';
  let dir = '';

  beforeAll(async () => {
    const hostile = Object.values(HOSTILE).map((name, k) => ({
      name,
      unit: '<b>u</b>',
      centre: 10 + k,
      spread: 0.5,
      now: 10 + k,
      status: 'ok' as const,
    }));
    // Six-digit sizes give the widest tick labels ("142,306"), which the y axis name must clear.
    const wide = {
      name: 'size/web-bundle.js.gz',
      unit: 'B',
      centre: 142311,
      spread: 3,
      now: 142312,
      status: 'ok' as const,
    };
    const { report, history } = makeFixture([...hostile, wide]);
    const html = renderHtmlReport({ report, history, generatedAt: '2026-12-01T12:00:00Z' });
    dir = join(tmpdir(), `bellgate-report-${process.pid}`);
    mkdirSync(dir, { recursive: true });
    const file = join(dir, 'report.html');
    writeFileSync(file, html);
    url = pathToFileURL(file).href;
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--no-first-run',
        '--disable-sync',
      ],
    });
    page = await browser.newPage({ viewport: { width: 1100, height: 900 } });
    page.on('console', (msg) => {
      if (msg.type() === 'error') consoleErrors.push(msg.text());
    });
    page.on('pageerror', (err) => consoleErrors.push(String(err)));
    page.on('request', (req) => {
      if (req.url() !== url) requests.push(req.url());
    });
    page.on('dialog', async (d) => {
      dialogs.push(d.message());
      await d.dismiss();
    });
    await page.goto(url, { waitUntil: 'load' });
  });

  afterAll(async () => {
    await browser?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('loads with no console errors, no network requests and no script from metric names', async () => {
    // An alert would mean `<img onerror=...>` from a metric name ran.
    await page.waitForTimeout(200);
    expect(consoleErrors).toEqual([]);
    expect(requests).toEqual([]);
    expect(dialogs).toEqual([]);
    expect(await page.locator('img').count()).toBe(0);
  });

  it('shows hostile names as the same text once the browser has parsed them (the parser as referee)', async () => {
    const shown = await page.$$eval('#summary td.name', (tds) => tds.map((td) => td.textContent ?? ''));
    for (const name of Object.values(HOSTILE)) expect(shown).toContain(cleanText(name, 300));
    expect(await page.locator('script').count()).toBe(1);
  });

  it('draws every SVG with sized shapes', async () => {
    const sizes = await page.$$eval('svg.chart', (svgs) =>
      svgs.map((svg) => {
        const shapes = Array.from(svg.querySelectorAll('path, circle, rect')).map((el) =>
          (el as unknown as { getBBox(): { width: number; height: number } }).getBBox(),
        );
        const box = svg.getBoundingClientRect();
        return { w: box.width, h: box.height, shapes: shapes.filter((b) => b.width > 0 || b.height > 0).length };
      }),
    );
    expect(sizes.length).toBeGreaterThan(8);
    for (const s of sizes) {
      expect(s.w).toBeGreaterThan(100);
      expect(s.h).toBeGreaterThan(100);
      expect(s.shapes).toBeGreaterThan(0);
    }
  });

  it('keeps each axis name off its tick labels and the "this run" note off the cutoff lines', async () => {
    // Measured by the browser's own layout (getBoundingClientRect of each drawn element).
    const found = await page.$$eval('svg.chart', (charts) => {
      // The few DOM members used, typed here (the project's TypeScript has no DOM library).
      type Box = { left: number; right: number; top: number; bottom: number };
      interface El {
        getBoundingClientRect(): Box;
        querySelector(selector: string): El | null;
        querySelectorAll(selector: string): ArrayLike<El>;
        getAttribute(name: string): string | null;
        textContent: string | null;
      }
      const svgs = charts as unknown as El[];
      const box = (el: El): Box => el.getBoundingClientRect();
      const meets = (a: Box, b: Box) =>
        a.left <= b.right && b.left <= a.right && a.top <= b.bottom && b.top <= a.bottom;
      const clashes: string[] = [];
      let notes = 0;
      let axes = 0;
      for (const svg of svgs) {
        const title = svg.getAttribute('aria-label') ?? '';
        for (const axis of Array.from(svg.querySelectorAll('g.axis'))) {
          const name = axis.querySelector('.axis-label');
          if (!name) continue;
          axes += 1;
          for (const tick of Array.from(axis.querySelectorAll('text:not(.axis-label)')))
            if (meets(box(name), box(tick)))
              clashes.push(`${title}: axis name "${name.textContent}" on tick "${tick.textContent}"`);
        }
        for (const note of Array.from(svg.querySelectorAll('text.note'))) {
          notes += 1;
          for (const line of Array.from(svg.querySelectorAll('line.cutoff, line.now')))
            if (meets(box(note), box(line)))
              clashes.push(`${title}: "${note.textContent}" crossed by a ${line.getAttribute('class')} line`);
        }
      }
      return { clashes, notes, axes };
    });
    expect(found.axes).toBeGreaterThan(8);
    // build/time's run is 8.4 sd out (47.9 against 41.2 +- 0.8): drawn at the edge with its note.
    expect(found.notes).toBeGreaterThan(0);
    expect(found.clashes).toEqual([]);
  });

  it('re-sorts the summary table when a header is clicked', async () => {
    const names = (): Promise<string[]> =>
      page.$$eval('#summary tbody tr td:nth-child(2)', (tds) => tds.map((td) => td.textContent ?? ''));
    const before = await names();
    // Markup order: by status, regressions first.
    expect(before[0]).toBe('build/time');
    await page.click('#summary thead th:nth-child(2) button');
    const asc = await names();
    expect(asc).not.toEqual(before);
    // Sorted ascending by the browser's own collation (localeCompare), the same the page uses.
    const expected = await page.evaluate(
      (xs) => [...xs].sort((a, b) => a.toLowerCase().localeCompare(b.toLowerCase())),
      before,
    );
    expect(asc).toEqual(expected);
    await page.click('#summary thead th:nth-child(2) button');
    expect(await names()).toEqual([...expected].reverse());
    expect(await page.getAttribute('#summary thead th:nth-child(2)', 'aria-sort')).toBe('descending');
    // Back to status order for the screenshot.
    await page.click('#summary thead th:nth-child(1) button');
    expect((await names())[0]).toBe('build/time');
  });

  it('saves a screenshot for people to look at', async () => {
    const out = new URL('../artifacts/', import.meta.url).pathname;
    mkdirSync(out, { recursive: true });
    await page.screenshot({ path: join(out, 'report.png'), fullPage: true });
    expect(existsSync(join(out, 'report.png'))).toBe(true);
  });
});
