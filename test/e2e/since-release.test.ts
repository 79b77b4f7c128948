// The release review as a release workflow runs it: examples/workflows/release-review.yml as
// written, through the real bundle (`node dist/index.js`, or BELLGATE_ACTION_BUNDLE), on the
// sample project (test/fixtures/sample-project) whose history examples/workflows/bench.yml records
// on pushes to main, against the loopback REST stand-in (held to GitHub's REST description from
// @octokit/openapi; each job's token limited to its `permissions:`), the results service and
// Azurite. Event payloads are GitHub's examples (@octokit/webhooks-examples: release published,
// push of a tag), moved to the sample repository and its tags.
// The truth is the sample project's own: kestrel.json's slowdown 1.12 from the 19th recorded run
// makes both latencies 12% slower and leaves the bundle size alone.
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { ROOT } from './action-runner.js';
import { takeViolations } from './standins/rest-api.js';
import { startServices, type Services } from './standins/services.js';
import { examplePayload } from './webhook-payloads.js';
import { readWorkflow, runWorkflow, triggers, type JobRun, type WorkflowEvent } from './workflow-runner.js';

const REPO = { owner: 'Codertocat', repo: 'Hello-World', id: 186853002 };
const SLOWER = 1.12;
let services: Services;
let tokens = 0;

beforeAll(async () => {
  services = await startServices('bellgate-e2e-release-');
}, 60_000);
afterAll(async () => {
  await services?.close();
});
afterEach(() => {
  expect(takeViolations(services.rest.state)).toEqual([]);
});

const sha = (runId: number): string => runId.toString(16).padStart(40, 'c');
const repository = () => ({
  ...(examplePayload('pull_request', 'opened').repository as Record<string, unknown>),
  default_branch: 'main',
});

