// The real octokit-based client against the loopback REST stand-in. Expected behaviour is the
// GitHub REST reference (docs.github.com/rest): exact-name artifact filter, 100-item pages, the
// artifact download answering 302 to a storage URL, Retry-After on secondary rate limits.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { zipSync, strToU8 } from 'fflate';
import { createOctokitApi } from '../../src/github/octokit-api.js';
import { countCalls, startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';

let api: RestStandin;
beforeAll(async () => {
  api = await startRestStandin();
});
afterAll(async () => {
  await api.close();
});

const client = (unitMs = 1) =>
  createOctokitApi({
    token: 'ghs_test',
    baseUrl: api.url,
    owner: 'acme',
    repo: 'router',
    retry: { retries: 3, unitMs },
  });

describe('createOctokitApi', () => {
  it('reads every page of comments (100 a page, the REST maximum) and stops at the short page', async () => {
    api.state.calls.length = 0;
    api.state.comments.set(
      7,
      Array.from({ length: 250 }, (_, i) => ({ id: i + 1, body: `c${i}`, user: { login: 'dev', type: 'User' } })),
    );
    const comments = await client().listIssueComments(7);
    expect(comments).toHaveLength(250);
    expect(comments[249]?.body).toBe('c249');
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/7/comments')).toBe(3);
    // The token travels as a bearer/token header on API calls.
    expect(api.state.calls[0]?.auth).toMatch(/ghs_test/);
  });

  it('retries a 500 answer and then succeeds (two faults, three calls)', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/repos/acme/router/issues/8/comments', status: 500, times: 2 });
    expect(await client().listIssueComments(8)).toEqual([]);
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/8/comments')).toBe(3);
  });

  it('retries a dropped connection (network error)', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/repos/acme/router/issues/9/comments', status: 0, times: 1 });
    expect(await client().listIssueComments(9)).toEqual([]);
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/9/comments')).toBe(2);
  });

  it('gives up after the configured retries on a persistent 503, with the status on the error', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/repos/acme/router/issues/10/comments', status: 503, times: 10 });
    await expect(client().listIssueComments(10)).rejects.toMatchObject({ status: 503 });
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/10/comments')).toBe(4);
    api.state.faults.length = 0;
  });

  it('does not retry a 404 (a client error will not heal)', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/repos/acme/router/issues/11/comments', status: 404, times: 5 });
    await expect(client().listIssueComments(11)).rejects.toMatchObject({ status: 404 });
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/11/comments')).toBe(1);
    api.state.faults.length = 0;
  });

  it('waits as long as Retry-After says on a secondary rate limit, then retries', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({
      method: 'POST',
      path: '/repos/acme/router/issues/12/comments',
      status: 403,
      headers: { 'retry-after': '3' },
      body: { message: 'You have exceeded a secondary rate limit. Please wait a few minutes before you try again.' },
      times: 1,
    });
    const started = performance.now();
    const made = await client(20).createIssueComment(12, 'hello');
    expect(made.body).toBe('hello');
    expect(countCalls(api.state, 'POST', '/repos/acme/router/issues/12/comments')).toBe(2);
    // Retry-After: 3 (seconds) at 20 ms a second of the tuning: at least 60 ms passed.
    expect(performance.now() - started).toBeGreaterThanOrEqual(55);
  });

  it('lists artifacts by exact name and maps the workflow_run fields', async () => {
    api.state.artifacts = [
      {
        id: 1,
        name: 'h-x',
        createdAt: '2026-01-01T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 77,
        sizeInBytes: 10,
      },
      {
        id: 2,
        name: 'h-x-other',
        createdAt: '2026-01-02T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 78,
        sizeInBytes: 10,
      },
    ];
    const listed = await client().listArtifacts('h-x');
    expect(listed).toEqual([
      {
        id: 1,
        name: 'h-x',
        expired: false,
        createdAt: '2026-01-01T00:00:00Z',
        sizeInBytes: 10,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
      },
    ]);
  });

  it('follows the 302 of an artifact download to storage on another origin without sending the token there, and caps the size', async () => {
    // Storage is another origin (as the real signed storage URLs are): fetch drops Authorization on
    // a cross-origin redirect (Fetch standard, "HTTP-redirect fetch", step on CORS-unsafe headers).
    const storage = await startRestStandin();
    try {
      const zip = zipSync({ 'history.jsonl': strToU8('{"x":1}') });
      const entry = {
        id: 3,
        name: 'h',
        createdAt: '2026-01-01T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 79,
        sizeInBytes: zip.length,
        zip,
      };
      storage.state.artifacts = [entry];
      api.state.artifacts = [{ ...entry, location: `${storage.url}/blob/3?sig=standin` }];
      api.state.calls.length = 0;
      const got = await client().downloadArtifact(3, 1 << 20);
      expect(Buffer.from(got).equals(Buffer.from(zip))).toBe(true);
      const blobCall = storage.state.calls.find((c) => c.path.startsWith('/blob/3'));
      expect(blobCall).toBeDefined();
      expect(blobCall?.auth).toBeUndefined();
      expect(api.state.calls[0]?.auth).toMatch(/ghs_test/);
      await expect(client().downloadArtifact(3, 10)).rejects.toThrow(/cap/);
      // a listed artifact deleted meanwhile (404) or expired (410) is gone, not a fault
      await expect(client().downloadArtifact(99, 1 << 20)).rejects.toMatchObject({ name: 'ArtifactGoneError' });
    } finally {
      await storage.close();
    }
  });

  it('deletes an artifact; a token without actions: write is "denied", one already gone is "gone"', async () => {
    api.state.artifacts = [
      {
        id: 41,
        name: 'h',
        createdAt: '2026-01-01T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 1,
        sizeInBytes: 1,
      },
    ];
    expect(await client().deleteArtifact?.(41)).toBe('deleted');
    expect(api.state.artifacts).toEqual([]);
    expect(await client().deleteArtifact?.(41)).toBe('gone');
    api.state.artifactDeleteStatus = 403;
    try {
      expect(await client().deleteArtifact?.(42)).toBe('denied');
    } finally {
      api.state.artifactDeleteStatus = undefined;
    }
  });

  it('retries a plain 429 after the seconds its Retry-After header gives', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({
      method: 'GET',
      path: '/repos/acme/router/issues/13/comments',
      status: 429,
      headers: { 'retry-after': '3' },
      times: 1,
    });
    const started = performance.now();
    expect(await client(20).listIssueComments(13)).toEqual([]);
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/13/comments')).toBe(2);
    expect(performance.now() - started).toBeGreaterThanOrEqual(55);
  });

  it('gives up on a persistent 429 after the configured retries, exactly once per try', async () => {
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/repos/acme/router/issues/14/comments', status: 429, times: 10 });
    await expect(client().listIssueComments(14)).rejects.toMatchObject({ status: 429 });
    expect(countCalls(api.state, 'GET', '/repos/acme/router/issues/14/comments')).toBe(4);
    api.state.faults.length = 0;
  });

  it('retries a 503 from the storage a download redirects to', async () => {
    const zip = zipSync({ 'history.jsonl': strToU8('{}') });
    api.state.artifacts = [
      {
        id: 4,
        name: 'h',
        createdAt: '2026-01-01T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 80,
        sizeInBytes: zip.length,
        zip,
      },
    ];
    api.state.calls.length = 0;
    api.state.faults.push({ method: 'GET', path: '/blob/4', status: 503, times: 1 });
    expect((await client().downloadArtifact(4, 1 << 20)).length).toBe(zip.length);
    expect(countCalls(api.state, 'GET', '/blob/4')).toBe(2);
  });
});
