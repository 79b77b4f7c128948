/**
 * What the runner tells the action about this run: the GITHUB_* variables and the event payload.
 * Read through small getters whose errors name the variable, never from @actions/github's
 * module-level context, so tests can pass any environment.
 */
import { InputError } from '../errors/input-error.js';

export interface RunContext {
  eventName: string;
  owner: string;
  repo: string;
  /** Numeric id of the repository, to tell its own branches from a fork's of the same name. */
  repositoryId?: number;
  /** `${GITHUB_RUN_ID}-${GITHUB_RUN_ATTEMPT}`: unique per attempt, the history's run id. */
  runId: string;
  runNumericId: string;
  attempt: number;
  sha?: string;
  /** Full ref, e.g. refs/heads/main or refs/pull/7/merge. */
  ref?: string;
  workflow: string;
  job: string;
  defaultBranch?: string;
  /** Set for pull_request and pull_request_target events. */
  pullRequest?: { number: number; labels: string[]; fromFork: boolean };
  /** A merge_group run: the pull request it tests, read from its queue branch, when it names one. */
  queuedPullRequest?: number;
  apiUrl: string;
  serverUrl: string;
  runnerTemp: string;
  workspace: string;
}

type Env = Record<string, string | undefined>;

function required(env: Env, name: string): string {
  const v = env[name];
  if (v === undefined || v === '') {
    throw new InputError(`environment variable ${name} is not set`, {
      where: name,
      fix: 'run this action inside a GitHub Actions job (the runner sets the GITHUB_* variables)',
    });
  }
  return v;
}

function record(value: unknown): Record<string, unknown> | undefined {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : undefined;
}

/**
 * Builds the run context from the runner's environment and the event payload file.
 * @throws InputError naming the missing variable or the unreadable payload.
 * @example (await readRunContext(process.env, readFile)).runId // '8123456789-1'
 */
export async function readRunContext(env: Env, readText: (path: string) => Promise<string>): Promise<RunContext> {
  const [owner, repo, ...rest] = required(env, 'GITHUB_REPOSITORY').split('/');
  if (!owner || !repo || rest.length > 0) {
    throw new InputError(`GITHUB_REPOSITORY is "${env.GITHUB_REPOSITORY}", expected owner/name`, {
      where: 'GITHUB_REPOSITORY',
    });
  }
  const eventName = required(env, 'GITHUB_EVENT_NAME');
  let payload: Record<string, unknown> = {};
  const eventPath = env.GITHUB_EVENT_PATH;
  if (eventPath) {
    try {
      payload = record(JSON.parse(await readText(eventPath))) ?? {};
    } catch (cause) {
      throw new InputError(`the event payload ${eventPath} cannot be read as JSON`, {
        where: 'GITHUB_EVENT_PATH',
        cause,
      });
    }
  }
  const repository = record(payload.repository);
  const pr = record(payload.pull_request);
  const attemptText = env.GITHUB_RUN_ATTEMPT || '1';
  const attempt = Number(attemptText);
  const runNumericId = required(env, 'GITHUB_RUN_ID');
  let pullRequest: RunContext['pullRequest'];
  // A PR number goes into API paths (issues/N/comments): only a positive safe integer is one.
  if (pr && typeof pr.number === 'number' && Number.isSafeInteger(pr.number) && pr.number > 0) {
    const labels = Array.isArray(pr.labels)
      ? pr.labels.map((l) => record(l)?.name).filter((n): n is string => typeof n === 'string')
      : [];
    const headRepo = record(record(pr.head)?.repo);
    const fromFork =
      headRepo?.fork === true || (typeof headRepo?.full_name === 'string' && headRepo.full_name !== `${owner}/${repo}`);
    pullRequest = { number: pr.number, labels, fromFork };
  }
  const runnerTemp = env.RUNNER_TEMP || env.TMPDIR || '/tmp';
  const queuedPullRequest =
    eventName === 'merge_group' ? queuedNumber(record(payload.merge_group)?.head_ref) : undefined;
  return {
    eventName,
    owner,
    repo,
    repositoryId: typeof repository?.id === 'number' ? repository.id : undefined,
    runId: `${runNumericId}-${Number.isInteger(attempt) && attempt > 0 ? attempt : 1}`,
    runNumericId,
    attempt: Number.isInteger(attempt) && attempt > 0 ? attempt : 1,
    sha: env.GITHUB_SHA || undefined,
    ref: env.GITHUB_REF || undefined,
    workflow: env.GITHUB_WORKFLOW || 'workflow',
    job: env.GITHUB_JOB || 'job',
    defaultBranch:
      typeof repository?.default_branch === 'string'
        ? repository.default_branch
        : scheduledBranch(eventName, env.GITHUB_REF),
    pullRequest,
    ...(queuedPullRequest === undefined ? {} : { queuedPullRequest }),
    apiUrl: env.GITHUB_API_URL || 'https://api.github.com',
    serverUrl: env.GITHUB_SERVER_URL || 'https://github.com',
    runnerTemp,
    workspace: env.GITHUB_WORKSPACE || '',
  };
}

/** Scheduled runs always run on the default branch, so their ref names it when the payload does not. */
function scheduledBranch(eventName: string, ref: string | undefined): string | undefined {
  return eventName === 'schedule' && ref?.startsWith('refs/heads/') ? ref.slice('refs/heads/'.length) : undefined;
}

/**
 * The pull request a merge queue branch tests: GitHub names it
 * `refs/heads/gh-readonly-queue/<base>/pr-<number>-<head sha>` (docs: "Managing a merge queue").
 */
function queuedNumber(headRef: unknown): number | undefined {
  if (typeof headRef !== 'string') return undefined;
  const m = /\/pr-(\d{1,15})-[0-9a-f]{7,64}$/.exec(headRef);
  const n = m ? Number(m[1]) : NaN;
  return Number.isSafeInteger(n) && n > 0 ? n : undefined;
}
