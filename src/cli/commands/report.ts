import { Command } from 'commander';
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
import { configOption, examples, historyOption, inputOptions, seriesOption } from '../options.js';

interface ReportOptions extends Partial<MetricFileOptions> {
  history: string;
  html: string;
  config?: string;
  series: string;
  title?: string;
}

/**
 * `bellgate report`: one self-contained HTML file with every metric's history, fitted band and
 * this run (by default the newest recorded run, judged against the runs before it). Exit 0.
 */
export function reportCommand(ctx: CommandContext): Command {
  const cmd = new Command('report').description('write an HTML report of the history and this run');
  historyOption(cmd, true);
  cmd.option('--metrics <file...>', 'metric files of this run (default: the newest run in the history)');
  cmd.requiredOption('--html <file>', 'where to write the HTML file');
  cmd.option('--title <text>', 'title of the page');
  configOption(cmd);
  seriesOption(cmd);
  inputOptions(cmd);
  examples(cmd, [
    'bellgate report --history .bellgate/history.json --html bellgate-report.html',
    'bellgate report --history h.json --metrics bench.json --html out/report.html --title "Nightly"',
  ]);
  return cmd.action(async (options: ReportOptions) => {
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
  });
}
