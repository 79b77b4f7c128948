/**
 * The store a maintenance command works on: `--store file` (default; `--history` is the file),
 * or `--store branch` (`--history` is the data branch, default bellgate-data) on the repository
 * `--repo OWNER/NAME` (default GITHUB_REPOSITORY) with the token in GITHUB_TOKEN (never a flag,
 * so it stays out of shell history) and the API at GITHUB_API_URL (default api.github.com).
 * The artifact store is refused: artifacts can only be written from inside a workflow run.
 */
import type { Command } from 'commander';
import { InputError } from '../errors/input-error.js';
import type { HistoryStore } from '../history/store.js';
import type { CommandContext } from './context.js';
import { historyStore } from './open-history.js';

export interface StoreFlags {
  history: string;
  store: string;
  repo?: string;
  series?: string;
}

const STORES = ['file', 'branch', 'artifact'];

/** Adds --history, --store, --repo and --series to a maintenance command. */
export function storeOptions(cmd: Command): Command {
  return cmd
    .requiredOption('--history <file|branch>', 'the history file (`--store file`) or data branch (`--store branch`)')
    .option('--store <kind>', 'where the history lives: file or branch (artifact: use a manual workflow run)', 'file')
    .option('--repo <owner/name>', 'repository of the data branch (default: GITHUB_REPOSITORY); token in GITHUB_TOKEN')
    .option('--series <key>', 'which series (needed for a data branch; a file holds one series)');
}

/**
 * @throws InputError for an unknown store, the artifact store, or a branch store without series, repository or token.
 * @example await openStore(ctx, { history: '.bellgate/history.jsonl', store: 'file' })
 */
export async function openStore(ctx: CommandContext, flags: StoreFlags): Promise<HistoryStore> {
  if (flags.store === 'file') {
    // A file holds one series: without --series, the one its header names.
    const series = flags.series ?? (await historyStore(ctx, flags.history, undefined).read({ newest: 0 })).series;
    return historyStore(ctx, flags.history, series || undefined);
  }
  if (flags.store === 'artifact') {
    throw new InputError('the artifact store can only be changed from inside a workflow run', {
      where: '--store',
      fix: 'run the action from a manual workflow run with the `maintenance` input (examples/workflows/maintenance.yml)',
    });
  }
  if (flags.store !== 'branch') {
    throw new InputError(`unknown store ${JSON.stringify(flags.store)}`, {
      where: '--store',
      fix: `use one of ${STORES.join(', ')}`,
    });
  }
  const env = ctx.io.env;
  const series = flags.series;
  if (series === undefined || series === '')
    throw new InputError('a data branch holds one file per series: say which', {
      where: '--series',
      fix: 'pass --series with the `series` of the workflow that records it',
    });
  const [owner, repo, ...extra] = (flags.repo ?? env.GITHUB_REPOSITORY ?? '').split('/');
  if (!owner || !repo || extra.length > 0)
    throw new InputError('the repository of the data branch is not known', {
      where: '--repo',
      fix: 'pass --repo OWNER/NAME (or set GITHUB_REPOSITORY)',
    });
  const token = env.GITHUB_TOKEN ?? '';
  if (token === '')
    throw new InputError('GITHUB_TOKEN is not set, but the data branch is read and written through the GitHub API', {
      where: 'GITHUB_TOKEN',
      fix: 'export GITHUB_TOKEN with a token that may write the repository contents (e.g. `gh auth token`)',
    });
  const [{ createOctokitApi }, { createBranchStore }, { dataBranchName }] = await Promise.all([
    import('../github/octokit-api.js'),
    import('../history/branch-store.js'),
    import('../history/branch-path.js'),
  ]);
  // BELLGATE_RETRY_UNIT_MS shortens the spacing of writes and the backoff for tests, as in the action.
  const unitMs = Math.max(1, Number(env.BELLGATE_RETRY_UNIT_MS) || 1000);
  const api = createOctokitApi({
    token,
    baseUrl: env.GITHUB_API_URL || 'https://api.github.com',
    owner,
    repo,
    retry: { retries: 3, unitMs },
  });
  if (api.gitData === undefined) throw new Error('the GitHub client has no Git Data calls');
  return createBranchStore({ api: api.gitData, branch: dataBranchName(flags.history), series, unitMs });
}
