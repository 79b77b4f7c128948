/**
 * Downloads from a signed storage URL (no token: the URL carries its own signature), retrying
 * network errors and 5xx with a short backoff, and stopping at a size cap.
 */
import type { RetryTuning } from './api.js';

/**
 * @throws Error naming the status or the cap when the download fails for good.
 * @example await fetchCapped('https://blob.example/x.zip?sig=...', 1 << 20, { retries: 3, unitMs: 1000 })
 */
export async function fetchCapped(url: string, maxBytes: number, tuning: RetryTuning): Promise<Uint8Array> {
  let last: unknown;
  for (let attempt = 0; attempt <= tuning.retries; attempt++) {
    if (attempt > 0) await new Promise((r) => setTimeout(r, attempt * attempt * tuning.unitMs));
    let res: Response;
    try {
      res = await fetch(url, { redirect: 'follow' });
    } catch (cause) {
      last = cause;
      continue;
    }
    if (res.status >= 500 || res.status === 429) {
      last = new Error(`storage answered ${res.status}`);
      await res.body?.cancel();
      continue;
    }
    if (!res.ok || !res.body) throw new Error(`storage answered ${res.status}`);
    const declared = Number(res.headers.get('content-length') ?? '0');
    if (declared > maxBytes) {
      await res.body.cancel();
      throw new Error(`artifact is ${declared} bytes, over the ${maxBytes} byte cap`);
    }
    return readCapped(res.body, maxBytes);
  }
  throw new Error(
    `storage download failed after ${tuning.retries + 1} tries: ${last instanceof Error ? last.message : String(last)}`,
  );
}

/** Reads a byte stream to its end, failing as soon as it passes `maxBytes`. */
export async function readCapped(stream: ReadableStream<Uint8Array>, maxBytes: number): Promise<Uint8Array> {
  const reader = stream.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > maxBytes) {
      await reader.cancel();
      throw new Error(`download passed the ${maxBytes} byte cap`);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}
