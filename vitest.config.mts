import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

// Unit and API tests. API tests open their own database through test/setup/db.ts;
// scripts/test.ts starts the throwaway MariaDB and mail server and passes their ports in the environment.
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('.', import.meta.url)).replace(/\/$/, '') } },
  test: {
    include: ['test/**/*.test.ts'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 120_000,
    pool: 'forks',
    maxWorkers: 2,
    globalSetup: ['test/setup/global-db.ts'],
    env: { NODE_ENV: 'test' },
  },
});
