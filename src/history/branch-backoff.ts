/**
 * The wait before retry number `attempt` (0-based): the server's Retry-After when it gave one
 * (seconds, scaled by unitMs / 1000 so tests wait milliseconds), else "full jitter" exponential
 * backoff, unitMs * 2^attempt * (0.5 + random), capped at 60 units. Randomness is passed in so tests
 * are repeatable; jitter spreads writers that collided so they do not collide again in step.
 * @example backoffMs(2, 100, () => 0.5) // 400
 */
export function backoffMs(attempt: number, unitMs: number, random: () => number, retryAfterSeconds?: number): number {
  const cap = 60 * unitMs;
  if (retryAfterSeconds !== undefined) return Math.min(cap, retryAfterSeconds * unitMs);
  return Math.min(cap, unitMs * 2 ** Math.min(attempt, 16) * (0.5 + random()));
}
