// The PR comment upsert, through the real client against the loopback REST stand-in (issue
// comment endpoints as the GitHub REST reference describes them).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { upsertComment } from '../../src/github/comment.js';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import { commentMarker, markerLine } from '../../src/report/marker.js';
import { countCalls, startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';

let rest: RestStandin;
beforeAll(async () => {
  rest = await startRestStandin();
});
afterAll(async () => {
  await rest.close();
});

const api = () =>
  createOctokitApi({ token: 't', baseUrl: rest.url, owner: 'acme', repo: 'router', retry: { retries: 1, unitMs: 1 } });
const marker = markerLine(commentMarker('bench/linux'));
const body = (text: string) => `${marker}\n${text}`;

describe('upsertComment', () => {
  it('auto: stays silent while nothing is flagged and there is no comment yet', async () => {
    expect(await upsertComment(api(), 1, marker, body('all fine'), 'auto', false)).toBe('skipped');
    expect(rest.state.comments.get(1)).toBeUndefined();
  });

  it('auto: creates one comment when flagged, then edits it in place, also when clean again', async () => {
    rest.state.comments.set(2, [{ id: 1, body: 'LGTM', user: { login: 'dev', type: 'User' } }]);
    expect(await upsertComment(api(), 2, marker, body('regressed'), 'auto', true)).toBe('created');
    expect(await upsertComment(api(), 2, marker, body('still regressed'), 'auto', true)).toBe('updated');
    expect(await upsertComment(api(), 2, marker, body('clean now'), 'auto', false)).toBe('updated');
    const list = rest.state.comments.get(2) ?? [];
    expect(list).toHaveLength(2);
    expect(list[1]?.body).toBe(body('clean now'));
    expect(list[0]?.body).toBe('LGTM');
  });

  it('does not write when the body is unchanged', async () => {
    rest.state.calls.length = 0;
    expect(await upsertComment(api(), 2, marker, body('clean now'), 'always', false)).toBe('unchanged');
    expect(countCalls(rest.state, 'PATCH', '/repos')).toBe(0);
  });

  it('ignores a comment that only quotes the marker, and keeps series apart', async () => {
    rest.state.comments.set(3, [
      { id: 50, body: `> ${marker}\nwhy is this failing?`, user: { login: 'dev', type: 'User' } },
    ]);
    const other = markerLine(commentMarker('bench/mac'));
    expect(await upsertComment(api(), 3, other, `${other}\nmac`, 'always', false)).toBe('created');
    expect(await upsertComment(api(), 3, marker, body('linux'), 'always', false)).toBe('created');
    expect(rest.state.comments.get(3)?.map((c) => c.body)).toEqual([
      `> ${marker}\nwhy is this failing?`,
      `${other}\nmac`,
      body('linux'),
    ]);
  });

  it('finds its comment beyond the first page of a long thread', async () => {
    const many = Array.from({ length: 150 }, (_, i) => ({
      id: 5000 + i,
      body: `chat ${i}`,
      user: { login: 'dev', type: 'User' },
    }));
    many[120] = { id: 5120, body: body('old'), user: { login: 'github-actions[bot]', type: 'Bot' } };
    rest.state.comments.set(4, many);
    expect(await upsertComment(api(), 4, marker, body('new'), 'auto', true)).toBe('updated');
    expect(rest.state.comments.get(4)?.[120]?.body).toBe(body('new'));
    expect(rest.state.comments.get(4)).toHaveLength(150);
  });

  it('never: makes no API call', async () => {
    rest.state.calls.length = 0;
    expect(await upsertComment(api(), 2, marker, body('x'), 'never', true)).toBe('skipped');
    expect(rest.state.calls).toHaveLength(0);
  });

  it('passes a 403 (read-only token) up with its status, for the caller to warn', async () => {
    rest.state.commentWriteStatus = 403;
    await expect(upsertComment(api(), 9, marker, body('x'), 'always', true)).rejects.toMatchObject({ status: 403 });
    rest.state.commentWriteStatus = undefined;
  });
});
