/**
 * An octokit plugin for the waits GitHub asks for, and a time limit on every request.
 *
 * Rate limits, as GitHub documents them ("Rate limits for the REST API", "Exceeding the rate
 * limit"): a 403 or 429 that says it exceeded a secondary rate limit, or whose
 * x-ratelimit-remaining is 0, or a 429 at all. Wait as retry-after says (seconds or an HTTP date);
 * else, when x-ratelimit-remaining is 0, until x-ratelimit-reset (UTC epoch seconds); else, for a
 * secondary limit, at least a minute, growing with each retry; a plain 429 without hints waits
 * 1, 4, 9 ... units. A wait longer than MAX_RETRY_AFTER fails at once rather than stall the job
 * (the error keeps the wait asked for, see rateLimitWait). @octokit/plugin-retry leaves 403 and 429
 * alone (they are in its doNotRetry list) and plugin-throttling's own retries are turned off, so
 * every rate-limit wait happens here, once.
 *
 * Time limit: each try gets its own abort signal; a try that has no answer in time becomes a 504,
 * which plugin-retry retries like any server error. Registered first, the plugin wraps the request
 * innermost, below both plugins.
 */
/** Knobs of the retries; tests use tiny intervals. Times in milliseconds. */
export interface RetryTuning {
  retries: number;
  /** Multiplies plugin-retry's backoff steps (1, 4, 9 ... units) and Retry-After seconds. */
  unitMs: number;
  /** Time limit of one try of a request (default 30 s). */
  timeoutMs?: number;
}

/** Longest wait honoured, in seconds; a longer ask fails now. */
export const MAX_RETRY_AFTER = 120;

/** Default time limit of one try of a request. */
export const REQUEST_TIMEOUT_MS = 30_000;

interface ErrorLike {
  status?: number;
  message?: string;
  response?: { headers?: Record<string, string | undefined>; data?: unknown };
}

/**
 * The seconds GitHub asks to wait before `error` may be retried, or undefined when it is not a
 * rate limit. `attempt` counts the tries made (0 for the first failure).
 * @example rateLimitWait({ status: 403, message: 'You have exceeded a secondary rate limit', response: { headers: { 'retry-after': '30' } } }, 0, Date.now()) // 30
 */
export function rateLimitWait(error: unknown, attempt: number, now: number): number | undefined {
  const e = error as ErrorLike | null;
  if (e?.status !== 403 && e?.status !== 429) return undefined;
  const headers = e.response?.headers ?? {};
  const said = `${e.message ?? ''} ${JSON.stringify(e.response?.data ?? '')}`;
  const secondary = /secondary rate limit/i.test(said);
  const exhausted = headers['x-ratelimit-remaining'] === '0';
  const raw = headers['retry-after'];
  if (e.status === 403 && !secondary && !exhausted && raw === undefined) return undefined;
  if (raw !== undefined) {
    const seconds = /^\s*\d+\s*$/.test(raw) ? Number(raw) : Math.ceil((Date.parse(raw) - now) / 1000);
    if (Number.isFinite(seconds)) return Math.max(0, seconds);
  }
  if (exhausted) {
    const reset = Number(headers['x-ratelimit-reset']);
    if (Number.isFinite(reset) && reset > 0) return Math.max(0, Math.ceil(reset - now / 1000) + 1);
  }
  if (secondary) return 60 * 2 ** Math.min(attempt, 4);
  return (attempt + 1) ** 2;
}

/**
 * The wait this plugin honours: rateLimitWait, unless it is over MAX_RETRY_AFTER (undefined: give up).
 * @example retryAfterSeconds({ status: 429, response: { headers: { 'retry-after': '3' } } }, 0, Date.now()) // 3
 */
export function retryAfterSeconds(error: unknown, attempt: number, now: number): number | undefined {
  const wait = rateLimitWait(error, attempt, now);
  return wait === undefined || wait > MAX_RETRY_AFTER ? undefined : wait;
}

type Request = (options: unknown) => Promise<unknown>;
interface Hookable {
  hook: { wrap(name: 'request', fn: (request: Request, options: unknown) => Promise<unknown>): void };
}

/**
 * The plugin, for getOctokit(token, options, honourRetryAfter(tuning, log), retry, throttling).
 * Waits are `seconds x tuning.unitMs` (1000 in production; tests pass milliseconds).
 * @example getOctokit(token, {}, honourRetryAfter({ retries: 3, unitMs: 1000 }))
 */
export function honourRetryAfter(tuning: RetryTuning, log: (message: string) => void = () => undefined) {
  const timeoutMs = tuning.timeoutMs ?? REQUEST_TIMEOUT_MS;
  return (octokit: Hookable): void => {
    octokit.hook.wrap('request', async (request, options) => {
      for (let attempt = 0; ; attempt++) {
        try {
          return await timed(request, options, timeoutMs);
        } catch (error) {
          const wait = attempt < tuning.retries ? retryAfterSeconds(error, attempt, Date.now()) : undefined;
          if (wait === undefined) throw error;
          const o = options as { method?: string; url?: string };
          log(
            `GitHub asked to wait ${wait} s before ${o.method ?? ''} ${o.url ?? ''} (retry ${attempt + 1} of ${tuning.retries})`,
          );
          await new Promise((r) => setTimeout(r, wait * tuning.unitMs));
        }
      }
    });
  };
}

/** One try with its own time limit; no answer in time is a 504 that plugin-retry retries. */
async function timed(request: Request, options: unknown, timeoutMs: number): Promise<unknown> {
  const o = options as { request?: Record<string, unknown>; method?: string; url?: string };
  const signal = AbortSignal.timeout(timeoutMs);
  try {
    return await request({ ...o, request: { ...o.request, signal } });
  } catch (error) {
    if (!signal.aborted) throw error;
    throw Object.assign(
      new Error(`${o.method ?? ''} ${o.url ?? ''}: no answer within ${Math.round(timeoutMs / 1000)} s`),
      {
        name: 'HttpError',
        status: 504,
        request: o,
      },
    );
  }
}
