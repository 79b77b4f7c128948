// Every example workflow in examples/workflows, run as written on a small sample project
// (test/fixtures/sample-project): its `on:` filters, job and step conditions, matrix, permissions
// and each step's inputs, with the action itself run through the bundle (`node dist/index.js`, or
// BELLGATE_ACTION_BUNDLE) against the loopback REST stand-in (GitHub's REST description, and each
// job's token limited to its `permissions:`), the results service and Azurite. Checkout, setup-node
// and `npm ci` are stood in. Event payloads are GitHub's examples (@octokit/webhooks-examples),
// moved to one repository whose default branch is main, the examples' baseline branch; schedule
// has no webhook payload and is written by hand. The static rules are the brief's: third-party
// actions pinned by commit SHA with the tag in a comment, `persist-credentials: false`, permissions
// per job, no `pull-requests: write` on push runs, a concurrency group on recording jobs.
import { cpSync, existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { BUNDLE, ROOT } from './action-runner.js';
import { startAzurite, type Azurite } from './standins/azurite.js';
import { startRestStandin, takeViolations, type RestStandin } from './standins/rest-api.js';
import { startResultsStandin, type ResultsStandin } from './standins/results-service.js';
import { examplePayload } from './webhook-payloads.js';
import { evaluate, readWorkflow, runWorkflow, triggers, type JobRun, type WorkflowEvent } from './workflow-runner.js';

const EXAMPLES = join(ROOT, 'examples', 'workflows');
const SAMPLE = join(ROOT, 'test', 'fixtures', 'sample-project');
const FILES = readdirSync(EXAMPLES).filter((f) => f.endsWith('.yml'));
const REPO = { owner: 'Codertocat', repo: 'Hello-World', id: 186853002 };

let azurite: Azurite;
let rest: RestStandin;
let results: ResultsStandin;
let root: string;
let runId = 70_000;
let tokens = 0;

beforeAll(async () => {
  if (!existsSync(BUNDLE))
    throw new Error(
      `no action bundle at ${BUNDLE}: run \`node test/build-dist.mjs /tmp/action-dist\` and set BELLGATE_ACTION_BUNDLE=/tmp/action-dist/index.js`,
    );
  root = await mkdtemp(join(tmpdir(), 'bellgate-e2e-examples-'));
  azurite = await startAzurite(ROOT);
  rest = await startRestStandin();
  results = await startResultsStandin(azurite, rest);
}, 60_000);
afterAll(async () => {
  await results?.close();
  await rest?.close();
  await azurite?.stop();
  if (root) await rm(root, { recursive: true, force: true });
});
afterEach(() => {
  expect(takeViolations(rest.state)).toEqual([]);
});

/** One repository's example payload of the event, on the sample repository (default branch main). */
function event(
  name: string,
  action?: string,
  extra: (p: Record<string, unknown>) => void = () => undefined,
): WorkflowEvent {
  const repository = {
    ...(examplePayload('pull_request', 'opened').repository as Record<string, unknown>),
    default_branch: 'main',
  };
  let payload: Record<string, unknown>;
  let ref: string;
  if (name === 'schedule') {
    payload = { schedule: '17 3 * * *', repository };
    ref = 'refs/heads/main';
  } else if (name === 'push') {
    payload = {
      ...examplePayload('push', undefined, (p) => p.ref === 'refs/heads/master'),
      ref: 'refs/heads/main',
      repository,
    };
    ref = 'refs/heads/main';
  } else if (name === 'workflow_dispatch') {
    payload = { ...examplePayload('workflow_dispatch', undefined, (p) => p.ref === 'refs/heads/main'), repository };
    ref = 'refs/heads/main';
  } else if (name === 'merge_group') {
    payload = { ...examplePayload('merge_group', 'checks_requested'), repository };
    ref = String((payload.merge_group as { head_ref: string }).head_ref);
  } else {
    payload = examplePayload('pull_request', action);
    payload.repository = repository;
    ref = `refs/pull/${String(payload.number)}/merge`;
  }
  extra(payload);
  return { name, payload, ref };
}

/** A workspace holding the sample project, with kestrel.json's slowdown for this "commit". */
function checkout(name: string, slowdown = 1): string {
  const dir = join(root, name);
  cpSync(SAMPLE, dir, { recursive: true });
  writeFileSync(join(dir, 'kestrel.json'), JSON.stringify({ slowdown }));
  return dir;
}

async function run(file: string, e: WorkflowEvent, workspace: string): Promise<JobRun[]> {
  const id = runId++;
  const headBranch = e.name === 'pull_request' ? 'feature' : e.ref.replace(/^refs\/heads\//, '');
  return runWorkflow(readWorkflow(join(EXAMPLES, file)), e, {
    workspace,
    runId: id,
    tokenFor(permissions) {
      const token = `ghs_job${tokens++}`;
      rest.state.tokenPermissions.set(token, permissions);
      return token;
    },
    env: {
      GITHUB_REPOSITORY: `${REPO.owner}/${REPO.repo}`,
      GITHUB_SHA: String(id).padStart(40, 'a'),
      GITHUB_API_URL: rest.url,
      ACTIONS_RESULTS_URL: results.url,
      ACTIONS_RUNTIME_TOKEN: results.tokenFor({
        workflowRunId: id,
        headBranch,
        headRepositoryId: REPO.id,
        repositoryId: REPO.id,
      }),
      BELLGATE_RETRY_UNIT_MS: '1',
    },
  });
}

const ran = (jobs: JobRun[]) => jobs.filter((j) => j.steps !== undefined);
const gate = (j: JobRun) => j.steps?.find((s) => s.name.startsWith('OWNER/bellgate@'));
const explain = (jobs: JobRun[]) =>
  jobs
    .flatMap((j) =>
      (j.steps ?? []).map(
        (s) => `${j.job} ${JSON.stringify(j.matrix)} ${s.name}: ${s.code}\n${s.output ?? ''}${s.result?.stdout ?? ''}`,
      ),
    )
    .join('\n');

describe.each(FILES)('examples/workflows/%s as written', (file) => {
  const text = readFileSync(join(EXAMPLES, file), 'utf8');
  const workflow = readWorkflow(join(EXAMPLES, file));
  const jobs = Object.entries(workflow.jobs as Record<string, Record<string, unknown>>);

  it('pins every third-party action by commit SHA with its tag in a comment, without persisted credentials', () => {
    const uses = text.split('\n').filter((l) => /^\s*-?\s*uses:/.test(l));
    expect(uses.length).toBeGreaterThan(0);
    for (const line of uses) {
      if (/uses: OWNER\/bellgate@/.test(line)) continue;
      expect(line).toMatch(/uses: [\w-]+\/[\w-]+@[0-9a-f]{40} # v\d+\.\d+\.\d+$/);
    }
    for (const [, job] of jobs)
      for (const step of job.steps as Record<string, unknown>[])
        if (String(step.uses ?? '').startsWith('actions/checkout@'))
          expect((step.with as Record<string, unknown>)?.['persist-credentials']).toBe(false);
  });

  it('gives every job its own permissions, no pull-requests: write to a push run, a concurrency group to recording jobs', () => {
    expect(workflow.permissions).toEqual({});
    for (const [name, job] of jobs) {
      expect(job.permissions, name).toBeTypeOf('object');
      const recording = ['push', 'schedule', 'workflow_dispatch'].filter((e) => triggers(workflow, event(e)));
      for (const e of recording) {
        // The job condition with this event's context, as the runner evaluates it.
        const runsOn = job.if === undefined || evaluateIf(String(job.if), e);
        if (!runsOn) continue;
        // Read only: a push asks which pull request it merged (an accepted merge starts a new level).
        expect((job.permissions as Record<string, string>)['pull-requests'], `${name} on ${e}`).not.toBe('write');
        expect(job.concurrency, `${name} records on ${e}`).toBeDefined();
      }
    }
  });

  it('runs on the sample project: pushes record, pull requests and merge queues are checked, label noise is skipped', async () => {
    // A maintenance workflow checks and records nothing: its own test below runs it.
    if (/^\s+maintenance:/m.test(text)) return;
    const workspace = checkout(file.replace(/\.yml$/, ''));
    const recordingEvents = ['push', 'schedule', 'workflow_dispatch'].filter((e) => triggers(workflow, event(e)));
    for (const name of recordingEvents) {
      const e = event(name);
      if (!triggers(workflow, e)) continue;
      const jobs = await run(file, e, workspace);
      const active = ran(jobs);
      expect(active.length, `${file} on ${name}`).toBeGreaterThan(0);
      for (const j of active) {
        expect(
          j.steps?.every((s) => s.code === 0),
          explain(jobs),
        ).toBe(true);
        expect(gate(j)?.result?.stdout, explain(jobs)).toMatch(/will record/);
        expect(gate(j)?.result?.stdout).toMatch(/recorded run \d+-1 in artifact /);
      }
    }
    for (const e of [event('pull_request', 'opened'), event('merge_group')]) {
      if (!triggers(workflow, e)) continue;
      const jobs = await run(file, e, workspace);
      const active = ran(jobs);
      expect(active.length, `${file} on ${e.name}`).toBeGreaterThan(0);
      for (const j of active) {
        expect(
          j.steps?.every((s) => s.code === 0),
          explain(jobs),
        ).toBe(true);
        expect(gate(j)?.result?.stdout).toMatch(/check only/);
        expect(gate(j)?.result?.outputs.get('verdict')).toBe('learning');
      }
    }
    // A label other than the accept label starts a run whose gate job is skipped.
    const noise = event('pull_request', 'labeled');
    if (triggers(workflow, noise)) expect(ran(await run(file, noise, workspace)).filter((j) => gate(j))).toEqual([]);
  }, 240_000);
});

describe('the accept flow of examples/workflows/bench.yml, as the README describes it', () => {
  it('a regressing pull request fails with the follow-up step reporting it; adding the label passes', async () => {
    const workspace = checkout('bench-accept');
    for (let i = 0; i < 9; i++) {
      const jobs = await run('bench.yml', event('push'), workspace);
      expect(
        ran(jobs).every((j) => j.steps?.every((s) => s.code === 0)),
        explain(jobs),
      ).toBe(true);
    }
    const slower = checkout('bench-accept-pr', 1.5);
    rest.state.labels.set(2, []);
    const red = ran(await run('bench.yml', event('pull_request', 'opened'), slower));
    expect(red.map((j) => j.job)).toEqual(['check']);
    expect(gate(red[0]!)?.code).toBe(1);
    expect(gate(red[0]!)?.result?.outputs.get('verdict')).toBe('regressed');
    const echo = red[0]!.steps?.find((s) => s.name.startsWith('echo'));
    expect(echo?.output).toMatch(/^regressed metrics - 2; report at \S+\.json$/m);
    // The maintainer adds the label: GitHub sends `labeled` naming it; the job runs and reads it.
    rest.state.labels.set(2, ['bellgate:accept']);
    const labeled = event('pull_request', 'labeled', (p) => {
      p.label = { ...(p.label as Record<string, unknown>), name: 'bellgate:accept' };
    });
    const green = ran(await run('bench.yml', labeled, slower));
    expect(green.map((j) => j.job)).toEqual(['check']);
    expect(gate(green[0]!)?.code, explain(green)).toBe(0);
    expect(gate(green[0]!)?.result?.outputs.get('verdict')).toBe('accepted');
  }, 240_000);
});

describe('examples/workflows/maintenance.yml as written, on the artifact history of record-baseline.yml', () => {
  const dispatch = (inputs: Record<string, string>) =>
    run(
      'maintenance.yml',
      event('workflow_dispatch', undefined, (p) => {
        p.inputs = inputs;
      }),
      workspace,
    );
  const log = async (inputs: Record<string, string>): Promise<string> => {
    const jobs = ran(await dispatch(inputs));
    expect(jobs.map((j) => j.job)).toEqual(['maintain']);
    expect(gate(jobs[0]!)?.code, explain(jobs)).toBe(0);
    return gate(jobs[0]!)?.result?.stdout ?? '';
  };
  const recorded: string[] = [];
  let workspace: string;
  beforeAll(async () => {
    // This describe's own history: the artifacts other tests of this file recorded are gone.
    rest.state.artifacts.length = 0;
    workspace = checkout('maintenance');
    for (let i = 0; i < 4; i++) {
      const jobs = await run('record-baseline.yml', event('push'), workspace);
      const out = gate(ran(jobs)[0]!)?.result?.stdout ?? '';
      const id = /recorded run (\d+-1) in artifact /.exec(out)?.[1];
      expect(id, explain(jobs)).toBeDefined();
      recorded.push(id!);
    }
  }, 240_000);

  it('runs lists the recorded runs (the default operation)', async () => {
    const out = await log({});
    expect(out).toMatch(/bellgate: 4 runs in artifact /);
    for (const id of recorded) expect(out).toMatch(new RegExp(`bellgate: ${id} .* 3 metrics`));
  }, 60_000);

  it('mark, drop and rename change the artifact history; a dropped run stays dropped after the next record', async () => {
    expect(await log({ operation: 'mark', run: recorded[2]!, metric: 'latency/*', note: 'new index' })).toMatch(
      new RegExp(`marked run ${recorded[2]}: a new level of latency/\\* starts there`),
    );
    expect(await log({ operation: 'drop', run: recorded[1]!, note: 'broken runner' })).toMatch(
      new RegExp(`dropped run ${recorded[1]}; it stays dropped after merges \\(3 runs left`),
    );
    expect(await log({ operation: 'rename', metric: 'size/web-bundle.js.gz', to: 'size/web-bundle.js.br' })).toMatch(
      /renamed size\/web-bundle\.js\.gz to size\/web-bundle\.js\.br, keeping its history/,
    );
    // A push records on top: every older artifact is merged again, and the tombstone holds.
    const jobs = await run('record-baseline.yml', event('push'), workspace);
    expect(
      ran(jobs).every((j) => j.steps?.every((s) => s.code === 0)),
      explain(jobs),
    ).toBe(true);
    const out = await log({ operation: 'runs' });
    expect(out).toMatch(/bellgate: 4 runs in artifact .*\(1 dropped\)/);
    expect(out).not.toMatch(new RegExp(`bellgate: ${recorded[1]} `));
    expect(out).toMatch(new RegExp(`bellgate: ${recorded[2]} .*level mark \\(manual: latency/\\*\\)`));
  }, 240_000);

  it('import seeds the history from past results in the repository', async () => {
    const past = Array.from({ length: 6 }, (_, i) =>
      JSON.stringify({
        id: `past-${i}`,
        time: new Date(Date.UTC(2025, 10, 1 + i)).toISOString(),
        metrics: { 'latency/geocode-p50': 12.4 + 0.01 * i },
      }),
    );
    writeFileSync(join(workspace, 'past-runs.jsonl'), `${past.join('\n')}\n`);
    const out = await log({ operation: 'import', file: 'past-runs.jsonl' });
    expect(out).toMatch(
      /imported past-runs\.jsonl: 6 runs added, 0 updated, 0 unchanged, 0 skipped; 10 runs in artifact /,
    );
  }, 60_000);

  it('a mark without its run fails the step, naming the input', async () => {
    const jobs = ran(await dispatch({ operation: 'mark' }));
    expect(gate(jobs[0]!)?.code).toBe(1);
    expect(gate(jobs[0]!)?.result?.stdout).toMatch(/::error.*input `maintenance-run` is empty/);
  }, 60_000);
});

/** A job's `if:` for an event, with the examples' own expression rules (workflow-runner.ts). */
function evaluateIf(condition: string, name: string): boolean {
  const e = event(name);
  const expr = condition.trim().replace(/^\$\{\{([\s\S]*)\}\}$/, '$1');
  return Boolean(evaluate(expr, { github: { event_name: e.name, event: e.payload, ref: e.ref } }, false));
}
