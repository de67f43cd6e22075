/**
 * End-to-end tests in real headless Chromium against the production build. Kept apart from the
 * unit tests (vite.config.ts) because they need a build, a server and a browser: one file at a
 * time, in one fork, with long timeouts for a slow first build on a small machine.
 */
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/e2e/**/*.e2e.test.ts'],
    environment: 'node',
    globalSetup: ['test/e2e/globalSetup.ts'],
    pool: 'forks',
    maxWorkers: 1,
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 300_000,
  },
});
