/**
 * A loopback fault injector that sits in front of a stand-in: a fixed share of requests, drawn from
 * a seeded PRNG, go wrong in one of the ways a real API does — 500, 502, 429 with Retry-After, the
 * connection dropped before or after the request reached the server, a body cut short after the
 * server acted, or an answer slower than the client's timeout (the request still reaches the
 * server afterwards, so a write may land after the client gave up). Everything else is forwarded
 * unchanged. Counts what it injected. Binds 127.0.0.1 only; close() cancels pending slow answers.
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { seededUniform as seededRandom } from '../../model/random.js';

export const FAULT_KINDS = ['500', '502', '429', 'drop-before', 'drop-after', 'truncate', 'slow'] as const;
export type FaultKind = (typeof FAULT_KINDS)[number];

export interface FaultProxyOptions {
  /** Base URL of the server behind the proxy. */
  target: string;
  /** Share of requests that get a fault, 0..1. */
  rate: number;
  seed: number;
  kinds?: readonly FaultKind[];
  /** Delay of a `slow` answer (choose it above the client's timeout). */
  slowMs?: number;
  /** Retry-After seconds sent with 429. */
  retryAfter?: number;
}

export interface FaultProxy {
  url: string;
  /** Requests seen and faults injected, by kind. */
  requests: number;
  injected: Map<FaultKind, number>;
  /** Set false to pass everything through (e.g. while checking results). */
  enabled: boolean;
  totalInjected(): number;
  close(): Promise<void>;
}

const PASSED_HEADERS = ['content-type', 'retry-after', 'location', 'x-ratelimit-remaining'];

export async function startFaultProxy(options: FaultProxyOptions): Promise<FaultProxy> {
  const random = seededRandom(options.seed);
  const kinds = options.kinds ?? FAULT_KINDS;
  const timers = new Set<NodeJS.Timeout>();
  let closed = false;

  async function forward(
    req: IncomingMessage,
    body: Buffer,
  ): Promise<{ status: number; headers: Record<string, string>; bytes: Buffer }> {
    const headers: Record<string, string> = {};
    for (const name of ['authorization', 'content-type', 'accept', 'x-github-api-version', 'user-agent']) {
      const v = req.headers[name];
      if (typeof v === 'string') headers[name] = v;
    }
    const res = await fetch(`${options.target}${req.url ?? '/'}`, {
      method: req.method ?? 'GET',
      headers,
      redirect: 'manual',
      ...(body.length > 0 ? { body } : {}),
    });
    const out: Record<string, string> = {};
    for (const name of PASSED_HEADERS) {
      const v = res.headers.get(name);
      if (v !== null) out[name] = v;
    }
    return { status: res.status, headers: out, bytes: Buffer.from(await res.arrayBuffer()) };
  }

  const proxy: FaultProxy = {
    url: '',
    requests: 0,
    injected: new Map(),
    enabled: true,
    totalInjected: () => [...proxy.injected.values()].reduce((a, b) => a + b, 0),
    close: () =>
      new Promise<void>((r) => {
        closed = true;
        for (const t of timers) clearTimeout(t);
        server.closeAllConnections();
        server.close(() => r());
      }),
  };

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const body = Buffer.concat(chunks);
    proxy.requests += 1;
    const kind = proxy.enabled && random() < options.rate ? kinds[Math.floor(random() * kinds.length)] : undefined;
    if (kind) proxy.injected.set(kind, (proxy.injected.get(kind) ?? 0) + 1);
    if (kind === '500' || kind === '502' || kind === '429') {
      const headers: Record<string, string> = { 'content-type': 'application/json' };
      if (kind === '429') headers['retry-after'] = String(options.retryAfter ?? 1);
      res.writeHead(Number(kind), headers);
      res.end(
        JSON.stringify({ message: kind === '429' ? 'You have exceeded a secondary rate limit' : 'Server Error' }),
      );
      return;
    }
    if (kind === 'drop-before') {
      req.socket.destroy();
      return;
    }
    if (kind === 'slow') {
      await new Promise<void>((r) => {
        const t = setTimeout(() => (timers.delete(t), r()), options.slowMs ?? 1000);
        timers.add(t);
      });
      if (closed) return;
    }
    const answer = await forward(req, body);
    if (kind === 'drop-after') {
      req.socket.destroy();
      return;
    }
    res.writeHead(answer.status, { ...answer.headers, 'content-length': String(answer.bytes.length) });
    if (kind === 'truncate' && answer.bytes.length > 1) {
      res.write(answer.bytes.subarray(0, Math.floor(answer.bytes.length / 2)));
      req.socket.destroy();
      return;
    }
    res.end(answer.bytes);
  }

  const server = createServer((req, res) => {
    handle(req, res).catch(() => req.socket.destroy());
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  proxy.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return proxy;
}
