import mariadb from 'mariadb';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { APPEND_ONLY_TABLES, privilegesFor } from '@/server/db-privileges';
import { createOrganisation, setupTestApp, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { insertTag } from '@/test/server/support/tag-fixtures';

// Every statement here runs on t.db.sequelize: the server's own account, exactly as the running product connects.
let t: TestApp;
const run = (sql: string) => t.db.sequelize.query(sql);
const DENIED = /command denied|Access denied/;

beforeAll(async () => {
  t = await setupTestApp();
});
afterAll(async () => {
  await t.close();
});

describe("the server's database account", () => {
  it('cannot TRUNCATE the tag events, which would fire no delete trigger', async () => {
    // common practice, no published source: the application's account holds least privilege, so a compromised server cannot rewrite history
    await expect(run('TRUNCATE TABLE tag_events')).rejects.toThrow(DENIED);
  });

  it('cannot drop, create or replace the triggers that guard the history', async () => {
    await expect(run('DROP TRIGGER tag_events_no_update')).rejects.toThrow(DENIED);
    await expect(run('DROP TRIGGER audit_events_no_delete')).rejects.toThrow(DENIED);
    await expect(run('CREATE TRIGGER tags_sneak BEFORE UPDATE ON tags FOR EACH ROW SET NEW.reason = OLD.reason')).rejects.toThrow(DENIED);
  });

  it('cannot delete or update rows of any history table, only read and append', async () => {
    const existing = await t.db.rootQuery<{ name: string }[]>('SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ?', [t.db.name]);
    const history = APPEND_ONLY_TABLES.filter((table) => existing.some((e) => e.name === table));
    expect(history).toEqual(expect.arrayContaining(['audit_events', 'tag_events', 'tag_points', 'readings']));
    for (const table of history) {
      await expect(run(`DELETE FROM ${table}`), table).rejects.toThrow(DENIED);
      await expect(run(`UPDATE ${table} SET id = id`), table).rejects.toThrow(DENIED);
      await expect(run(`SELECT COUNT(*) FROM ${table}`), table).resolves.toBeDefined();
    }
    await run("INSERT INTO audit_events (type, created_at) VALUES ('sign-in', NOW(3))");
    const [row] = await t.db.rootQuery<{ n: number }[]>("SELECT COUNT(*) AS n FROM audit_events WHERE type = 'sign-in'");
    expect(Number(row.n)).toBe(1);
  });

  it("cannot rewrite a tag's reason or holder's story, nor bring a cleared tag back to live", async () => {
    const { organisation, users } = await createOrganisation('priv');
    const { boiler } = await createSiteWithAssets(organisation.id, users.admin.id);
    const now = new Date();
    const live = await insertTag({ organisationId: organisation.id, assetId: boiler.id, holderId: users.engineer.id, now, expiresInHours: 4 });
    const cleared = await insertTag({ organisationId: organisation.id, assetId: boiler.id, holderId: users.engineer.id, now, expiresInHours: 4, status: 'cleared' });
    // OSHA 29 CFR 1910.147(c)(5)(ii)(D): the device identifies who applied it and why; the record of it must not be rewritten
    await expect(run(`UPDATE tags SET reason = 'nothing to see' WHERE id = ${live.id}`)).rejects.toThrow(/identity/);
    await expect(run(`UPDATE tags SET raised_by_id = ${users.engineer2.id} WHERE id = ${live.id}`)).rejects.toThrow(/identity/);
    // OSHA 29 CFR 1910.147(e)(3): once released, a tag is not put back without a new application
    await expect(run(`UPDATE tags SET status = 'live' WHERE id = ${cleared.id}`)).rejects.toThrow(/cleared/);
    await expect(run(`DELETE FROM tags WHERE id = ${live.id}`)).rejects.toThrow();
    const rows = await t.db.rootQuery<{ reason: string; status: string }[]>('SELECT reason, status FROM tags WHERE id IN (?, ?) ORDER BY id', [live.id, cleared.id]);
    expect(rows.map((r) => [r.reason, r.status])).toEqual([['Planned maintenance', 'live'], ['Planned maintenance', 'cleared']]);
  });

  it('holds no DDL: no CREATE, ALTER or DROP of tables, and no LOCK TABLES', async () => {
    await expect(run('CREATE TABLE scratch (id INT PRIMARY KEY)')).rejects.toThrow(DENIED);
    await expect(run('ALTER TABLE tags DROP COLUMN reason')).rejects.toThrow(DENIED);
    await expect(run('DROP TABLE tag_points')).rejects.toThrow(DENIED);
    await expect(run('LOCK TABLES tags WRITE')).rejects.toThrow(DENIED);
    await expect(run(`GRANT DELETE ON ${t.db.name}.tag_events TO CURRENT_USER`)).rejects.toThrow(DENIED);
  });

  it('holds exactly the privileges of the grant list on every table, and nothing on the database as a whole', async () => {
    const [account] = await t.db.sequelize.query<{ u: string }>('SELECT CURRENT_USER() AS u', { type: QueryTypes.SELECT });
    const grantee = `'${account.u.replace('@', "'@'")}'`;
    const grants = await t.db.rootQuery<{ table: string; privilege: string }[]>(
      'SELECT TABLE_NAME AS `table`, PRIVILEGE_TYPE AS privilege FROM information_schema.TABLE_PRIVILEGES WHERE GRANTEE = ? AND TABLE_SCHEMA = ?',
      [grantee, t.db.name],
    );
    const tables = await t.db.rootQuery<{ name: string }[]>("SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? AND TABLE_TYPE = 'BASE TABLE'", [t.db.name]);
    expect(tables.length).toBeGreaterThan(10);
    for (const { name } of tables) {
      expect(grants.filter((g) => g.table === name).map((g) => g.privilege).sort(), name).toEqual([...privilegesFor(name)].sort());
    }
    const schemaWide = await t.db.rootQuery<unknown[]>('SELECT * FROM information_schema.SCHEMA_PRIVILEGES WHERE GRANTEE = ?', [grantee]);
    expect([...schemaWide]).toEqual([]);
  });
});

describe('the private MariaDB', () => {
  it('refuses a root login over TCP without a password', async () => {
    await expect(mariadb.createConnection({ host: '127.0.0.1', port: t.db.port, user: 'root', connectTimeout: 3000 })).rejects.toThrow(/Access denied/);
  });

  it('flushes InnoDB at every commit and keeps a binary log synced at every commit', async () => {
    const [settings] = await t.db.rootQuery<Record<string, number>[]>('SELECT @@innodb_flush_log_at_trx_commit AS flush, @@log_bin AS binlog, @@sync_binlog AS sync');
    // MariaDB KB, innodb_flush_log_at_trx_commit: 1 writes and flushes the log at each commit (full ACID)
    expect(Number(settings.flush)).toBe(1);
    expect(Number(settings.binlog)).toBe(1);
    // MariaDB KB, sync_binlog: 1 syncs the binary log to disk after every write
    expect(Number(settings.sync)).toBe(1);
  });
});
