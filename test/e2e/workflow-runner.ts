/**
 * Runs an example workflow file the way GitHub Actions would, as far as the examples use it: the
 * `on:` filters (event, branches, tags, pull_request types), the job and step `if:` conditions, a
 * `strategy.matrix`, `${{ }}` expressions in `with:`, `run:` and `concurrency`, and each job's
 * `permissions`, which the token the job gets is limited to (the REST stand-in refuses what they
 * do not grant). The checkout and setup steps are stood in (the sample project is already in the
 * workspace; `npm ci` has nothing to install); every other `run:` runs in bash, and
 * `uses: OWNER/bellgate@v1` runs the action bundle with the step's inputs.
 * Expressions: contexts github, inputs (workflow_dispatch), matrix, steps, env; literals; ==, !=, &&, ||, !, parentheses;
 * always(), success(), failure(), contains(), startsWith() (GitHub docs, "Expressions").
 */
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { runStep, type StepResult } from './action-runner.js';

type Json = Record<string, unknown>;

export interface WorkflowEvent {
  name: string;
  payload: Json;
  /** GITHUB_REF of the run, e.g. refs/heads/main or refs/pull/2/merge. */
  ref: string;
}

export interface JobRun {
  job: string;
  matrix: Json;
  /** Undefined when the job's `if:` skipped it. */
  steps?: { name: string; code: number; result?: StepResult; output?: string }[];
  permissions: Record<string, string>;
  concurrency?: string;
}

export interface RunnerSetup {
  workspace: string;
  env: Record<string, string>;
  /** The token the job gets for these permissions (the REST stand-in enforces them). */
  tokenFor(permissions: Record<string, string>): string;
  runId: number;
}

