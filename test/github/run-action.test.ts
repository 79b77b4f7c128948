// runAction in-process with the real octokit client against the loopback REST stand-in, a fake
// uploader and a collecting sink. Behaviour checked against README's action contract ("Using it in GitHub Actions") and the
// GitHub REST reference; the regressed value sits ~17 sd above a 12-run baseline, far past the 0.01
// cutoff (relative density 0.011 at 3 sd: standard normal table, Abramowitz and Stegun 26.1).
import { readFile } from 'node:fs/promises';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { artifactName } from '../../src/history/artifact-store.js';
import { parseHistory } from '../../src/history/document.js';
import { runAction } from '../../src/github/run-action.js';
import { commentMarker, markerLine } from '../../src/report/marker.js';
import { startRestStandin, takeViolations, type RestStandin } from '../e2e/standins/rest-api.js';
import { baselineHistory, collectingSink, deps, workspace, zipHistory, type Workspace } from './action-harness.js';

const SERIES = 'bench/linux';
const NAME = artifactName('bellgate-history', SERIES);
let rest: RestStandin;
let ws: Workspace;

beforeAll(async () => {
  rest = await startRestStandin();
});
afterAll(async () => {
  await rest.close();
});
beforeEach(async () => {
  ws = await workspace();
  rest.state.artifacts = [];
  rest.state.comments.clear();
  rest.state.labels.clear();
  rest.state.faults = [];
  rest.state.commentWriteStatus = undefined;
});
afterEach(async () => {
  await ws.remove();
  // Every request the action made, and every answer, fits GitHub's published REST description.
  expect(takeViolations(rest.state)).toEqual([]);
});

function seedHistory(): void {
  const zip = zipHistory(baselineHistory(SERIES));
  rest.state.artifacts.push({
    id: 1,
    name: NAME,
    createdAt: '2026-03-20T00:00:00Z',
    expired: false,
    headBranch: 'main',
    headRepositoryId: 5,
    repositoryId: 5,
    workflowRunId: 111,
    sizeInBytes: zip.length,
    zip,
  });
}

async function env(
  event: string,
  payload: unknown,
  extra: Record<string, string> = {},
): Promise<Record<string, string>> {
  return {
    INPUT_METRICS: 'out/*.json',
    INPUT_SERIES: SERIES,
    INPUT_TOKEN: 'ghs_secret_token_value',
    INPUT_CONFIG: '.github/bellgate.yml',
    GITHUB_REPOSITORY: 'acme/router',
    GITHUB_EVENT_NAME: event,
    GITHUB_EVENT_PATH: await ws.event(payload),
    GITHUB_RUN_ID: '900',
    GITHUB_RUN_ATTEMPT: '1',
    GITHUB_SHA: 'f'.repeat(40),
    GITHUB_REF: event === 'push' ? 'refs/heads/main' : 'refs/pull/7/merge',
    GITHUB_API_URL: rest.url,
    RUNNER_TEMP: ws.dir,
    ...extra,
  };
}

const repository = { id: 5, default_branch: 'main' };
const pr = (labels: string[] = []) => ({
  repository,
  pull_request: {
    number: 7,
    labels: labels.map((name) => ({ name })),
    head: { repo: { full_name: 'acme/router', fork: false } },
  },
});

