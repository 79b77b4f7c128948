import { Command } from 'commander';
import type { CommandContext } from '../context.js';
import type { StoreFlags } from '../open-store.js';
import { storeOptions } from '../open-store.js';
import { examples } from '../options.js';
import { runMaintenance } from '../run/maintain.js';

/**
 * `bellgate mark RUN`: a level change starts at RUN (an intended change merged without the accept
 * label): the metrics it names are judged only on runs since it.
 */
export function markCommand(ctx: CommandContext): Command {
  const cmd = new Command('mark')
    .description('say that a level change starts at a run (an intended change)')
    .argument('<run>', 'id of the run the new level starts at (see `bellgate runs`)');
  storeOptions(cmd)
    .option('--metric <glob...>', 'only the metrics matching these globs (default: every metric)')
    .option('--note <text>', 'why, for the next reader');
  examples(cmd, [
    'bellgate mark 8123-1 --history .bellgate/history.jsonl --metric "build/*" --note "new compiler"',
    'GITHUB_TOKEN=... bellgate mark 8123-1 --store branch --history bellgate-data --series bench/linux',
  ]);
  return cmd.action((run: string, o: StoreFlags & { metric?: string[]; note?: string }) =>
    runMaintenance(ctx, o, {
      op: 'mark',
      run,
      ...(o.metric ? { metrics: o.metric } : {}),
      ...(o.note ? { note: o.note } : {}),
    }),
  );
}
