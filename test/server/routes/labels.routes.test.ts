import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { labelRects } from '@/server/lib/label-pdf';
import { RetiredLabel } from '@/server/models/retired-label.model';
import { formatLabelCode } from '@/shared/rules/label-code';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { crop, decodeQr, mmBox, rasterisePdf, toGray } from '@/test/support/raster-helpers';

const PUBLIC_URL = 'https://isoledger.example.test';
let t: TestApp;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let foreign: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};
let tmp: string;

beforeAll(async () => {
  t = await setupTestApp({ publicUrl: PUBLIC_URL });
  const org = await createOrganisation('alder');
  u = org.users;
  const birch = await createOrganisation('birch');
  plant = await createSiteWithAssets(org.organisation.id, u.admin.id);
  foreign = await createSiteWithAssets(birch.organisation.id, birch.users.admin.id, { name: 'Birch Site' });
  for (const k of ['engineer', 'viewer', 'supervisor'] as const) tok[k] = await tokenFor(t.app, u[k]);
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-labels-'));
});
afterAll(async () => {
  fs.rmSync(tmp, { recursive: true, force: true });
  await t.close();
});

const get = (p: string, who = 'engineer') => request(t.app).get(p).set('Authorization', `Bearer ${tok[who]}`);

describe('GET /api/labels/:code', () => {
  it('opens the item for its code, typed in any case and with the printed dashes', async () => {
    const res = await get(`/api/labels/${formatLabelCode(plant.pump.labelCode).toLowerCase()}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: plant.pump.id, plantId: 'P-01', labelCode: plant.pump.labelCode });
  });

  it('says "no such label" alike for a foreign, a malformed and an unknown code', async () => {
    const foreignRes = await get(`/api/labels/${foreign.pump.labelCode}`);
    const malformed = await get('/api/labels/0OIL1-not-a-code');
    const unknown = await get('/api/labels/AAAAAAAAAAAA');
    for (const r of [foreignRes, malformed, unknown]) {
      expect(r.status).toBe(404);
      expect(r.body).toEqual({ error: { code: 'no-such-label', message: 'No such label.' } });
    }
  });
});

describe('POST /api/assets/:id/label/replace', () => {
  it('issues a new code, retires the old one for good and keeps it in the history', async () => {
    const old = plant.valve.labelCode;
    expect((await request(t.app).post(`/api/assets/${plant.valve.id}/label/replace`).set('Authorization', `Bearer ${tok.viewer}`)).status).toBe(403);
    // An engineer may replace labels only on items they may edit (items they added); this one an admin added.
    const engineer = await request(t.app).post(`/api/assets/${plant.valve.id}/label/replace`).set('Authorization', `Bearer ${tok.engineer}`);
    expect(engineer.status).toBe(403);
    expect((await get(`/api/labels/${old}`)).body.id).toBe(plant.valve.id);
    const res = await request(t.app).post(`/api/assets/${plant.valve.id}/label/replace`).set('Authorization', `Bearer ${tok.supervisor}`);
    expect(res.status).toBe(200);
    expect(res.body.retiredCode).toBe(old);
    expect(res.body.labelCode).not.toBe(old);
    expect((await get(`/api/labels/${old}`)).status).toBe(404);
    expect((await get(`/api/labels/${res.body.labelCode}`)).body.id).toBe(plant.valve.id);
    expect(await RetiredLabel.count({ where: { code: old, assetId: plant.valve.id } })).toBe(1);
    expect((await get(`/api/assets/${plant.valve.id}/label/retired`)).body).toEqual([expect.objectContaining({ code: old })]);
    // Reprinting gives the same (new) code.
    expect((await get(`/api/assets/${plant.valve.id}`)).body.labelCode).toBe(res.body.labelCode);
  });

  it('lets an engineer replace the label of an item they added', async () => {
    const mine = await createSiteWithAssets(u.engineer.organisationId, u.engineer.id, { name: 'Engineer’s own site' });
    const res = await request(t.app).post(`/api/assets/${mine.valve.id}/label/replace`).set('Authorization', `Bearer ${tok.engineer}`);
    expect(res.status).toBe(200);
    expect(res.body.retiredCode).toBe(mine.valve.labelCode);
  });
});

describe('GET /api/labels.pdf', () => {
  it('prints a sheet whose QR codes decode, in plant-ID order, to each item’s label URL', async () => {
    const ids = [plant.valve.id, plant.pump.id, plant.boiler.id, plant.isolator.id];
    const res = await get(`/api/labels.pdf?assetIds=${ids.join(',')}&layout=sheet`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pages = rasterisePdf(res.body as Buffer, tmp, 'sheet');
    expect(pages).toHaveLength(1);
    const page = toGray(pages[0]);
    const assets = (await Promise.all(ids.map((id) => get(`/api/assets/${id}`)))).map((r) => r.body).sort((a, b) => a.plantId.localeCompare(b.plantId));
    const rects = labelRects(assets.length, 'sheet');
    rects.forEach((rect, i) => {
      // Decoded with jsQR, an independent reader: the label at position i carries item i's URL.
      const qr = decodeQr(crop(page, mmBox(rect.xMm, rect.yMm, rect.widthMm, rect.heightMm)));
      expect(qr?.data).toBe(`${PUBLIC_URL}/l/${assets[i].labelCode}`);
    });
  });

  it('prints one roll label per page for a whole site, and refuses another organisation’s items', async () => {
    const res = await get(`/api/labels.pdf?siteId=${plant.site.id}&layout=roll`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(rasterisePdf(res.body as Buffer, tmp, 'roll')).toHaveLength(4);
    expect((await get(`/api/labels.pdf?assetIds=${foreign.pump.id}`)).status).toBe(404);
    expect((await get('/api/labels.pdf?layout=sheet')).status).toBe(400);
    expect((await get(`/api/labels.pdf?assetIds=${plant.pump.id}&layout=poster`)).status).toBe(400);
  });
});
