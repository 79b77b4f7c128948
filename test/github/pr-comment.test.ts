// The PR comment step's policy (action.yml: `comment: never` stays silent): the mode is checked
// before the API is asked for, so an empty token with `never` neither calls nor warns.
import { describe, expect, it } from 'vitest';
import type { GitHubApi } from '../../src/github/api.js';
import type { RunContext } from '../../src/github/context.js';
import type { ActionInputs } from '../../src/github/inputs.js';
import { postComment } from '../../src/github/pr-comment.js';
import { collectingSink } from './action-harness.js';

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

describe('postComment', () => {
  it('comment: never with an empty token: no API call, no warning, outcome skipped', async () => {
    const { sink, got } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(await postComment(api, context, inputs('never'), '<!-- m -->', 'body', true, sink)).toBe('skipped');
    expect(calls()).toBe(0);
    expect(got.lines.filter((l) => l.kind === 'warning')).toEqual([]);
  });

  it('comment: auto with an empty token still asks for the API and warns (the check is not a blanket skip)', async () => {
    const { sink, got } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(await postComment(api, context, inputs('auto'), '<!-- m -->', 'body', true, sink)).toBe('failed');
    expect(calls()).toBe(1);
    expect(got.lines.filter((l) => l.kind === 'warning')).toHaveLength(1);
  });

  it('no pull request: undefined, whatever the mode', async () => {
    const { sink } = collectingSink();
    const { api, calls } = emptyTokenApi();
    expect(
      await postComment(api, {} as RunContext, inputs('always'), '<!-- m -->', 'body', true, sink),
    ).toBeUndefined();
    expect(calls()).toBe(0);
  });
});