/** Whether the workflow's `on:` starts a run for this event. */
export function triggers(workflow: Json, event: WorkflowEvent): boolean {
  const on = workflow.on as unknown;
  const spec: Json =
    typeof on === 'string'
      ? { [on]: null }
      : Array.isArray(on)
        ? Object.fromEntries(on.map((e: string) => [e, null]))
        : ((on as Json) ?? {});
  if (!(event.name in spec)) return false;
  const filter = (spec[event.name] ?? {}) as Json;
  if (event.name === 'pull_request') {
    const types = (filter.types as string[] | undefined) ?? ['opened', 'synchronize', 'reopened'];
    if (!types.includes(String(event.payload.action))) return false;
  }
  if (event.name === 'push' && (Array.isArray(filter.branches) || Array.isArray(filter.tags))) {
    // GitHub docs, "Using filters": with only `tags`, branch pushes do not start the run, and the other way round.
    const tag = event.ref.startsWith('refs/tags/');
    const patterns = (tag ? filter.tags : filter.branches) as string[] | undefined;
    const name = event.ref.replace(/^refs\/(heads|tags)\//, '');
    if (!patterns?.some((p) => globMatch(p, name))) return false;
  }
  return true;
}

/** A ref filter pattern: `*` any characters but `/`, `**` any characters (GitHub's filter pattern cheat sheet). */
function globMatch(pattern: string, name: string): boolean {
  const source = pattern
    .split('**')
    .map((part) =>
      part
        .split('*')
        .map((t) => t.replace(/[.+?^${}()|[\]\\]/g, '\\$&'))
        .join('[^/]*'),
    )
    .join('.*');
  return new RegExp(`^${source}$`).test(name);
}

export function readWorkflow(path: string): Json {
  return parse(readFileSync(path, 'utf8')) as Json;
}

/** Runs every job of the workflow for the event; the jobs run one after another. */
export async function runWorkflow(workflow: Json, event: WorkflowEvent, setup: RunnerSetup): Promise<JobRun[]> {
  const out: JobRun[] = [];
  for (const [job, raw] of Object.entries(workflow.jobs as Json)) {
    const spec = raw as Json;
    const matrices = expandMatrix(((spec.strategy as Json | undefined)?.matrix as Json | undefined) ?? {});
    for (const matrix of matrices) out.push(await runJob(workflow, job, spec, matrix, event, setup));
  }
  return out;
}

function expandMatrix(matrix: Json): Json[] {
  let legs: Json[] = [{}];
  for (const [key, values] of Object.entries(matrix)) {
    if (!Array.isArray(values)) continue;
    legs = legs.flatMap((leg) => values.map((v: unknown) => ({ ...leg, [key]: v })));
  }
  return legs;
}

async function runJob(
  workflow: Json,
  job: string,
  spec: Json,
  matrix: Json,
  event: WorkflowEvent,
  setup: RunnerSetup,
): Promise<JobRun> {
  const permissions = (spec.permissions ?? workflow.permissions ?? {}) as Record<string, string>;
  const token = setup.tokenFor(permissions);
  const github = {
    event_name: event.name,
    event: event.payload,
    ref: event.ref,
    token,
    workflow: String(workflow.name ?? 'workflow'),
    job,
  };
  const steps: Json = {};
  let failed = false;
  const inputs = dispatchInputs(workflow, event);
  const context = (): Json => ({
    github,
    inputs,
    matrix,
    steps,
    env: setup.env,
    job: { status: failed ? 'failure' : 'success' },
  });
  const concurrencySpec = spec.concurrency as Json | string | undefined;
  const concurrency =
    concurrencySpec === undefined
      ? undefined
      : interpolate(typeof concurrencySpec === 'string' ? concurrencySpec : String(concurrencySpec.group), context());
  const run: JobRun = { job, matrix, permissions, ...(concurrency === undefined ? {} : { concurrency }) };
  if (spec.if !== undefined && !truthy(evaluate(condition(spec.if), context(), failed))) return run;
  run.steps = [];
  for (const [i, raw] of (spec.steps as Json[]).entries()) {
    const step = raw as Json;
    const wanted = step.if === undefined ? !failed : truthy(evaluate(condition(step.if), context(), failed));
    if (!wanted) continue;
    const uses = typeof step.uses === 'string' ? step.uses : undefined;
    if (uses?.startsWith('actions/checkout@') || uses?.startsWith('actions/setup-node@')) {
      run.steps.push({ name: uses, code: 0 });
      continue;
    }
    if (uses?.startsWith('OWNER/bellgate@')) {
      const inputs: Record<string, string> = { token };
      for (const [k, v] of Object.entries((step.with as Json | undefined) ?? {}))
        inputs[k] = interpolate(String(v), context());
      const result = await runStep({
        dir: setup.workspace,
        tag: `${setup.runId}-${job}-${Object.values(matrix).join('-')}-${i}`,
        event: event.payload,
        inputs,
        env: {
          ...setup.env,
          GITHUB_EVENT_NAME: event.name,
          GITHUB_REF: event.ref,
          GITHUB_RUN_ID: String(setup.runId),
          GITHUB_RUN_ATTEMPT: '1',
          GITHUB_WORKFLOW: github.workflow,
          GITHUB_JOB: job,
        },
      });
      if (step.id !== undefined)
        steps[String(step.id)] = {
          outputs: Object.fromEntries(result.outputs),
          outcome: result.code === 0 ? 'success' : 'failure',
        };
      run.steps.push({ name: uses, code: result.code, result });
      if (result.code !== 0) failed = true;
      continue;
    }
    if (uses !== undefined) throw new Error(`the workflow runner does not know the action ${uses}`);
    const script = interpolate(String(step.run), context());
    // `npm ci` installs nothing in the sample project: stood in, like checkout and setup.
    const command = script.replace(/^npm ci( && )?/, '');
    if (command.trim() === '') {
      run.steps.push({ name: script, code: 0 });
      continue;
    }
    const { code, output } = await bash(command, setup.workspace, { ...setup.env, GITHUB_RUN_ID: String(setup.runId) });
    run.steps.push({ name: script, code, output });
    if (code !== 0) failed = true;
  }
  return run;
}

/**
 * The `inputs` context of a workflow_dispatch run: each declared input's default, overridden by
 * the inputs the run was started with (the payload's `inputs`). Empty for other events.
 */
function dispatchInputs(workflow: Json, event: WorkflowEvent): Json {
  if (event.name !== 'workflow_dispatch') return {};
  const on = workflow.on as Json | undefined;
  const declared = ((on?.workflow_dispatch as Json | null | undefined)?.inputs ?? {}) as Record<string, Json>;
  const out: Json = {};
  for (const [name, spec] of Object.entries(declared)) out[name] = spec.default ?? '';
  return { ...out, ...((event.payload.inputs as Json | null | undefined) ?? {}) };
}

function bash(script: string, cwd: string, env: Record<string, string>): Promise<{ code: number; output: string }> {
  return new Promise((resolve) => {
    const child = spawn('bash', ['-e', '-c', script], {
      cwd,
      env: { PATH: process.env.PATH ?? '', HOME: process.env.HOME ?? cwd, ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d: Buffer) => (output += d.toString()));
    child.stderr.on('data', (d: Buffer) => (output += d.toString()));
    child.on('close', (code) => resolve({ code: code ?? -1, output }));
  });
}

/** A job or step `if:` may be written with or without `${{ }}`. */
function condition(raw: unknown): string {
  const text = String(raw).trim();
  const m = /^\$\{\{([\s\S]*)\}\}$/.exec(text);
  return m ? (m[1] ?? '') : text;
}

/** `${{ expr }}` inside text, each replaced by its value as text. */
export function interpolate(text: string, context: Json): string {
  return text.replace(/\$\{\{([\s\S]*?)\}\}/g, (_m, expr: string) => {
    const v = evaluate(expr, context, false);
    return v === null || v === undefined ? '' : String(v);
  });
}

function truthy(v: unknown): boolean {
  return !(v === false || v === 0 || v === '' || v === null || v === undefined);
}

type Token = { kind: 'op' | 'str' | 'num' | 'id'; text: string };

function tokenize(expr: string): Token[] {
  const tokens: Token[] = [];
  const re = /\s*(?:(==|!=|&&|\|\||[!().,[\]])|'((?:[^']|'')*)'|(-?\d+(?:\.\d+)?)|([A-Za-z_][\w-]*))/y;
  let at = 0;
  while (at < expr.length) {
    if (/^\s*$/.test(expr.slice(at))) break;
    re.lastIndex = at;
    const m = re.exec(expr);
    if (!m) throw new Error(`cannot read the expression ${JSON.stringify(expr)} at ${at}`);
    at = re.lastIndex;
    if (m[1] !== undefined) tokens.push({ kind: 'op', text: m[1] });
    else if (m[2] !== undefined) tokens.push({ kind: 'str', text: m[2].replace(/''/g, "'") });
    else if (m[3] !== undefined) tokens.push({ kind: 'num', text: m[3] });
    else tokens.push({ kind: 'id', text: m[4] ?? '' });
  }
  return tokens;
}

