/**
 * A loopback stand-in for the Actions results service that @actions/artifact v6 talks to: the
 * Twirp JSON endpoints CreateArtifact and FinalizeArtifact of
 * github.actions.results.api.v1.ArtifactService (as node_modules/@actions/artifact/lib/generated
 * defines them: snake_case fields, `signed_upload_url`, `artifact_id`). CreateArtifact answers a
 * signed Azurite blob URL the client uploads to for real; FinalizeArtifact registers the blob in
 * the REST stand-in, whose download then redirects to a read-signed URL of that same blob.
 * Names are unique per workflow run, as on GitHub (a second CreateArtifact of a name is a 409);
 * ListArtifacts and DeleteArtifact (what @actions/artifact's deleteArtifact calls with the runtime
 * token) find and remove an artifact of the run by name.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { BlobSASPermissions, generateBlobSASQueryParameters, SASProtocol } from '@azure/storage-blob';
import type { Azurite } from './azurite.js';
import type { RestStandin } from './rest-api.js';

const SERVICE = '/twirp/github.actions.results.api.v1.ArtifactService/';
const CONTAINER = 'actions-results';

/** What the stand-in knows about a workflow run that uploads (GitHub knows it from the run). */
export interface RunRecord {
  workflowRunId: number;
  headBranch: string;
  headRepositoryId: number;
  repositoryId: number;
}

export interface ResultsStandin {
  url: string;
  /** Registers a run and returns the ACTIONS_RUNTIME_TOKEN its jobs get. */
  tokenFor(run: RunRecord): string;
  calls: { method: string; name?: string; status: number; expiresAt?: string }[];
  close(): Promise<void>;
}

/** A JWT shaped like the runner's: only the `scp` claim matters (Actions.Results:<run>:<job>). */
export function runtimeToken(runBackendId: string, jobBackendId: string): string {
  const part = (o: unknown) => Buffer.from(JSON.stringify(o)).toString('base64url');
  return `${part({ alg: 'none', typ: 'JWT' })}.${part({ scp: `Actions.GenericRead:00000000 Actions.Results:${runBackendId}:${jobBackendId}`, exp: 4102444800 })}.c2ln`;
}

export async function startResultsStandin(azurite: Azurite, rest: RestStandin): Promise<ResultsStandin> {
  const container = azurite.service.getContainerClient(CONTAINER);
  await container.createIfNotExists();
  const runs = new Map<string, RunRecord>();
  const tokens = new Set<string>();
  const created = new Map<string, string>(); // `${run}/${name}` -> blob name
  const finalized = new Map<string, { id: number; size: number; at: string }>(); // `${run}/${name}` -> artifact
  const calls: ResultsStandin['calls'] = [];

  const sas = (blob: string, permissions: string) =>
    `${container.getBlockBlobClient(blob).url}?${generateBlobSASQueryParameters(
      {
        containerName: CONTAINER,
        blobName: blob,
        permissions: BlobSASPermissions.parse(permissions),
        expiresOn: new Date(Date.now() + 3_600_000),
        protocol: SASProtocol.HttpsAndHttp,
      },
      azurite.credential,
    ).toString()}`;

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    // eslint-disable-next-line prefer-const -- set once the body has arrived; reply() may run before that
    let body: Record<string, string> | undefined;
    const reply = (status: number, answer: unknown, name?: string) => {
      const expiresAt = body?.expires_at;
      calls.push({
        method: (req.url ?? '').slice(SERVICE.length),
        status,
        ...(name === undefined ? {} : { name }),
        ...(expiresAt ? { expiresAt } : {}),
      });
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(answer));
    };
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const auth = req.headers.authorization ?? '';
    if (!tokens.has(auth.replace(/^Bearer /, '')))
      return reply(401, { code: 'unauthenticated', msg: 'bad runtime token' });
    body = JSON.parse(Buffer.concat(chunks).toString('utf8') || '{}') as Record<string, string>;
    const runId = body.workflow_run_backend_id ?? '';
    const run = runs.get(runId);
    const name = body.name ?? '';
    if (!run) return reply(404, { code: 'not_found', msg: 'unknown workflow run' }, name);
    const key = `${runId}/${name}`;
    if (req.url === `${SERVICE}CreateArtifact`) {
      if (created.has(key))
        return reply(
          409,
          { code: 'already_exists', msg: 'an artifact with this name already exists on the workflow run' },
          name,
        );
      const blob = `${runId}/${encodeURIComponent(name)}.zip`;
      created.set(key, blob);
      return reply(200, { ok: true, signed_upload_url: sas(blob, 'cw') }, name);
    }
    if (req.url === `${SERVICE}FinalizeArtifact`) {
      const blob = created.get(key);
      if (!blob) return reply(404, { code: 'not_found', msg: 'artifact was not created' }, name);
      const props = await container.getBlockBlobClient(blob).getProperties();
      const id = rest.state.nextId++;
      rest.state.artifacts.push({
        id,
        name,
        createdAt: new Date().toISOString(),
        expired: false,
        headBranch: run.headBranch,
        headRepositoryId: run.headRepositoryId,
        repositoryId: run.repositoryId,
        workflowRunId: run.workflowRunId,
        sizeInBytes: props.contentLength ?? Number(body.size ?? 0),
        location: sas(blob, 'r'),
      });
      finalized.set(key, { id, size: props.contentLength ?? Number(body.size ?? 0), at: new Date().toISOString() });
      return reply(200, { ok: true, artifact_id: String(id) }, name);
    }
    if (req.url === `${SERVICE}ListArtifacts`) {
      const filter = (body as Record<string, unknown>).name_filter;
      const artifacts = [...finalized]
        .filter(([k]) => k.startsWith(`${runId}/`) && (filter === undefined || k === `${runId}/${String(filter)}`))
        .map(([k, a]) => ({
          workflow_run_backend_id: runId,
          workflow_job_run_backend_id: body?.workflow_job_run_backend_id ?? '',
          database_id: String(a.id),
          name: k.slice(runId.length + 1),
          size: String(a.size),
          created_at: a.at,
        }));
      return reply(200, { artifacts }, typeof filter === 'string' ? filter : undefined);
    }
    if (req.url === `${SERVICE}DeleteArtifact`) {
      const a = finalized.get(key);
      if (!a) return reply(404, { code: 'not_found', msg: 'artifact not found' }, name);
      finalized.delete(key);
      created.delete(key);
      rest.state.artifacts = rest.state.artifacts.filter((x) => x.id !== a.id);
      return reply(200, { ok: true, artifact_id: String(a.id) }, name);
    }
    reply(404, { code: 'bad_route', msg: `no handler for ${req.url}` });
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((e: unknown) => {
      res.writeHead(500, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ code: 'internal', msg: String(e) }));
    });
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    url,
    calls,
    tokenFor(run) {
      const runBackendId = `run-${run.workflowRunId}`;
      runs.set(runBackendId, run);
      const token = runtimeToken(runBackendId, `job-${run.workflowRunId}`);
      tokens.add(token);
      return token;
    },
    close: () =>
      new Promise<void>((r) => {
        server.closeAllConnections();
        server.close(() => r());
      }),
  };
}
