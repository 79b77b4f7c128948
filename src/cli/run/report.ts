import { mkdir, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { runGate } from '../../gate/gate.js';
import { renderHtmlReport } from '../../report/html.js';
import type { CommandContext } from '../context.js';
import { loadConfig } from '../load-config.js';
import { loadRun, type MetricFileOptions } from '../load-run.js';
import { openHistory } from '../open-history.js';
import { resolvePath } from '../paths.js';
import { splitNewest } from '../split-newest.js';

export interface ReportOptions extends Partial<MetricFileOptions> {
  history: string;
  html: string;
  config?: string;
  series: string;
  title?: string;
}

/**
 * The work of `bellgate report` (loaded only when that command runs, so d3 and the HTML code are
 * never loaded by the others): judges the run and writes the self-contained HTML file.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await runReport(ctx, { history: 'h.json', html: 'report.html', series: 'default' })
 */
export async function runReport(ctx: CommandContext, options: ReportOptions): Promise<void> {
  const config = await loadConfig(ctx, options.config);
  const opened = await openHistory(ctx, options.history, options.series);
  const { history, run } =
    options.metrics === undefined
      ? splitNewest(opened.history, options.history)
      : { history: opened.history, run: await loadRun(ctx, config, { ...options, metrics: options.metrics }) };
  const report = runGate({ config, history, run, series: options.series });
  const html = renderHtmlReport({
    report,
    history,
    title: options.title ?? `Bellgate report: ${options.series}`,
    generatedAt: ctx.now().toISOString(),
  });
  const out = resolvePath(ctx, options.html);
  await mkdir(dirname(out), { recursive: true });
  await writeFile(out, html);
  ctx.io.stdout(`wrote ${out} (verdict ${report.verdict}, ${report.metrics.length} metrics)\n`);
}
