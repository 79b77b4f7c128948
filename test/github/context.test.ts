// The run context from the runner's variables and event payloads. The payload shapes follow the
// GitHub webhook reference (docs.github.com, "Webhook events and payloads": push and pull_request).
import { describe, expect, it } from 'vitest';
import { readRunContext } from '../../src/github/context.js';
import { InputError } from '../../src/errors/input-error.js';
import { examplePayload } from '../e2e/webhook-payloads.js';

const env = {
  GITHUB_REPOSITORY: 'acme/router',
  GITHUB_EVENT_NAME: 'pull_request',
  GITHUB_EVENT_PATH: '/event.json',
  GITHUB_RUN_ID: '8123',
  GITHUB_RUN_ATTEMPT: '2',
  GITHUB_WORKFLOW: 'bench',
  GITHUB_JOB: 'linux',
  RUNNER_TEMP: '/tmp/runner',
};
const pr = {
  number: 42,
  labels: [{ name: 'bellgate:accept' }, { name: 'perf' }],
  head: { repo: { full_name: 'someone/router', fork: true } },
};
const read = (payload: unknown) => async () => JSON.stringify(payload);

describe('readRunContext', () => {
  it('reads a fork pull_request: number, labels, fork flag, run id with attempt', async () => {
    const c = await readRunContext(env, read({ pull_request: pr, repository: { id: 5, default_branch: 'main' } }));
    expect(c).toMatchObject({
      owner: 'acme',
      repo: 'router',
      runId: '8123-2',
      repositoryId: 5,
      defaultBranch: 'main',
      workflow: 'bench',
      job: 'linux',
    });
    expect(c.pullRequest).toEqual({ number: 42, labels: ['bellgate:accept', 'perf'], fromFork: true });
  });
  it('reads a push without a pull request, defaulting the attempt to 1', async () => {
    const c = await readRunContext(
      { ...env, GITHUB_EVENT_NAME: 'push', GITHUB_RUN_ATTEMPT: '' },
      read({ repository: { default_branch: 'trunk' } }),
    );
    expect(c.pullRequest).toBeUndefined();
    expect(c.runId).toBe('8123-1');
    expect(c.defaultBranch).toBe('trunk');
  });
  it("reads the pull request a merge queue run tests from its queue branch (GitHub's example payload)", async () => {
    const payload = examplePayload('merge_group', 'checks_requested');
    const c = await readRunContext({ ...env, GITHUB_EVENT_NAME: 'merge_group' }, read(payload));
    expect(c.queuedPullRequest).toBe(104);
    expect(c.pullRequest).toBeUndefined();
  });
  it('reads the labels of a labeled event from its payload (a snapshot, not the labels now)', async () => {
    const c = await readRunContext(env, read(examplePayload('pull_request', 'labeled')));
    expect(c.pullRequest).toMatchObject({ number: 2, labels: ['bug'] });
  });
  it('names a missing variable', async () => {
    await expect(readRunContext({ ...env, GITHUB_REPOSITORY: '' }, read({}))).rejects.toThrow(
      /GITHUB_REPOSITORY is not set/,
    );
  });
  it('refuses an unreadable payload with an InputError', async () => {
    await expect(readRunContext(env, async () => '{not json')).rejects.toBeInstanceOf(InputError);
  });
  it('takes the default branch of a schedule run from its ref when the payload lacks it', async () => {
    const c = await readRunContext(
      { ...env, GITHUB_EVENT_NAME: 'schedule', GITHUB_REF: 'refs/heads/trunk' },
      read({ schedule: '17 3 * * *' }),
    );
    expect(c.defaultBranch).toBe('trunk');
  });
});
