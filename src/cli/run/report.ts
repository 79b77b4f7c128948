import { mkdir, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { renderHtmlReport } from '../../report/html.js';
import type { CommandContext } from '../context.js';
import { judgeRequestedRun, type RequestedRunOptions } from '../judge-requested-run.js';
import { resolvePath } from '../paths.js';
import { reviewSinceRef } from './since.js';

export interface ReportOptions extends RequestedRunOptions {
  html: string;
  title?: string;
  /** A reference (run id, sha, time): adds the release review's section (cli/run/since.ts). */
  since?: string;
  at?: string;
}

/**
 * The work of `bellgate report` (loaded only when that command runs, so d3 and the HTML code are
 * never loaded by the others): judges the run and writes the self-contained HTML file.
 * @throws InputError (bad files, flags), StoreError (history unreadable).
 * @example await runReport(ctx, { history: 'h.json', html: 'report.html', series: 'default' })
 */
export async function runReport(ctx: CommandContext, options: ReportOptions): Promise<void> {
  const { history, report } = await judgeRequestedRun(ctx, options);
  const since = options.since === undefined ? undefined : await reviewSinceRef(ctx, options.since, options);
  const html = renderHtmlReport({
    report,
    history,
    ...(since === undefined ? {} : { since }),
    title: options.title ?? `Bellgate report: ${options.series}`,
    generatedAt: ctx.now().toISOString(),
  });
  const out = resolvePath(ctx, options.html);
  await mkdir(dirname(out), { recursive: true });
  await writeFile(out, html);
  ctx.io.stdout(`wrote ${out} (verdict ${report.verdict}, ${report.metrics.length} metrics)\n`);
}
