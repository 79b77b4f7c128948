// Retry-After semantics from RFC 9110 section 10.2.3: either delay-seconds or an HTTP-date; GitHub's
// rate-limit rules from its REST documentation ("Rate limits for the REST API").
import { describe, expect, it } from 'vitest';
import { MAX_RETRY_AFTER, rateLimitWait, retryAfterSeconds } from '../../src/github/retry-after.js';

const e429 = (headers: Record<string, string> = {}, message = 'Too Many Requests') => ({
  status: 429,
  message,
  response: { headers },
});
const now = Date.parse('2026-04-01T12:00:00Z');

describe('retryAfterSeconds', () => {
  it('reads delay-seconds', () => expect(retryAfterSeconds(e429({ 'retry-after': '7' }), 0, now)).toBe(7));
  it('reads an HTTP-date (IMF-fixdate) as seconds from now', () => {
    expect(retryAfterSeconds(e429({ 'retry-after': 'Wed, 01 Apr 2026 12:00:05 GMT' }), 0, now)).toBe(5);
  });
  it('backs off 1, 4, 9 units without the header', () => {
    expect([0, 1, 2].map((a) => retryAfterSeconds(e429(), a, now))).toEqual([1, 4, 9]);
  });
  it('honours GitHub rate-limit answers as documented: retry-after, else x-ratelimit-reset, else a minute and growing', () => {
    // "Rate limits for the REST API", "Exceeding the rate limit" (docs.github.com)
    const secondary = (headers: Record<string, string>, status = 403) => ({
      status,
      message: 'You have exceeded a secondary rate limit. Please wait a few minutes before you try again.',
      response: { headers },
    });
    expect(rateLimitWait(secondary({ 'retry-after': '30' }), 0, now)).toBe(30);
    expect(rateLimitWait(secondary({ 'retry-after': '30' }, 429), 0, now)).toBe(30);
    // x-ratelimit-remaining 0: until x-ratelimit-reset (UTC epoch seconds), one second after it
    expect(
      rateLimitWait(secondary({ 'x-ratelimit-remaining': '0', 'x-ratelimit-reset': String(now / 1000 + 40) }), 0, now),
    ).toBe(41);
    expect(
      rateLimitWait(e429({ 'x-ratelimit-remaining': '0', 'x-ratelimit-reset': String(now / 1000 + 5) }), 0, now),
    ).toBe(6);
    // neither header: at least one minute, exponentially longer on repeats
    expect([0, 1, 2].map((a) => rateLimitWait(secondary({}), a, now))).toEqual([60, 120, 240]);
    // a 403 that is no rate limit (a missing permission) and other statuses are not waited on
    expect(
      rateLimitWait(
        { status: 403, message: 'Resource not accessible by integration', response: { headers: {} } },
        0,
        now,
      ),
    ).toBeUndefined();
    expect(rateLimitWait({ status: 503 }, 0, now)).toBeUndefined();
    // the plugin gives up rather than wait past MAX_RETRY_AFTER
    expect(retryAfterSeconds(secondary({ 'retry-after': '30' }), 0, now)).toBe(30);
    expect(retryAfterSeconds(secondary({}), 2, now)).toBeUndefined(); // 240 s asked, over MAX_RETRY_AFTER
  });
  it('refuses to stall the job on a very long ask', () => {
    expect(retryAfterSeconds(e429({ 'retry-after': String(MAX_RETRY_AFTER + 1) }), 0, now)).toBeUndefined();
  });
});
