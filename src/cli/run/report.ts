import { mkdir, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { renderHtmlReport } from '../../report/html.js';
import type { CommandContext } from '../context.js';
import { judgeRequestedRun, type RequestedRunOptions } from '../judge-requested-run.js';
import { resolvePath } from '../paths.js';

export interface ReportOptions extends RequestedRunOptions {
  html: string;
  title?: string;
}

/**
 * The work of `bellgate report` (loaded only when that command runs, so d3 and the HTML code are
 * never loaded by the others): judges the run and writes the self-contained HTML file.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await runReport(ctx, { history: 'h.json', html: 'report.html', series: 'default' })
 */
export async function runReport(ctx: CommandContext, options: ReportOptions): Promise<void> {
  const { history, report } = await judgeRequestedRun(ctx, options);
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
