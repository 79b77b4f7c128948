// The PR comment step's policy (action.yml: `comment: never` stays silent): the mode is checked
// before the API is asked for, so an empty token with `never` neither calls nor warns. The
// comments are listed as the step starts (against the loopback REST stand-in), and a listing
// refused before the report is ready waits for the post to warn, never an unhandled rejection.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { GitHubApi } from '../../src/github/api.js';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import type { RunContext } from '../../src/github/context.js';
import type { ActionInputs } from '../../src/github/inputs.js';
import { startComment } from '../../src/github/pr-comment.js';
import { countCalls, startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';
import { collectingSink } from './action-harness.js';

let rest: RestStandin;
beforeAll(async () => {
  rest = await startRestStandin();
});
afterAll(async () => {
  await rest.close();
});

const context = { pullRequest: { number: 7, labels: [], fromFork: false } } as unknown as RunContext;
const inputs = (comment: ActionInputs['comment']) => ({ comment, token: '' }) as unknown as ActionInputs;

/** An api() that throws the way run-action's does for an empty token, counting the calls. */
function emptyTokenApi(): { api: () => GitHubApi; calls: () => number } {
  let calls = 0;
  return {
    api: () => {
      calls++;
      throw new Error('input `token` is empty, but the GitHub API is needed');
    },
    calls: () => calls,
  };
}

describe('startComment', () => {
  it('comment: never with an empty token: no API call, no warning, outcome skipped', async () => {
    const { sink, got } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(await startComment(api, context, inputs('never'), sink)('<!-- m -->', 'body', true)).toBe('skipped');
    expect(calls()).toBe(0);
    expect(got.lines.filter((l) => l.kind === 'warning')).toEqual([]);
  });

  it('comment: auto with an empty token still asks for the API and warns (the check is not a blanket skip)', async () => {
    const { sink, got } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(await startComment(api, context, inputs('auto'), sink)('<!-- m -->', 'body', true)).toBe('failed');
    expect(calls()).toBe(1);
    expect(got.lines.filter((l) => l.kind === 'warning')).toHaveLength(1);
  });

  it('no pull request: undefined, whatever the mode', async () => {
    const { sink } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(
      await startComment(api, {} as RunContext, inputs('always'), sink)('<!-- m -->', 'body', true),
    ).toBeUndefined();
    expect(calls()).toBe(0);
  });

  it('lists the comments as the step starts, before the report exists, and only once', async () => {
    const { sink } = collectingSink();
    const api = createOctokitApi({
      token: 't',
      baseUrl: rest.url,
      owner: 'acme',
      repo: 'router',
      retry: { retries: 1, unitMs: 1 },
    });
    const listings = () => countCalls(rest.state, 'GET', '/repos/acme/router/issues/7/comments');
    const post = startComment(() => api, context, inputs('auto'), sink);
    for (let i = 0; i < 200 && listings() === 0; i++) await new Promise((r) => setTimeout(r, 5));
    expect(listings()).toBe(1);
    expect(countCalls(rest.state, 'POST', '/repos/acme/router/issues/7/comments')).toBe(0);
    expect(await post('<!-- m -->', '<!-- m -->\nregressed', true)).toBe('created');
    expect(listings()).toBe(1);
    expect(rest.state.comments.get(7)?.map((c) => c.body)).toEqual(['<!-- m -->\nregressed']);
  });

  it('a listing refused before the report is ready is held for the post, which warns once', async () => {
    const { sink, got } = collectingSink();
    const { api, calls } = emptyTokenApi();
    const post = startComment(api, context, inputs('always'), sink);
    await new Promise((r) => setTimeout(r, 20));
    expect(await post('<!-- m -->', 'body', true)).toBe('failed');
    expect(calls()).toBe(1);
    expect(got.lines.filter((l) => l.kind === 'warning').map((l) => l.message)).toEqual([
      expect.stringContaining('the comment on pull request #7 failed'),
    ]);
  });
});
