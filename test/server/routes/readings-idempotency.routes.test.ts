import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { Site } from '@/server/models/site.model';
import { generateLabelCode } from '@/shared/rules/label-code';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let u: OrgUsers;
let boiler: Asset;
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('rowan');
  u = org.users;
  const site = await Site.create({ organisationId: org.organisation.id, name: 'Rowan Works', timeZone: 'Europe/London', clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy: u.supervisor.id });
  boiler = await Asset.create({
    organisationId: org.organisation.id, siteId: site.id, plantRoomId: null, plantId: 'B-01', labelCode: generateLabelCode(), name: 'Boiler 1', type: 'boiler', system: 'LTHW 1',
    energySources: [], manufacturer: '', model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null,
    nextServiceDue: null, notes: '', attributes: { flowSetpointC: 80 }, createdBy: u.supervisor.id, archivedAt: null,
  });
  for (const k of ['engineer', 'engineer2'] as const) tok[k] = await tokenFor(t.app, u[k]);
});
afterAll(() => t.close());

const log = (who: string, key: string | null, flowTemperatureC = 78) => {
  const req = request(t.app).post(`/api/assets/${boiler.id}/readings`).set('Authorization', `Bearer ${tok[who]}`);
  return (key ? req.set('Idempotency-Key', key) : req).send({ flowTemperatureC, returnTemperatureC: 66 });
};

describe('POST /api/assets/:id/readings with an Idempotency-Key', () => {
  it('stores a set sent twice with the same key once, and answers both with that set', async () => {
    const before = await Reading.count({ where: { assetId: boiler.id } });
    const first = await log('engineer', 'reading-key-1');
    const again = await log('engineer', 'reading-key-1');
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(await Reading.count({ where: { assetId: boiler.id } })).toBe(before + 1);
    const row = await Reading.findByPk(first.body.id as number);
    expect(row?.idempotencyKey).toBe('reading-key-1');
  });

  it('stores one set when two sends of one key arrive at once (the unique index lets one in)', async () => {
    const before = await Reading.count({ where: { assetId: boiler.id } });
    const [a, b] = await Promise.all([log('engineer', 'reading-key-2'), log('engineer', 'reading-key-2')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await Reading.count({ where: { assetId: boiler.id } })).toBe(before + 1);
  });

  it('keeps another person’s set with the same key apart, and sets without a key are each stored', async () => {
    const before = await Reading.count({ where: { assetId: boiler.id } });
    const mine = await log('engineer', 'shared-key');
    const theirs = await log('engineer2', 'shared-key');
    expect(theirs.body.id).not.toBe(mine.body.id);
    await log('engineer', null);
    await log('engineer', null);
    expect(await Reading.count({ where: { assetId: boiler.id } })).toBe(before + 4);
  });
});
