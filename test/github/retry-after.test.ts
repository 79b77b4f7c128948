// Retry-After semantics from RFC 9110 section 10.2.3: either delay-seconds or an HTTP-date.
import { describe, expect, it } from 'vitest';
import { MAX_RETRY_AFTER, retryAfterSeconds } from '../../src/github/retry-after.js';

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
  it('leaves GitHub rate-limit answers to plugin-throttling, and other statuses alone', () => {
    expect(
      retryAfterSeconds(e429({ 'retry-after': '1' }, 'You have exceeded a secondary rate limit'), 0, now),
    ).toBeUndefined();
    expect(retryAfterSeconds(e429({ 'x-ratelimit-remaining': '0' }), 0, now)).toBeUndefined();
    expect(retryAfterSeconds({ status: 503 }, 0, now)).toBeUndefined();
  });
  it('refuses to stall the job on a very long ask', () => {
    expect(retryAfterSeconds(e429({ 'retry-after': String(MAX_RETRY_AFTER + 1) }), 0, now)).toBeUndefined();
  });
});
