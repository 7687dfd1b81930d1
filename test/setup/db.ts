import crypto from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { adminConnection } from '@/scripts/lib/mariadb';
import { provisionDatabase } from '@/scripts/lib/local-db';
import { createSequelize, prepareDatabase } from '@/server/db';

export interface TestDatabase {
  sequelize: Sequelize;
  /** The server's own restricted account, as the running product connects. */
  url: string;
  /** The migration owner's account. */
  ownerUrl: string;
  name: string;
  port: number;
  /** Runs raw SQL as root on this test database (for checks the application user could not make). */
  rootQuery: <T = unknown>(sql: string, values?: unknown[]) => Promise<T>;
  drop: () => Promise<void>;
}

/**
 * A fresh database for one test file on the run's throwaway MariaDB, set up as the product runs: migrated by an
 * owner account, then used through the server's restricted account.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  const port = inject('dbPort');
  const socketPath = inject('dbSocket');
  const suffix = crypto.randomBytes(6).toString('hex');
  const name = `t_${suffix}`;
  const password = () => crypto.randomBytes(18).toString('base64url');
  const owner = { user: `o_${suffix}`, password: password() };
  const server = { user: `s_${suffix}`, password: password() };
  const { ownerUrl, serverUrl } = await provisionDatabase({ port, socketPath }, { database: name, owner, server });
  await prepareDatabase(ownerUrl, serverUrl);
  const sequelize = createSequelize(serverUrl);
  const asRoot = async <T,>(sql: string, values?: unknown[], database?: string): Promise<T> => {
    const conn = await adminConnection(socketPath, database);
    try {
      return (await conn.query(sql, values)) as T;
    } finally {
      await conn.end();
    }
  };
  return {
    sequelize,
    url: serverUrl,
    ownerUrl,
    name,
    port,
    rootQuery: (sql, values) => asRoot(sql, values, name),
    drop: async () => {
      await sequelize.close();
      await asRoot(`DROP DATABASE IF EXISTS ${name}`);
      await asRoot(`DROP USER IF EXISTS '${owner.user}'@'127.0.0.1', '${server.user}'@'127.0.0.1'`);
    },
  };
}
