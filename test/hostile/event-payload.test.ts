// Hostile event payloads (the file GITHUB_EVENT_PATH names) through the action's context reading,
// and hostile labels and metric names through runAction against the loopback REST stand-in. Payload
// shapes follow GitHub's webhook reference ("Webhook events and payloads": pull_request — from
// memory); what an attacker controls in a fork PR is the labels' text only through a maintainer,
// but the payload file itself is treated as untrusted input all the same.
import fc from 'fast-check';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { readRunContext, type RunContext } from '../../src/github/context.js';
import { runAction } from '../../src/github/run-action.js';
import { startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';
import {
  baselineHistory,
  collectingSink,
  deps,
  workspace,
  zipHistory,
  type Workspace,
} from '../github/action-harness.js';
import { artifactName } from '../../src/history/artifact-store.js';
import { assertNoPollution, CaseCounter, FC, STACK_LINE } from './guards.js';
import { assertInertMarkdown } from './outputs.js';
import { InputError } from '../../src/errors/input-error.js';

const counter = new CaseCounter('event payloads');
afterAll(() => counter.print());

const ENV = {
  GITHUB_REPOSITORY: 'acme/router',
  GITHUB_EVENT_NAME: 'pull_request',
  GITHUB_EVENT_PATH: '/event.json',
  GITHUB_RUN_ID: '8123',
  GITHUB_RUN_ATTEMPT: '1',
};

/** The context's contract: a sound RunContext or an InputError naming the payload. */
async function readOrRefuse(text: string, label: string): Promise<RunContext | undefined> {
  let c: RunContext;
  try {
    c = await readRunContext(ENV, async () => text);
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).where).toBe('GITHUB_EVENT_PATH');
    expect((error as InputError).describe()).not.toMatch(STACK_LINE);
    assertNoPollution();
    counter.add(label, 'refused');
    return undefined;
  }
  {
    if (c.pullRequest) {
      expect(
        Number.isSafeInteger(c.pullRequest.number) && c.pullRequest.number > 0,
        `PR number ${c.pullRequest.number}`,
      ).toBe(true);
      expect(c.pullRequest.labels.every((l) => typeof l === 'string')).toBe(true);
      expect(typeof c.pullRequest.fromFork).toBe('boolean');
    }
    if (c.repositoryId !== undefined) expect(typeof c.repositoryId).toBe('number');
    if (c.defaultBranch !== undefined) expect(typeof c.defaultBranch).toBe('string');
    assertNoPollution();
    counter.add(label, 'ok');
    return c;
  }
}

const hostileValue = fc.oneof(
  fc.constantFrom(
    null,
    true,
    0,
    -1,
    1.5,
    1e21,
    Number.MAX_SAFE_INTEGER + 2,
    '7',
    '',
    [],
    {},
    '__proto__',
    { name: 7 },
    [{ name: null }],
  ),
  fc.jsonValue({ maxDepth: 3 }),
);