describe('runAction', () => {
  it('push to main without history: learning, records the first run, never fails', async () => {
    await ws.metrics({ 'route/match-static': 412, 'bundle/app.js.gz': 40211 });
    const { sink, got } = collectingSink();
    const uploads: { name: string; text: string }[] = [];
    const result = await runAction(deps(ws, await env('push', { repository }), sink, uploads));
    expect(got.failed).toEqual([]);
    expect(result.recorded).toBe(true);
    expect(got.outputs.get('verdict')).toBe('learning');
    expect(got.outputs.get('regressed')).toBe('0');
    expect(uploads).toHaveLength(1);
    expect(uploads[0]?.name).toBe(NAME);
    const saved = parseHistory(uploads[0]?.text ?? '', 'upload');
    expect(saved.runs.map((r) => r.id)).toEqual(['900-1']);
    expect(saved.runs[0]).toMatchObject({ event: 'push', ref: 'refs/heads/main', time: '2026-04-01T12:00:00.000Z' });
    expect(got.secrets).toEqual(['ghs_secret_token_value']);
  });

  it('pull request with a regression: fails, one comment, summary, annotation, JSON report output; nothing recorded', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    const uploads: { name: string; text: string }[] = [];
    const result = await runAction(deps(ws, await env('pull_request', pr()), sink, uploads));
    expect(result.recorded).toBe(false);
    expect(uploads).toEqual([]);
    expect(got.failed).toHaveLength(1);
    expect(got.failed[0]).toMatch(/1 metric regressed.*bellgate:accept/);
    expect(got.outputs.get('verdict')).toBe('regressed');
    expect(got.outputs.get('regressed')).toBe('1');
    const report = JSON.parse(await readFile(got.outputs.get('report') ?? '', 'utf8'));
    expect(report.schema).toBe('bellgate.report/1');
    expect(report.metrics.find((m: { name: string }) => m.name === 'route/match-static').status).toBe('regressed');
    expect(got.summary).toHaveLength(1);
    const comments = rest.state.comments.get(7) ?? [];
    expect(comments).toHaveLength(1);
    // The comment is the summary behind its hidden marker line.
    expect(comments[0]?.body).toBe(`${markerLine(commentMarker(SERIES))}\n${got.summary[0]}`);
    const errors = got.lines.filter((l) => l.kind === 'error');
    expect(errors).toHaveLength(1);
    expect(errors[0]?.props?.title).toMatch(/route\/match-static regressed/);
    // The token is never printed.
    expect(JSON.stringify(got)).not.toMatch(/ghs_secret_token_value[^"]/);
  });

  it('the accept label turns the verdict into accepted and the step passes', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('pull_request', pr(['perf', 'bellgate:accept'])), sink, []));
    expect(got.outputs.get('verdict')).toBe('accepted');
    expect(got.failed).toEqual([]);
  });

  it('a label added after the push is read from the API: accepted, notices instead of errors', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    // The payload is the push's snapshot, without the label; the pull request carries it now.
    rest.state.labels.set(7, ['perf', 'bellgate:accept']);
    rest.state.calls.length = 0;
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('pull_request', pr(['perf'])), sink, []));
    expect(got.outputs.get('verdict')).toBe('accepted');
    expect(got.failed).toEqual([]);
    expect(
      rest.state.calls.some((c) => c.method === 'GET' && c.path.startsWith('/repos/acme/router/issues/7/labels')),
    ).toBe(true);
    expect(got.lines.filter((l) => l.kind === 'error')).toEqual([]);
    const notices = got.lines.filter((l) => l.kind === 'notice');
    expect(notices[0]?.message).toMatch(/1 regression accepted by the label "bellgate:accept"/);
    expect(notices.some((n) => /route\/match-static regressed \(accepted\)/.test(n.props?.title ?? ''))).toBe(true);
  });

  it('without the label anywhere the regression fails and the message says to add it and re-run', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    rest.state.labels.set(7, ['perf']);
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('pull_request', pr(['perf'])), sink, []));
    expect(got.outputs.get('verdict')).toBe('regressed');
    expect(got.failed[0]).toMatch(/add the label "bellgate:accept" to the pull request and re-run this job/);
  });

  it('block: false reports the regression but does not fail', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('pull_request', pr(), { INPUT_BLOCK: 'false' }), sink, []));
    expect(got.outputs.get('verdict')).toBe('regressed');
    expect(got.failed).toEqual([]);
    expect(got.lines.some((l) => l.kind === 'warning' && /block is false/.test(l.message))).toBe(true);
  });

  it('a fork PR whose token may not comment: summary only, one warning, no failure', async () => {
    seedHistory();
    rest.state.commentWriteStatus = 403;
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    const payload = {
      repository,
      pull_request: { number: 7, labels: [], head: { repo: { full_name: 'someone/router', fork: true } } },
    };
    await runAction(deps(ws, await env('pull_request', payload, { INPUT_BLOCK: 'false' }), sink, []));
    const warnings = got.lines.filter((l) => l.kind === 'warning' && /comment/.test(l.message));
    expect(warnings).toHaveLength(1);
    expect(warnings[0]?.message).toMatch(/fork PR gets a read-only token/);
    expect(got.summary).toHaveLength(1);
    expect(got.failed).toEqual([]);
  });

  it('a history that cannot be fetched: warns, goes on with no history, records nothing', async () => {
    seedHistory();
    rest.state.faults.push({ method: 'GET', path: '/repos/acme/router/actions/artifacts', status: 500, times: 100 });
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    const uploads: { name: string; text: string }[] = [];
    const result = await runAction(deps(ws, await env('push', { repository }), sink, uploads));
    expect(got.failed).toEqual([]);
    expect(got.outputs.get('verdict')).toBe('learning');
    expect(result.recorded).toBe(false);
    expect(uploads).toEqual([]);
    expect(got.lines.some((l) => l.kind === 'warning' && /cannot list the history artifacts/.test(l.message))).toBe(
      true,
    );
    expect(got.summary[0]?.split('\n')[0]).toMatch(/^> \*\*Note:\*\* Bellgate: the history was not used: /);
  });

  it('history-failure: fail turns an unreachable history into a failed step', async () => {
    rest.state.faults.push({ method: 'GET', path: '/repos/acme/router/actions/artifacts', status: 500, times: 100 });
    await ws.metrics({ 'route/match-static': 412 });
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('push', { repository }, { 'INPUT_HISTORY-FAILURE': 'fail' }), sink, []));
    expect(got.failed).toHaveLength(1);
    expect(got.failed[0]).toMatch(/history/);
  });

  it('a bad input fails at once with a message naming it, before any API call', async () => {
    rest.state.calls.length = 0;
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('push', { repository }, { INPUT_COMMENT: 'loud' }), sink, []));
    expect(got.failed).toHaveLength(1);
    expect(got.failed[0]).toMatch(/^input comment: input `comment` is "loud"/);
    expect(got.failed[0]).not.toMatch(/\n\s+at /);
    expect(rest.state.calls).toEqual([]);
  });

  it("a metric pattern that matches nothing fails with the reader's message, not a stack", async () => {
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('push', { repository }), sink, []));
    expect(got.failed).toHaveLength(1);
    expect(got.failed[0]).toMatch(/out\/\*\.json/);
    expect(got.failed[0]).not.toMatch(/\n\s+at /);
  });

  it('a release event is checked only, with a notice', async () => {
    await ws.metrics({ 'route/match-static': 412 });
    const { sink, got } = collectingSink();
    const uploads: { name: string; text: string }[] = [];
    await runAction(deps(ws, await env('release', { repository }), sink, uploads));
    expect(got.lines.some((l) => l.kind === 'notice' && /release is checked only/.test(l.message))).toBe(true);
    expect(uploads).toEqual([]);
  });

  it('an improvement gets a notice, a comment (flagged) and passes', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 360, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('pull_request', pr()), sink, []));
    expect(got.outputs.get('verdict')).toBe('pass');
    expect(got.failed).toEqual([]);
    const notices = got.lines.filter((l) => l.kind === 'notice');
    expect(notices).toHaveLength(1);
    expect(notices[0]?.props?.title).toMatch(/route\/match-static improved/);
    expect(rest.state.comments.get(7)).toHaveLength(1);
  });

  it('a clean pull request without an earlier comment posts none (comment: auto)', async () => {
    seedHistory();
    await ws.metrics({ 'route/match-static': 412, 'bundle/app.js.gz': 40212 });
    const { sink, got } = collectingSink();
    const result = await runAction(deps(ws, await env('pull_request', pr()), sink, []));
    expect(got.outputs.get('verdict')).toBe('pass');
    expect(result.comment).toBe('skipped');
    expect(rest.state.comments.get(7)).toBeUndefined();
  });

  it('an empty token with the artifact store fails naming the token input', async () => {
    await ws.metrics({ 'route/match-static': 412 });
    const { sink, got } = collectingSink();
    await runAction(deps(ws, await env('push', { repository }, { INPUT_TOKEN: '' }), sink, []));
    expect(got.failed).toHaveLength(1);
    expect(got.failed[0]).toMatch(/^input token: input `token` is empty/);
  });

  it('html-report: true uploads a self-contained HTML report beside the history', async () => {
    await ws.metrics({ 'route/match-static': 412 });
    const { sink, got } = collectingSink();
    const uploads: { name: string; text: string }[] = [];
    await runAction(deps(ws, await env('push', { repository }, { 'INPUT_HTML-REPORT': 'true' }), sink, uploads));
    expect(got.failed).toEqual([]);
    const html = uploads.find((u) => u.name.startsWith('bellgate-report-'));
    expect(html?.name).toMatch(/^bellgate-report-bench-linux-[0-9a-f]{8}-1$/);
    expect(html?.text.toLowerCase().startsWith('<!doctype html>')).toBe(true);
    expect(uploads.filter((u) => u.name === NAME)).toHaveLength(1);
  });

  it('series defaults to workflow/job', async () => {
    await ws.metrics({ 'route/match-static': 412 });
    const { sink, got } = collectingSink();
    const e = await env('push', { repository }, { GITHUB_WORKFLOW: 'bench', GITHUB_JOB: 'linux' });
    delete e['INPUT_SERIES'];
    const result = await runAction(deps(ws, e, sink, []));
    expect(result.report?.series).toBe('bench/linux');
    expect(got.failed).toEqual([]);
  });
});
