import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import { runImport, type ImportOptions } from '../run/import.js';
import { examples, historyOption, seriesOption } from '../options.js';

/**
 * `bellgate import`: merges past results (JSON Lines or CSV, detected by content) into the history
 * file or data branch by run id, so a project can start with the history it already has. Rows that cannot be used
 * are listed on stderr with their place and reason; the rest are imported.
 */
export function importCommand(ctx: CommandContext): Command {
  const cmd = new Command('import').description('merge past results (JSON Lines or CSV) into a history file');
  historyOption(cmd, true, 'history file to merge into (created when missing)');
  cmd.requiredOption('--runs <file>', 'past runs: JSON Lines (one run a line) or CSV');
  seriesOption(cmd);
  cmd
    .option('--store <kind>', 'where the history lives: file or branch (artifact: use a manual workflow run)', 'file')
    .option('--repo <owner/name>', 'repository of the data branch (default: GITHUB_REPOSITORY); token in GITHUB_TOKEN');
  examples(cmd, [
    'bellgate import --history .bellgate/history.jsonl --runs past-runs.jsonl',
    'GITHUB_TOKEN=... bellgate import --store branch --history bellgate-data --series bench/linux --runs past.csv',
    'bellgate import --history h.json --runs nightly.csv --series nightly',
  ]);
  cmd.addHelpText(
    'after',
    '\nJSON Lines: {"id":"812-1","time":"2026-05-04T10:20:30Z","sha":"3f2a9c1","ref":"refs/heads/main","metrics":{"latency/p50":12.4}}\nCSV: id,time,sha,ref,name,value[,unit] (one row per metric) or id,time,sha,ref,<one column per metric>\n',
  );
  return cmd.action((options: ImportOptions) => runImport(ctx, options));
}