describe('readRunContext on hostile payloads', () => {
  it('pull_request objects with every field of a wrong type or missing', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record(
          {
            number: hostileValue,
            labels: fc.oneof(
              hostileValue,
              fc.array(fc.oneof(hostileValue, fc.record({ name: hostileValue })), { maxLength: 5 }),
            ),
            head: fc.oneof(
              hostileValue,
              fc.record({ repo: fc.oneof(hostileValue, fc.record({ fork: hostileValue, full_name: hostileValue })) }),
            ),
          },
          { requiredKeys: [] },
        ),
        fc.oneof(hostileValue, fc.record({ id: hostileValue, default_branch: hostileValue }, { requiredKeys: [] })),
        async (pullRequest, repository) => {
          await readOrRefuse(JSON.stringify({ pull_request: pullRequest, repository }), 'pull_request fields');
        },
      ),
      FC(300),
    );
  });

  it('arbitrary JSON documents and arbitrary text', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.jsonValue({ maxDepth: 4 }),
        async (v) => void (await readOrRefuse(JSON.stringify(v), 'any JSON')),
      ),
      FC(200),
    );
    await fc.assert(
      fc.asyncProperty(
        fc.string({ unit: 'binary', maxLength: 80 }),
        async (t) => void (await readOrRefuse(t, 'any text')),
      ),
      FC(200),
    );
  });

  const hand: Array<[string, string, (c: RunContext | undefined) => void]> = [
    ['missing pull_request', '{"repository":{"id":5}}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['pull_request null', '{"pull_request":null}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['pull_request an array', '{"pull_request":[{"number":7}]}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['number a string', '{"pull_request":{"number":"7"}}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['number fractional', '{"pull_request":{"number":7.5}}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['number negative', '{"pull_request":{"number":-7}}', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['number 1e21', '{"pull_request":{"number":1e21}}', (c) => expect(c?.pullRequest).toBeUndefined()],
    [
      'labels an object',
      '{"pull_request":{"number":7,"labels":{"name":"bellgate:accept"}}}',
      (c) => expect(c?.pullRequest?.labels).toEqual([]),
    ],
    [
      'labels of strings, not objects',
      '{"pull_request":{"number":7,"labels":["bellgate:accept"]}}',
      (c) => expect(c?.pullRequest?.labels).toEqual([]),
    ],
    [
      'label names of wrong types',
      '{"pull_request":{"number":7,"labels":[{"name":1},{"name":null},{"name":["bellgate:accept"]},{}]}}',
      (c) => expect(c?.pullRequest?.labels).toEqual([]),
    ],
    [
      '__proto__ payload',
      '{"__proto__":{"polluted":1,"pull_request":{"number":7}},"constructor":{"prototype":{"polluted":1}}}',
      (c) => expect(c?.pullRequest).toBeUndefined(),
    ],
    [
      '__proto__ inside pull_request',
      '{"pull_request":{"__proto__":{"number":7},"number":8,"labels":[{"__proto__":{"name":"bellgate:accept"}}]}}',
      (c) => expect(c?.pullRequest).toEqual({ number: 8, labels: [], fromFork: false }),
    ],
    [
      'head.repo a string',
      '{"pull_request":{"number":7,"head":{"repo":"someone/router"}}}',
      (c) => expect(c?.pullRequest?.fromFork).toBe(false),
    ],
    [
      'default_branch an object',
      '{"repository":{"id":"5","default_branch":{"name":"main"}}}',
      (c) => expect(c?.defaultBranch).toBeUndefined(),
    ],
    ['payload null', 'null', (c) => expect(c?.pullRequest).toBeUndefined()],
    ['payload truncated', '{"pull_request":{"number":7,"lab', (c) => expect(c).toBeUndefined()],
    ['payload empty', '', (c) => expect(c).toBeUndefined()],
    [
      'deeply nested',
      `${'['.repeat(100_000)}${']'.repeat(100_000)}`,
      (c) => expect(c === undefined || c.pullRequest === undefined).toBe(true),
    ],
  ];
  it.each(hand)('%s', async (label, text, check) => {
    check(await readOrRefuse(text, 'hand-picked'));
  });

  it('a 200,000-label array with hostile names keeps every string label, in order', async () => {
    const names = Array.from({ length: 200_000 }, (_, i) =>
      i % 3 === 0 ? `<img src=x onerror=alert(${i})>` : i % 3 === 1 ? `@team ${i} |` : `bellgate:accept\u200B${i}`,
    );
    const c = await readOrRefuse(
      JSON.stringify({ pull_request: { number: 7, labels: names.map((name) => ({ name })) } }),
      'hand-picked',
    );
    expect(c?.pullRequest?.labels.length).toBe(names.length);
    expect(c?.pullRequest?.labels[200_000 - 1]).toBe(names[200_000 - 1]);
  });

  it('a missing payload file is refused naming GITHUB_EVENT_PATH', async () => {
    const error = await readRunContext(ENV, async () => {
      throw Object.assign(new Error('ENOENT: no such file'), { code: 'ENOENT' });
    }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).describe()).toMatch(
      /^GITHUB_EVENT_PATH: the event payload \/event\.json cannot be read/,
    );
    counter.add('hand-picked', 'refused');
  });
});

