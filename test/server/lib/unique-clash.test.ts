import type { Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertWithLabelCode } from '@/server/lib/unique-clash';
import { Asset } from '@/server/models/asset.model';
import { Site } from '@/server/models/site.model';
import { generateLabelCode } from '@/shared/rules/label-code';
import { createOrganisation } from '@/test/setup/app';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

let db: TestDatabase;
let make: (plantId: string, transaction?: Transaction) => (labelCode: string) => Promise<Asset>;

beforeAll(async () => {
  db = await createTestDatabase();
  const { organisation, users } = await createOrganisation('alder');
  const site = await Site.create({ organisationId: organisation.id, name: 'Label Works', timeZone: 'UTC', clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy: users.admin.id });
  make = (plantId, transaction) => (labelCode) =>
    Asset.create({
      organisationId: organisation.id, siteId: site.id, plantRoomId: null, plantId, labelCode, name: plantId, type: 'other', system: '', energySources: [],
      manufacturer: '', model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null, nextServiceDue: null,
      notes: '', attributes: {}, createdBy: users.admin.id,
    }, { transaction });
});
afterAll(() => db.drop());

describe('insertWithLabelCode', () => {
  it('tries a new code when the unique index reports a clash, inside a transaction too', async () => {
    const taken = (await insertWithLabelCode(make('A-1'))).labelCode;
    const fresh = generateLabelCode();
    const codes = [taken, taken, fresh];
    const asset = await db.sequelize.transaction((transaction) =>
      insertWithLabelCode(make('A-2', transaction), () => codes.shift()!),
    );
    expect(asset.labelCode).toBe(fresh);
    expect(codes).toEqual([]);
    expect(await Asset.count({ where: { labelCode: taken } })).toBe(1);
  });

  it('gives up after five clashes and passes other errors straight on', async () => {
    const taken = (await Asset.findOne({ where: { plantId: 'A-1' } }))!.labelCode;
    let calls = 0;
    await expect(insertWithLabelCode(make('A-3'), () => { calls++; return taken; })).rejects.toThrow();
    expect(calls).toBe(5);
    calls = 0;
    // Same site and plant ID as A-1: a different unique index, so no retry.
    await expect(insertWithLabelCode(make('A-1'), () => { calls++; return generateLabelCode(); })).rejects.toThrow();
    expect(calls).toBe(1);
  });
});
