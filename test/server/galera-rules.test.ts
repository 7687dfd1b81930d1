import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

// Galera replicates row by row and certifies each transaction on commit, which sets rules for the schema and the code.
let db: TestDatabase;

beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? sourceFiles(full) : /\.(ts|tsx|sql)$/.test(entry.name) ? [full] : [];
  });
}

describe('the schema and code follow Galera’s rules', () => {
  it('gives every table a primary key', async () => {
    // MariaDB KB, Galera Cluster known limitations: all tables should have a primary key (rows without one are replicated unreliably)
    const missing = await db.rootQuery<{ name: string }[]>(
      `SELECT t.TABLE_NAME AS name FROM information_schema.TABLES t
        LEFT JOIN information_schema.TABLE_CONSTRAINTS c
          ON c.TABLE_SCHEMA = t.TABLE_SCHEMA AND c.TABLE_NAME = t.TABLE_NAME AND c.CONSTRAINT_TYPE = 'PRIMARY KEY'
        WHERE t.TABLE_SCHEMA = ? AND t.TABLE_TYPE = 'BASE TABLE' AND c.CONSTRAINT_NAME IS NULL`,
      [db.name],
    );
    const tables = await db.rootQuery<unknown[]>("SELECT 1 FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? AND TABLE_TYPE = 'BASE TABLE'", [db.name]);
    expect(tables.length).toBeGreaterThan(10);
    expect(missing.map((r) => r.name)).toEqual([]);
  });

  it('gives every table the InnoDB engine, the only one Galera replicates', async () => {
    // MariaDB KB, Galera Cluster known limitations: replication works only with the InnoDB storage engine
    const others = await db.rootQuery<{ name: string; engine: string }[]>(
      "SELECT TABLE_NAME AS name, ENGINE AS engine FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? AND TABLE_TYPE = 'BASE TABLE' AND ENGINE <> 'InnoDB'",
      [db.name],
    );
    expect(others.map((r) => `${r.name} (${r.engine})`)).toEqual([]);
  });

  it('uses no LOCK TABLES, GET_LOCK or other lock that Galera does not carry across nodes', () => {
    // MariaDB KB, Galera Cluster known limitations: LOCK TABLES, FLUSH TABLES {tables} WITH READ LOCK, GET_LOCK() and RELEASE_LOCK() are not supported
    const banned = /\b(LOCK\s+TABLES?|GET_LOCK|RELEASE_LOCK|IS_FREE_LOCK|WITH\s+READ\s+LOCK)\b/i;
    const files = ['server', 'scripts', 'shared'].flatMap((dir) => sourceFiles(path.resolve(dir)));
    expect(files.length).toBeGreaterThan(50);
    // Comments may name them (to say they are not used); code may not.
    const comment = /^\s*(\/\/|\/\*|\*|--)/;
    const hits = files.flatMap((file) =>
      fs.readFileSync(file, 'utf8').split('\n').flatMap((line, i) => (banned.test(line) && !comment.test(line) ? [`${path.relative(process.cwd(), file)}:${i + 1}: ${line.trim()}`] : [])),
    );
    expect(hits).toEqual([]);
  });
});
