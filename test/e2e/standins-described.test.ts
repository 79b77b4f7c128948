// The stand-ins' checker against GitHub's published REST description (@octokit/openapi): it must
// refuse what GitHub does not document (so a passing test means something), and the branch
// store's real request sequence must fit it end to end.
import { describe, expect, it } from 'vitest';
import { branchStore, infoOf, runOf } from '../history/branch-helpers.js';
import { githubApiCheck } from './standins/openapi.js';
import { startGitDataStandin, takeGitViolations } from './standins/git-data.js';

const at = (path: string) => new URL(`http://127.0.0.1${path}`);

describe("GitHub's REST description as the stand-ins' contract", () => {
  const api = githubApiCheck();

  it('knows the calls the action makes, with their parameters', () => {
    const labels = api.request('GET', at('/repos/acme/router/issues/7/labels?per_page=100&page=1'), undefined);
    expect(labels.operation?.template).toBe('/repos/{owner}/{repo}/issues/{issue_number}/labels');
    expect(labels.problems).toEqual([]);
    const list = api.request('GET', at('/repos/acme/router/actions/artifacts?name=h&per_page=100&page=1'), undefined);
    expect(list.problems).toEqual([]);
    const ref = api.request('PATCH', at('/repos/acme/router/git/refs/heads/bellgate-data'), {
      sha: 'a'.repeat(40),
      force: false,
    });
    expect(ref.operation?.template).toBe('/repos/{owner}/{repo}/git/refs/{ref}');
    expect(ref.problems).toEqual([]);
  });

  it('refuses an undocumented path, query parameter, parameter type and body', () => {
    expect(api.request('GET', at('/repos/acme/router/bellgate/labels'), undefined).problems[0]).toMatch(
      /is not an operation of GitHub's REST description/,
    );
    expect(api.request('GET', at('/repos/acme/router/issues/7/labels?label=x'), undefined).problems).toEqual([
      'GET /repos/{owner}/{repo}/issues/{issue_number}/labels: query parameter label is not documented',
    ]);
    expect(api.request('GET', at('/repos/acme/router/issues/seven/labels'), undefined).problems[0]).toMatch(
      /path parameter issue_number must be integer/,
    );
    expect(api.request('POST', at('/repos/acme/router/git/blobs'), { content: 12 }).problems[0]).toMatch(
      /body\/content must be string/,
    );
  });

  it('refuses an answer that lacks what the documented schema requires', () => {
    const { operation } = api.request('GET', at('/repos/acme/router/issues/7/labels'), undefined);
    expect(api.response(operation!, 200, [{ name: 'bellgate:accept' }]).join('\n')).toMatch(
      /must have required property 'node_id'/,
    );
    expect(api.response(operation!, 418, {})).toEqual([
      'GET /repos/{owner}/{repo}/issues/{issue_number}/labels answered 418, which the description does not document',
    ]);
  });

  it("the branch store's requests and the Git Data stand-in's answers fit the description", async () => {
    const git = await startGitDataStandin();
    try {
      for (let i = 0; i < 3; i++) {
        const store = branchStore(git.url, 'bench/described');
        await store.update({ kind: 'record', info: infoOf(`${i}-1`, i), run: runOf(50 + i), keep: 100 });
      }
      expect(git.state.calls.length).toBeGreaterThan(10);
      expect(takeGitViolations(git.state)).toEqual([]);
    } finally {
      await git.close();
    }
  }, 60_000);
});
