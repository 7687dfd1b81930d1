import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Organisation } from '@/server/models/organisation.model';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

let db: TestDatabase;

beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

describe('sequelize.transaction', () => {
  it('runs a transaction that lost a deadlock again from the start, so both writers succeed once each', async () => {
    const [a, b] = [await Organisation.create({ name: 'Alder' }), await Organisation.create({ name: 'Beech' })];
    let attempts = 0;
    const pause = () => new Promise((r) => setTimeout(r, 300));
    // Each takes one row lock, then waits for the other's: InnoDB picks one victim (as Galera does at certification).
    const writer = (first: Organisation, second: Organisation, suffix: string) =>
      db.sequelize.transaction(async (transaction) => {
        attempts += 1;
        await db.sequelize.query('UPDATE organisations SET name = CONCAT(name, ?) WHERE id = ?', { replacements: [suffix, first.id], transaction });
        await pause();
        await db.sequelize.query('UPDATE organisations SET name = CONCAT(name, ?) WHERE id = ?', { replacements: [suffix, second.id], transaction });
      });
    await Promise.all([writer(a, b, '-1'), writer(b, a, '-2')]);
    // MariaDB KB, InnoDB deadlocks: one transaction is rolled back with error 1213 and may be retried
    expect(attempts).toBe(3);
    const names = (await Organisation.findAll({ where: { id: [a.id, b.id] }, order: [['id', 'ASC']] })).map((o) => o.name);
    // Each suffix once on each row: the rolled-back attempt left nothing behind.
    expect(names.map((n) => n.split('-').slice(1).sort())).toEqual([['1', '2'], ['1', '2']]);
  });
});
