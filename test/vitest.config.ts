import { defineConfig } from 'vitest/config';

// Tests live in test/ and mirror src/. e2e tests start real processes and servers, so they get
// longer timeouts; speed itself is measured by `npm run bench`, never asserted here.
export default defineConfig({
  test: {
    root: new URL('..', import.meta.url).pathname,
    include: ['test/**/*.test.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