describe('runAction with hostile labels and metric names (loopback REST stand-in)', () => {
  const SERIES = 'bench/linux';
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
    const zip = zipHistory(baselineHistory(SERIES));
    const name = artifactName('bellgate-history', SERIES);
    rest.state.artifacts.push({
      id: 1,
      name,
      createdAt: '2026-03-20T00:00:00Z',
      expired: false,
      headBranch: 'main',
      headRepositoryId: 5,
      repositoryId: 5,
      workflowRunId: 111,
      sizeInBytes: zip.length,
      zip,
    });
  });
  afterEach(async () => {
    await ws.remove();
  });

  async function run(labels: unknown, extraMetrics: Record<string, number> = {}) {
    await ws.metrics({ 'route/match-static': 480, 'bundle/app.js.gz': 40212, ...extraMetrics });
    const payload = {
      repository: { id: 5, default_branch: 'main' },
      pull_request: { number: 7, labels, head: { repo: { full_name: 'acme/router', fork: false } } },
    };
    const env = {
      INPUT_METRICS: 'out/*.json',
      INPUT_SERIES: SERIES,
      INPUT_TOKEN: 'ghs_x',
      GITHUB_REPOSITORY: 'acme/router',
      GITHUB_EVENT_NAME: 'pull_request',
      GITHUB_EVENT_PATH: await ws.event(payload),
      GITHUB_RUN_ID: '900',
      GITHUB_RUN_ATTEMPT: '1',
      GITHUB_SHA: 'f'.repeat(40),
      GITHUB_REF: 'refs/pull/7/merge',
      GITHUB_API_URL: rest.url,
      RUNNER_TEMP: ws.dir,
    };
    const { sink, got } = collectingSink();
    await runAction(deps(ws, env, sink, []));
    assertNoPollution();
    return got;
  }

  it('only the exact accept label accepts: look-alikes (case, spaces, zero-width, bidi, homoglyph) do not', async () => {
    const lookalikes = [
      'Bellgate:Accept',
      ' bellgate:accept',
      'bellgate:accept ',
      'bellgate:accept\u200B',
      '\u202Ebellgate:accept',
      'bellgatе:accept' /* Cyrillic е */,
      'bellgate：accept',
    ];
    const got = await run(lookalikes.map((name) => ({ name })));
    expect(got.outputs.get('verdict')).toBe('regressed');
    expect(got.failed).toHaveLength(1);
    const accepted = await run([...lookalikes, 'bellgate:accept'].map((name) => ({ name })));
    expect(accepted.outputs.get('verdict')).toBe('accepted');
    counter.add('runAction labels', 'ok');
  });

  it('labels of the wrong type never accept, never fail the read', async () => {
    for (const labels of [
      { name: 'bellgate:accept' },
      ['bellgate:accept'],
      [{ name: ['bellgate:accept'] }],
      'bellgate:accept',
      null,
    ]) {
      const got = await run(labels);
      expect(got.outputs.get('verdict'), JSON.stringify(labels)).toBe('regressed');
      counter.add('runAction labels', 'ok');
    }
  });

  it('hostile metric names reach the PR comment and summary inert; annotations carry them as data', async () => {
    const hostile = {
      '<img src=x onerror=alert(1)>': 5,
      '](javascript:alert(1))': 6,
      '@acme/maintainers ping': 7,
      'fixes #1 |x|': 8,
      '::error::forged': 9,
    };
    const got = await run([], hostile);
    const comment = rest.state.comments.get(7)?.[0]?.body ?? '';
    expect(comment).not.toBe('');
    assertInertMarkdown(comment);
    for (const s of got.summary) assertInertMarkdown(s);
    // Workflow commands are escaped by @actions/core; what reaches the sink is the plain name.
    expect(got.lines.every((l) => !l.message.includes('\n::'))).toBe(true);
    counter.add('runAction names', 'ok');
  });
});
