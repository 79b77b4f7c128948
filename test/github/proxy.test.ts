// The action's one HTTP client honours the runner's proxy: with HTTP_PROXY set (HTTPS_PROXY for
// an https API URL, the same code path in @actions/http-client), the artifact listing, the download
// and its redirect to storage, and the branch store's Git Data calls all go through the proxy.
// The proxy is a loopback forward proxy that tunnels (CONNECT, RFC 9110 section 9.3.6, which is
// how undici's ProxyAgent reaches every target) to a router that sends two invented host names to
// the loopback stand-ins. The env is set before octokit is first imported (vitest runs each test
// file in its own module graph).
import { createServer, type Server } from 'node:http';
import { connect, type AddressInfo } from 'node:net';
import { strToU8, zipSync } from 'fflate';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startGitDataStandin, type GitDataStandin } from '../e2e/standins/git-data.js';
import { startRestStandin, type RestStandin } from '../e2e/standins/rest-api.js';

let rest: RestStandin;
let git: GitDataStandin;
let proxy: Server;
let router: Server;
const seen: string[] = [];
const tunnels: string[] = [];
const saved = {
  HTTP_PROXY: process.env.HTTP_PROXY,
  GITHUB_API_URL: process.env.GITHUB_API_URL,
  NO_PROXY: process.env.NO_PROXY,
};

beforeAll(async () => {
  rest = await startRestStandin();
  git = await startGitDataStandin();
  // Behind the tunnel: origin-form requests, told apart by their Host header.
  router = createServer((req, res) => {
    const host = req.headers.host ?? '';
    const target = new URL(req.url ?? '/', `http://${host}`);
    seen.push(`${req.method} ${host}${target.pathname}`);
    const backend = host.startsWith('storage.test')
      ? rest.url
      : /\/git\/|\/merges/.test(target.pathname)
        ? git.url
        : rest.url;
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const headers: Record<string, string> = {};
      for (const name of ['authorization', 'content-type', 'accept'])
        if (typeof req.headers[name] === 'string') headers[name] = req.headers[name] as string;
      const body = Buffer.concat(chunks);
      const answer = await fetch(`${backend}${target.pathname}${target.search}`, {
        method: req.method,
        headers,
        redirect: 'manual',
        ...(body.length > 0 ? { body } : {}),
      });
      const out: Record<string, string> = {};
      for (const name of ['content-type', 'location']) {
        const v = answer.headers.get(name);
        if (v !== null) out[name] = v.replace(rest.url, 'http://storage.test');
      }
      const bytes = Buffer.from(await answer.arrayBuffer());
      res.writeHead(answer.status, { ...out, 'content-length': String(bytes.length) });
      res.end(bytes);
    });
  });
  await new Promise<void>((r) => router.listen(0, '127.0.0.1', r));
  const routerPort = (router.address() as AddressInfo).port;
  proxy = createServer((_req, res) => {
    res.writeHead(405);
    res.end();
  });
  proxy.on('connect', (req, client, head) => {
    tunnels.push(req.url ?? '');
    const upstream = connect(routerPort, '127.0.0.1', () => {
      client.write('HTTP/1.1 200 Connection Established\r\n\r\n');
      upstream.write(head);
      upstream.pipe(client);
      client.pipe(upstream);
    });
    upstream.on('error', () => client.destroy());
    client.on('error', () => upstream.destroy());
  });
  await new Promise<void>((r) => proxy.listen(0, '127.0.0.1', r));
  process.env.HTTP_PROXY = `http://127.0.0.1:${(proxy.address() as AddressInfo).port}`;
  process.env.GITHUB_API_URL = 'http://api.github.test';
  delete process.env.NO_PROXY;
});
afterAll(async () => {
  for (const [k, v] of Object.entries(saved)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
  for (const server of [proxy, router]) {
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
  }
  await rest.close();
  await git.close();
});

describe('the runner proxy', () => {
  it('carries the artifact calls, the download and its redirect to storage, and the Git Data calls', async () => {
    const { createOctokitApi } = await import('../../src/github/octokit-api.js');
    const api = createOctokitApi({
      token: 'ghs_proxied',
      baseUrl: 'http://api.github.test',
      owner: 'acme',
      repo: 'router',
      retry: { retries: 1, unitMs: 1 },
    });
    const zip = zipSync({ 'history.jsonl': strToU8('{}\n') });
    rest.state.artifacts = [
      {
        id: 7,
        name: 'h',
        createdAt: '2026-01-01T00:00:00Z',
        expired: false,
        headBranch: 'main',
        headRepositoryId: 5,
        repositoryId: 5,
        workflowRunId: 1,
        sizeInBytes: zip.length,
        zip,
      },
    ];
    expect((await api.listArtifacts('h')).map((a) => a.id)).toEqual([7]);
    expect(Buffer.from(await api.downloadArtifact(7, 1 << 20)).equals(Buffer.from(zip))).toBe(true);
    const tree = await api.gitData!.createTree([{ path: 'bellgate/x.jsonl', text: 'x\n' }]);
    const commit = await api.gitData!.createCommit('first', tree, []);
    await api.gitData!.createBranch('bellgate-data', commit);
    expect(await api.gitData!.getBranchHead('bellgate-data')).toBe(commit);
    expect(new Set(tunnels)).toEqual(new Set(['api.github.test:80', 'storage.test:80']));
    expect(seen).toEqual([
      'GET api.github.test/repos/acme/router/actions/artifacts',
      'GET api.github.test/repos/acme/router/actions/artifacts/7/zip',
      'GET storage.test/blob/7',
      'POST api.github.test/repos/acme/router/git/trees',
      'POST api.github.test/repos/acme/router/git/commits',
      'POST api.github.test/repos/acme/router/git/refs',
      'GET api.github.test/repos/acme/router/git/ref/heads/bellgate-data',
    ]);
  });
});