/** One workflow run of `file` for the event, on commit `commit`, with the workspace's kestrel.json. */
async function run(file: string, e: WorkflowEvent, workspace: string, runId: number, commit: string) {
  const headBranch = e.ref.replace(/^refs\/(heads|tags)\//, '');
  return runWorkflow(readWorkflow(join(ROOT, 'examples', 'workflows', file)), e, {
    workspace,
    runId,
    tokenFor(permissions) {
      const token = `ghs_release${tokens++}`;
      services.rest.state.tokenPermissions.set(token, permissions);
      return token;
    },
    env: {
      GITHUB_REPOSITORY: `${REPO.owner}/${REPO.repo}`,
      GITHUB_SHA: commit,
      GITHUB_API_URL: services.rest.url,
      ACTIONS_RESULTS_URL: services.results.url,
      ACTIONS_RUNTIME_TOKEN: services.results.tokenFor({
        workflowRunId: runId,
        headBranch,
        headRepositoryId: REPO.id,
        repositoryId: REPO.id,
      }),
      BELLGATE_RETRY_UNIT_MS: '1',
    },
  });
}

const explain = (jobs: JobRun[]) =>
  jobs
    .flatMap((j) =>
      (j.steps ?? []).map((s) => `${j.job} ${s.name}: ${s.code}\n${s.output ?? ''}${s.result?.stdout ?? ''}`),
    )
    .join('\n');
const review = (jobs: JobRun[]) => jobs[0]?.steps?.find((s) => s.name.startsWith('OWNER/bellgate@'));

describe('examples/workflows/release-review.yml on the sample project', () => {
  const workspace = () => join(services.root, 'project');
  const ids: number[] = [];

  it('bench.yml records 30 pushes; the release of the 30th is reviewed since the release before it', async () => {
    cpSync(join(ROOT, 'test', 'fixtures', 'sample-project'), workspace(), { recursive: true });
    const push = {
      name: 'push',
      payload: {
        ...examplePayload('push', undefined, (p) => p.ref === 'refs/heads/master'),
        ref: 'refs/heads/main',
        repository: repository(),
      },
      ref: 'refs/heads/main',
    };
    let tagTime = '';
    for (let i = 1; i <= 30; i++) {
      const id = 90_000 + i;
      ids.push(id);
      writeFileSync(join(workspace(), 'kestrel.json'), JSON.stringify({ slowdown: i >= 19 ? SLOWER : 1 }));
      const jobs = await run('bench.yml', push, workspace(), id, sha(id));
      // Recorded whether or not the gate flagged it (the slower pushes regress, as they should).
      expect(review(jobs.filter((j) => j.steps))?.result?.stdout, explain(jobs)).toMatch(
        /recorded run \d+-1 in artifact /,
      );
      // v1.0.0 was tagged on a commit that was never benchmarked, after the 12th run.
      if (i === 12) tagTime = new Date(Date.now() + 1).toISOString();
      await new Promise((r) => setTimeout(r, 2));
    }
    const released = sha(ids[29]!);
    services.rest.state.tags = [
      { name: 'v1.1.0', sha: released },
      { name: 'v1.1.0-rc.1', sha: sha(ids[24]!) },
      { name: 'v1.0.0', sha: 'e'.repeat(40) },
      { name: 'v0.9.0', sha: sha(ids[2]!) },
      { name: 'nightly', sha: sha(ids[27]!) },
    ];
    services.rest.state.commitTimes.set('e'.repeat(40), tagTime);

    const payload: Record<string, unknown> = { ...examplePayload('release', 'published'), repository: repository() };
    (payload.release as Record<string, unknown>).tag_name = 'v1.1.0';
    const published: WorkflowEvent = { name: 'release', payload, ref: 'refs/tags/v1.1.0' };
    const workflow = readWorkflow(join(ROOT, 'examples', 'workflows', 'release-review.yml'));
    expect(triggers(workflow, published)).toBe(true);
    expect(triggers(workflow, push)).toBe(false);
    const jobs = await run('release-review.yml', published, workspace(), 91_000, released);
    const step = review(jobs);
    // Worse metrics do not fail the step by default.
    expect(
      jobs[0]!.steps!.every((s) => s.code === 0),
      explain(jobs),
    ).toBe(true);
    // The markdown escapes brackets; the sentences are read without the escapes.
    const summary = step!.result!.summary.replace(/\\([()[\]])/g, '$1');
    expect(summary).toMatch(/^### Bellgate release review/m);
    // The release before v1.1.0, passing over its release candidate and the tag that is no version.
    expect(summary).toContain('reference: tag v1.0.0 (commit eeeeeeeeeeee), the release before v1.1.0');
    // v1.0.0's commit has no recorded run: the nearest earlier one (the 12th) stands in.
    expect(summary).toMatch(new RegExp(`has no recorded run; run ${ids[11]}-1 .*the nearest earlier recorded run`));
    expect(summary).toMatch(new RegExp(`step \\+12\\.0% at run ${ids[18]}-1`));
    expect(step!.result!.outputs.get('regressed')).toBe('2');
    expect(jobs[0]!.steps!.at(-1)!.output).toContain('metrics worse since the previous release - 2');

    const json = JSON.parse(readFileSync(step!.result!.outputs.get('report')!, 'utf8')) as {
      schema: string;
      latest: { run: string };
      metrics: {
        name: string;
        status: string;
        ratio: number;
        lower: number;
        upper: number;
        steps: { run: string }[];
      }[];
    };
    expect(json.schema).toBe('bellgate.since/1');
    expect(json.latest.run).toBe(`${ids[29]}-1`);
    const byName = new Map(json.metrics.map((m) => [m.name, m]));
    for (const name of ['latency/geocode-p50', 'latency/geocode-p95']) {
      const m = byName.get(name)!;
      expect(m.status).toBe('worse');
      // The interval covers the slowdown the sample project was given.
      expect(m.lower).toBeLessThanOrEqual(SLOWER * 1.001);
      expect(m.upper).toBeGreaterThanOrEqual(SLOWER * 0.995);
      // One step, on the first slower run (p95 also drifts down 0.06% a run: a drift is no step).
      expect(m.steps.map((s) => s.run)).toEqual([`${ids[18]}-1`]);
    }
    expect(byName.get('size/web-bundle.js.gz')!.status).toBe('unchanged');
  }, 300_000);

  it('a pushed version tag gets the same review', async () => {
    const push = examplePayload('push', undefined, (p) => p.ref === 'refs/tags/simple-tag');
    const tagPush: WorkflowEvent = {
      name: 'push',
      payload: { ...push, ref: 'refs/tags/v1.1.0', repository: repository() },
      ref: 'refs/tags/v1.1.0',
    };
    const jobs = await run('release-review.yml', tagPush, workspace(), 91_001, sha(ids[29]!));
    expect(
      jobs[0]!.steps!.every((s) => s.code === 0),
      explain(jobs),
    ).toBe(true);
    expect(review(jobs)!.result!.summary).toContain('reference: tag v1.0.0');
    expect(review(jobs)!.result!.outputs.get('regressed')).toBe('2');
  }, 120_000);
});
