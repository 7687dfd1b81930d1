import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Photo } from '@/server/models/photo.model';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};
let jpeg: Buffer;

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('elm');
  u = org.users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id);
  for (const k of ['engineer', 'engineer2'] as const) tok[k] = await tokenFor(t.app, u[k]);
  jpeg = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#508060' } }).jpeg().toBuffer();
});
afterAll(() => t.close());

const upload = (who: string, assetId: number, key: string | null) => {
  const req = request(t.app).post(`/api/assets/${assetId}/photos`).set('Authorization', `Bearer ${tok[who]}`);
  return (key ? req.set('Idempotency-Key', key) : req).attach('photo', jpeg, { filename: 'gland.jpg', contentType: 'image/jpeg' });
};

describe('POST /api/assets/:id/photos with an Idempotency-Key', () => {
  it('stores a photo sent twice with the same key once, and answers both with that photo', async () => {
    const before = await Photo.count({ where: { assetId: plant.pump.id } });
    const first = await upload('engineer', plant.pump.id, 'photo-key-1');
    const again = await upload('engineer', plant.pump.id, 'photo-key-1');
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(await Photo.count({ where: { assetId: plant.pump.id } })).toBe(before + 1);
    expect((await Photo.findByPk(first.body.id as number))?.idempotencyKey).toBe('photo-key-1');
  });

  it('stores one photo when two sends of one key arrive at once (the unique index lets one in)', async () => {
    const before = await Photo.count({ where: { assetId: plant.pump.id } });
    const [a, b] = await Promise.all([upload('engineer', plant.pump.id, 'photo-key-2'), upload('engineer', plant.pump.id, 'photo-key-2')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await Photo.count({ where: { assetId: plant.pump.id } })).toBe(before + 1);
  });

  it('refuses the same key for another item (422), keeps another person’s key apart, and stores keyless photos each time', async () => {
    await upload('engineer', plant.pump.id, 'photo-key-3');
    const elsewhere = await upload('engineer', plant.boiler.id, 'photo-key-3');
    expect(elsewhere.status).toBe(422);
    expect(elsewhere.body.error.code).toBe('idempotency-key-reused');
    expect(await Photo.count({ where: { assetId: plant.boiler.id } })).toBe(0);
    const theirs = await upload('engineer2', plant.pump.id, 'photo-key-3');
    expect(theirs.status).toBe(201);
    const before = await Photo.count({ where: { assetId: plant.pump.id } });
    await upload('engineer', plant.pump.id, null);
    await upload('engineer', plant.pump.id, null);
    expect(await Photo.count({ where: { assetId: plant.pump.id } })).toBe(before + 2);
  });
});
