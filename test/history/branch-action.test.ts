// `store: branch` through the action itself (runAction with the real octokit-based client and the
// Git Data client) against the loopback Git Data stand-in: the store factory picks the branch
// store, records on a push to the baseline branch, and reads that history back on the next run.
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { runAction } from '../../src/github/run-action.js';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { collectingSink, deps, workspace, type Workspace } from '../github/action-harness.js';
import { ids, onBranch } from './branch-helpers.js';

const SERIES = 'bench/linux';
let git: GitDataStandin;
let ws: Workspace;
beforeAll(async () => {
  git = await startGitDataStandin();
});
afterAll(async () => {
  await git.close();
});
beforeEach(async () => {
  ws = await workspace();
});
afterEach(async () => {
  await ws.remove();
});

async function env(runId: number, extra: Record<string, string> = {}): Promise<Record<string, string>> {
  return {
    INPUT_METRICS: 'out/*.json',
    INPUT_SERIES: SERIES,
    INPUT_STORE: 'branch',
    INPUT_TOKEN: 'ghs_secret_token_value',
    GITHUB_REPOSITORY: 'acme/router',
    GITHUB_EVENT_NAME: 'push',
    GITHUB_EVENT_PATH: await ws.event({ repository: { id: 5, default_branch: 'main' } }),
    GITHUB_RUN_ID: String(runId),
    GITHUB_RUN_ATTEMPT: '1',
    GITHUB_SHA: 'f'.repeat(40),
    GITHUB_REF: 'refs/heads/main',
    GITHUB_API_URL: git.url,
    RUNNER_TEMP: ws.dir,
    ...extra,
  };
}

describe('store: branch in the action', () => {
  it('records pushes on the data branch bellgate-data and reads them back', async () => {
    for (const [runId, value] of [
      [900, 412],
      [901, 413],
    ] as const) {
      await ws.metrics({ 'route/match-static': value });
      const { sink, got } = collectingSink();
      const result = await runAction(deps(ws, await env(runId), sink, []));
      expect(got.failed).toEqual([]);
      expect(result.recorded).toBe(true);
    }
    expect(ids(onBranch(git, SERIES))).toEqual(['900-1', '901-1']);
    expect(git.state.refs.has('refs/heads/bellgate-data')).toBe(true);
  });

  it('uses the branch the history input names, and refuses the baseline branch or a bad name', async () => {
    await ws.metrics({ 'route/match-static': 414 });
    const named = collectingSink();
    await runAction(deps(ws, await env(902, { INPUT_HISTORY: 'perf/history' }), named.sink, []));
    expect(named.got.failed).toEqual([]);
    expect(ids(onBranch(git, SERIES, 'perf/history'))).toEqual(['902-1']);
    for (const history of ['main', 'bad..name']) {
      const { sink, got } = collectingSink();
      await runAction(deps(ws, await env(903, { INPUT_HISTORY: history }), sink, []));
      expect(got.failed).toHaveLength(1);
      expect(got.failed[0]).toMatch(/input `history`/);
    }
  });
});
