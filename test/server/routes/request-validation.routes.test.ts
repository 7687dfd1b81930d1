import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_PAGE, MAX_PAGE_SIZE } from '@/shared/rules/paging';
import { createOrganisation, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let token: string;
let assetId: number;
let foreignAssetId: number;
let foreignUserId: number;

beforeAll(async () => {
  t = await setupTestApp();
  const { organisation, users } = await createOrganisation('oak');
  token = await tokenFor(t.app, users.admin);
  assetId = (await createSiteWithAssets(organisation.id, users.admin.id)).pump.id;
  const other = await createOrganisation('yew');
  foreignAssetId = (await createSiteWithAssets(other.organisation.id, other.users.admin.id)).pump.id;
  foreignUserId = other.users.engineer.id;
});
afterAll(() => t.close());

const get = (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${token}`);

describe('bad numbers in the path or query', () => {
  // Each of these answered 500 before: a non-finite or absurd number reached the database.
  it.each([
    '/api/assets/abc/label/retired',
    '/api/assets/1e999/label/retired',
    '/api/tags?assetId=1e999',
    '/api/tags?siteId=abc',
    '/api/tags?status=gone',
    '/api/tags?kind=lockout',
    '/api/labels.pdf?plantRoomId=1e999',
    '/api/labels.pdf?siteId=-4',
    '/api/labels.pdf?assetIds=1,1e999',
    '/api/sites?page=1e300',
    '/api/assets/ASSET/readings?page=1e300',
    '/api/board?page=1e300',
    '/api/users?page=-1',
    '/api/audit?page=abc',
    `/api/sites?page=${MAX_PAGE + 1}`,
    '/api/assets?siteId=1e999',
    '/api/assets/1e999',
    '/api/assets/0x10',
    '/api/users/abc',
    '/api/photos/Infinity',
    '/api/plant-rooms/1.5',
  ])('GET %s answers 400 naming the parameter', async (raw) => {
    const res = await get(raw.replace('ASSET', String(assetId)));
    expect(res.status).toBe(400);
    expect(['bad-id', 'bad-query']).toContain(res.body.error.code);
    expect(Object.keys(res.body.error.fields ?? {}).length).toBeGreaterThan(0);
  });

  it('answers a missing or another organisation’s record 404, alike', async () => {
    for (const path of [`/api/assets/${foreignAssetId}`, '/api/assets/987654', `/api/assets/${foreignAssetId}/label/retired`, `/api/users/${foreignUserId}`]) {
      const res = await get(path);
      expect([path, res.status]).toEqual([path, 404]);
    }
  });

  it('cuts an oversized page size to the cap rather than refusing it', async () => {
    const res = await get('/api/sites?pageSize=100000');
    expect(res.status).toBe(200);
    expect(res.body.pageSize).toBe(MAX_PAGE_SIZE);
  });

  it('still reads good numbers', async () => {
    expect((await get(`/api/assets/${assetId}/label/retired`)).status).toBe(200);
    expect((await get(`/api/tags?assetId=${assetId}&page=1`)).status).toBe(200);
    expect((await get('/api/board?page=2&pageSize=10')).body).toMatchObject({ page: 2, pageSize: 10 });
  });
});
