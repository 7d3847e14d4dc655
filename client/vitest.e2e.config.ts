import { defineConfig } from 'vitest/config';

// Browser journeys: real Chromium (Debian's) driven by playwright-core against the real server, which
// `npm test` starts on E2E_BASE_URL with the test database.
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 60_000,
  },
});
