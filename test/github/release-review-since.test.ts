// The action's release mode through runAction: the file store holding a generated history (a +8%
// step from the 20th run after v1.0.0's run, test/gate/since/generate.ts), the repository's tags
// from the loopback REST stand-in (held to GitHub's REST description), and the failure policy:
// findings never fail the step unless since-block is set.
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { serializeHistory } from '../../src/history/document.js';
import { runAction } from '../../src/github/run-action.js';
import { startRestStandin, takeViolations, type RestStandin } from '../e2e/standins/rest-api.js';
import { generateHistory } from '../gate/since/generate.js';
import { collectingSink, deps, workspace, type Workspace } from './action-harness.js';

const history = generateHistory({
  before: 40,
  after: 40,
  seed: 3,
  metrics: { 'latency/p50': { steps: [{ offset: 20, factor: 1.08 }] }, 'size/app': { unit: 'B' } },
});
const full = (i: number): string => history.runs[i]!.sha!.padEnd(40, '0');
let rest: RestStandin;
let ws: Workspace;

beforeAll(async () => {
  rest = await startRestStandin();
  ws = await workspace();
  // Full 40-digit shas, as GitHub gives them.
  for (const r of history.runs) r.sha = r.sha!.padEnd(40, '0');
  await ws.write('history.jsonl', serializeHistory(history));
});
afterAll(async () => {
  await rest?.close();
  await ws?.remove();
});
afterEach(() => {
  expect(takeViolations(rest.state)).toEqual([]);
});

async function release(extra: Record<string, string> = {}) {
  const { sink, got } = collectingSink();
  const env = {
    GITHUB_REPOSITORY: 'acme/router',
    GITHUB_EVENT_NAME: 'release',
    GITHUB_EVENT_PATH: await ws.event({ action: 'published', release: { tag_name: 'v1.1.0' } }),
    GITHUB_RUN_ID: '950',
    GITHUB_RUN_ATTEMPT: '1',
    GITHUB_SHA: full(79),
    GITHUB_REF: 'refs/tags/v1.1.0',
    GITHUB_API_URL: rest.url,
    RUNNER_TEMP: ws.dir,
    INPUT_TOKEN: 'ghs_release',
    INPUT_STORE: 'file',
    INPUT_HISTORY: 'history.jsonl',
    INPUT_SERIES: 'generated',
    INPUT_SINCE: 'previous-release',
    ...extra,
  };
  const result = await runAction(deps(ws, env, sink, []));
  return { result, got };
}

describe('release mode of the action', () => {
  it('reviews since the previous release tag without metric files, and does not fail the step', async () => {
    rest.state.tags = [
      { name: 'v1.1.0', sha: full(79) },
      { name: 'v1.0.0', sha: full(39) },
    ];
    const { result, got } = await release();
    expect(got.failed).toEqual([]);
    expect(result.failed).toBe(false);
    expect(got.outputs.get('regressed')).toBe('1');
    const summary = got.summary.join('\n');
    expect(summary).toContain('### Bellgate release review: 1 worse, 1 unchanged');
    expect(summary).toContain('reference: tag v1.0.0');
    // The step, within 2 runs of the generated one (run-60, 20 runs after run-40).
    const at = Number(/step \+[\d.]+% at run run-(\d+)/.exec(summary)?.[1]);
    expect(Math.abs(at - 60)).toBeLessThanOrEqual(2);
  });

  it('since-block: true fails the step on a worse metric', async () => {
    const { result, got } = await release({ 'INPUT_SINCE-BLOCK': 'true' });
    expect(result.failed).toBe(true);
    expect(got.failed.join('\n')).toMatch(/1 metric worse since the reference in series "generated"/);
  });

  it('no release before this one: a notice, nothing fails', async () => {
    rest.state.tags = [{ name: 'v1.1.0', sha: full(79) }];
    const { result, got } = await release();
    expect(result.failed).toBe(false);
    expect(got.lines.filter((l) => l.kind === 'notice').map((l) => l.message)).toEqual([
      "bellgate: no release tag before v1.1.0 among the repository's tags: nothing to review",
    ]);
  });
});
