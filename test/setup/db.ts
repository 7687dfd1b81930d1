import crypto from 'node:crypto';
import mariadb from 'mariadb';
import type { Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { createSequelize, migrate } from '@/server/db';

export interface TestDatabase {
  sequelize: Sequelize;
  url: string;
  name: string;
  port: number;
  /** Runs raw SQL as root on this test database (for checks the application user could not make). */
  rootQuery: <T = unknown>(sql: string, values?: unknown[]) => Promise<T>;
  drop: () => Promise<void>;
}

/** A fresh, migrated database for one test file on the run's throwaway MariaDB. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const port = inject('dbPort');
  const name = `t_${crypto.randomBytes(6).toString('hex')}`;
  const root = await mariadb.createConnection({ host: '127.0.0.1', port, user: 'root' });
  await root.query(`CREATE DATABASE ${name} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await root.end();
  const url = `mariadb://root@127.0.0.1:${port}/${name}`;
  const sequelize = createSequelize(url);
  await migrate(sequelize);
  return {
    sequelize,
    url,
    name,
    port,
    rootQuery: async (sql, values) => {
      const conn = await mariadb.createConnection({ host: '127.0.0.1', port, user: 'root', database: name });
      try {
        return await conn.query(sql, values);
      } finally {
        await conn.end();
      }
    },
    drop: async () => {
      await sequelize.close();
      const conn = await mariadb.createConnection({ host: '127.0.0.1', port, user: 'root' });
      await conn.query(`DROP DATABASE IF EXISTS ${name}`);
      await conn.end();
    },
  };
}
