import { defineConfig } from 'vitest/config';

// Browser journeys: playwright-core drives Debian's chromium against the running app (BASE_URL).
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
