import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { runImport, type ImportOptions } from '../run/import.js';
import { examples, historyOption, seriesOption } from '../options.js';

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
    'bellgate import --history .bellgate/history.jsonl --runs past-runs.jsonl',
    'bellgate import --history h.json --runs nightly.csv --series nightly',
  ]);
  cmd.addHelpText(
    'after',
    '\nJSON Lines: {"id":"812-1","time":"2026-05-04T10:20:30Z","sha":"3f2a9c1","ref":"refs/heads/main","metrics":{"latency/p50":12.4}}\nCSV: id,time,sha,ref,name,value[,unit] (one row per metric) or id,time,sha,ref,<one column per metric>\n',
  );
  return cmd.action((options: ImportOptions) => runImport(ctx, options));
}