/** Evaluates one expression (GitHub's loose equality: strings compare case-insensitively). */
export function evaluate(expr: string, context: Json, failed: boolean): unknown {
  const tokens = tokenize(expr);
  let i = 0;
  const peek = () => tokens[i];
  const take = (text?: string): Token => {
    const t = tokens[i++];
    if (t === undefined || (text !== undefined && t.text !== text))
      throw new Error(`expected ${text ?? 'more'} in ${JSON.stringify(expr)}`);
    return t;
  };
  const equal = (a: unknown, b: unknown) =>
    typeof a === 'string' && typeof b === 'string' ? a.toLowerCase() === b.toLowerCase() : a === b;
  const or = (): unknown => {
    let v = and();
    while (peek()?.text === '||') {
      take();
      const r = and();
      v = truthy(v) ? v : r;
    }
    return v;
  };
  const and = (): unknown => {
    let v = comparison();
    while (peek()?.text === '&&') {
      take();
      const r = comparison();
      v = truthy(v) ? r : v;
    }
    return v;
  };
  const comparison = (): unknown => {
    const left = unary();
    const op = peek()?.text;
    if (op === '==' || op === '!=') {
      take();
      const right = unary();
      return op === '==' ? equal(left, right) : !equal(left, right);
    }
    return left;
  };
  const unary = (): unknown => {
    if (peek()?.text === '!') {
      take();
      return !truthy(unary());
    }
    return primary();
  };
  const primary = (): unknown => {
    const t = take();
    if (t.kind === 'op' && t.text === '(') {
      const v = or();
      take(')');
      return v;
    }
    if (t.kind === 'str') return t.text;
    if (t.kind === 'num') return Number(t.text);
    if (t.kind === 'id') {
      if (t.text === 'true') return true;
      if (t.text === 'false') return false;
      if (t.text === 'null') return null;
      if (peek()?.text === '(') {
        take('(');
        const args: unknown[] = [];
        while (peek()?.text !== ')') {
          args.push(or());
          if (peek()?.text === ',') take(',');
        }
        take(')');
        return call(t.text, args, failed);
      }
      let v: unknown = context[t.text];
      while (peek()?.text === '.') {
        take('.');
        const key = take().text;
        v = v !== null && typeof v === 'object' ? (v as Json)[key] : undefined;
      }
      return v;
    }
    throw new Error(`unexpected ${t.text} in ${JSON.stringify(expr)}`);
  };
  const value = or();
  if (i !== tokens.length) throw new Error(`unread text in ${JSON.stringify(expr)}`);
  return value;
}

function call(name: string, args: unknown[], failed: boolean): unknown {
  if (name === 'always') return true;
  if (name === 'success') return !failed;
  if (name === 'failure') return failed;
  if (name === 'contains')
    return String(args[0] ?? '')
      .toLowerCase()
      .includes(String(args[1] ?? '').toLowerCase());
  if (name === 'startsWith')
    return String(args[0] ?? '')
      .toLowerCase()
      .startsWith(String(args[1] ?? '').toLowerCase());
  throw new Error(`the workflow runner does not know the function ${name}()`);
}
