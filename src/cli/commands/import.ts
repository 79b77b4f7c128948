import { Command } from 'commander';
import { importRuns, parseImportRuns } from '../../history/import.js';
import { visibleText } from '../../model/visible-text.js';
import type { CommandContext } from '../context.js';
import { openHistory } from '../open-history.js';
import { resolvePath } from '../paths.js';
import { readUserText } from '../read-text.js';
import { examples, historyOption, seriesOption } from '../options.js';

interface ImportOptions {
  history: string;
  runs: string;
  series: string;
}

/** How many skipped rows are listed one by one before the rest are counted. */
const SHOWN_SKIPS = 20;

/**
 * `bellgate import`: merges past results (JSON Lines or CSV, detected by content) into the history
 * file by run id, so a project can start with the history it already has. Rows that cannot be used
 * are listed on stderr with their place and reason; the rest are imported.
 */
export function importCommand(ctx: CommandContext): Command {
  const cmd = new Command('import').description('merge past results (JSON Lines or CSV) into a history file');
  historyOption(cmd, true, 'history file to merge into (created when missing)');
  cmd.requiredOption('--runs <file>', 'past runs: JSON Lines (one run a line) or CSV');
  seriesOption(cmd);
  examples(cmd, [
    'bellgate import --history .bellgate/history.json --runs past-runs.jsonl',
    'bellgate import --history h.json --runs nightly.csv --series nightly',
  ]);
  cmd.addHelpText(
    'after',
    '\nJSON Lines: {"id":"812-1","time":"2026-05-04T10:20:30Z","sha":"3f2a9c1","ref":"refs/heads/main","metrics":{"latency/p50":12.4}}\nCSV: id,time,sha,ref,name,value[,unit] (one row per metric) or id,time,sha,ref,<one column per metric>\n',
  );
  return cmd.action(async (options: ImportOptions) => {
    const runsPath = resolvePath(ctx, options.runs);
    const text = await readUserText(runsPath, '--runs');
    const parsed = parseImportRuns(text, options.runs);
    const { history, store } = await openHistory(ctx, options.history, options.series);
    const result = importRuns(history, parsed);
    const skipped = result.skipped;
    // Reasons quote names from the file: no control or bidi character reaches the terminal.
    for (const skip of skipped.slice(0, SHOWN_SKIPS)) ctx.io.stderr(visibleText(`bellgate: skipped ${skip.where}: ${skip.reason}`) + '\n');
    if (skipped.length > SHOWN_SKIPS) ctx.io.stderr(`bellgate: ... and ${skipped.length - SHOWN_SKIPS} more skipped rows\n`);
    if (store) await store.save(result.history, history.runs.length);
    ctx.io.stdout(
      `imported ${options.runs}: ${result.added} runs added, ${result.updated} updated, ${result.unchanged} unchanged, ${skipped.length} skipped; ` +
        `${result.history.runs.length} runs in ${store?.describe() ?? options.history}\n`,
    );
  });
}
