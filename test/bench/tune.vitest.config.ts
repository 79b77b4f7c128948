import { defineConfig } from 'vitest/config';

// The tune bench only (test/bench/tune.bench.ts): a measurement of minutes, kept out of `npm test`.
export default defineConfig({
  test: {
    root: new URL('../..', import.meta.url).pathname,
    include: ['test/bench/tune.bench.ts'],
    testTimeout: 3_600_000,
    pool: 'forks',
  },
});
