import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { freePort, startPrivateMariaDb } from '@/scripts/lib/mariadb';

declare module 'vitest' {
  export interface ProvidedContext {
    dbPort: number;
    /** The throwaway server's unix socket, through which root logs in (socket authentication). */
    dbSocket: string;
  }
}

/**
 * Starts one throwaway MariaDB (temporary data folder, free loopback port) for the whole run;
 * each test file then creates and drops its own database on it (test/setup/db.ts).
 */
export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-test-db-'));
  const port = await freePort();
  const db = await startPrivateMariaDb({ dataDir, port });
  process.env.TEST_DB_PORT = String(port);
  project.provide('dbPort', port);
  project.provide('dbSocket', db.socketPath);
  return async () => {
    await db.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
