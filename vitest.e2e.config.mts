import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

// End-to-end tests: a real Chromium (Debian's /usr/bin/chromium) against the built web app served by Express.
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('.', import.meta.url)).replace(/\/$/, '') } },
  test: {
    include: ['test/e2e/**/*.e2e.ts'],
    environment: 'node',
    testTimeout: 120_000,
    hookTimeout: 180_000,
    pool: 'forks',
    maxWorkers: 1,
    fileParallelism: false,
    globalSetup: ['test/e2e/support/global-app.ts'],
    env: { NODE_ENV: 'test' },
  },
});
