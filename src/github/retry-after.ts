/**
 * An octokit plugin that retries plain 429 answers, waiting as long as their Retry-After header
 * says (seconds, or an HTTP date), else a growing backoff. @octokit/plugin-retry retries 429 on its
 * own schedule without reading the header, and plugin-throttling only takes 429s that GitHub marks
 * as rate limits (a "secondary rate limit" message or x-ratelimit-remaining: 0), so this covers the
 * rest; it leaves those marked ones to plugin-throttling. Registered first, it wraps the request
 * innermost, below both plugins.
 */
import type { RetryTuning } from './api.js';

/** Longest wait honoured, in Retry-After seconds; a longer ask fails now rather than stall the job. */
export const MAX_RETRY_AFTER = 60;

interface ErrorLike {
  status?: number;
  message?: string;
  response?: { headers?: Record<string, string | undefined> };
}

/**
 * Seconds to wait before retrying `error`, or undefined when it is not this plugin's to retry.
 * @example retryAfterSeconds({ status: 429, response: { headers: { 'retry-after': '3' } } }, 0, Date.now()) // 3
 */
export function retryAfterSeconds(error: unknown, attempt: number, now: number): number | undefined {
  const e = error as ErrorLike | null;
  if (e?.status !== 429) return undefined;
  const headers = e.response?.headers ?? {};
  if (/\bsecondary rate\b/i.test(e.message ?? '') || headers['x-ratelimit-remaining'] === '0') return undefined;
  const raw = headers['retry-after'];
  if (raw === undefined) return (attempt + 1) ** 2;
  const seconds = /^\d+$/.test(raw.trim()) ? Number(raw) : Math.ceil((Date.parse(raw) - now) / 1000);
  if (!Number.isFinite(seconds)) return (attempt + 1) ** 2;
  if (seconds > MAX_RETRY_AFTER) return undefined;
  return Math.max(0, seconds);
}

type Request = (options: unknown) => Promise<unknown>;
interface Hookable {
  hook: { wrap(name: 'request', fn: (request: Request, options: unknown) => Promise<unknown>): void };
}

/**
 * The plugin, for getOctokit(token, options, honourRetryAfter(tuning), retry, throttling).
 * @example getOctokit(token, {}, honourRetryAfter({ retries: 3, unitMs: 1000 }))
 */
export function honourRetryAfter(tuning: RetryTuning) {
  return (octokit: Hookable): void => {
    octokit.hook.wrap('request', async (request, options) => {
      for (let attempt = 0; ; attempt++) {
        try {
          return await request(options);
        } catch (error) {
          const wait = attempt < tuning.retries ? retryAfterSeconds(error, attempt, Date.now()) : undefined;
          if (wait === undefined) throw error;
          await new Promise((r) => setTimeout(r, wait * tuning.unitMs));
        }
      }
    });
  };
}
