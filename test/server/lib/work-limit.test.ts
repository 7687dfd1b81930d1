import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { imageWork } from '@/server/lib/photo-processing';
import { MAX_IMPORT_COLUMNS } from '@/server/lib/register-csv';
import { WorkLimit } from '@/server/lib/work-limit';
import { Asset } from '@/server/models/asset.model';
import { Photo } from '@/server/models/photo.model';
import { importWork } from '@/server/services/asset-import.service';
import { createOrganisation, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, siteBody, type Client } from '@/test/server/support/register';
import { jpegWithGps } from '@/test/server/support/images';

let t: TestApp;
let admin: Client;
let assetId: number;

beforeAll(async () => {
  t = await setupTestApp();
  const { users } = await createOrganisation('rowan');
  admin = as(t, await tokenFor(t.app, users.admin));
  const site = await created(admin.post('/api/sites', siteBody('Rowan Depot')));
  assetId = (await created(admin.post('/api/assets', assetBody(site.id, 'P-1')))).id;
});
afterAll(() => t.close());

/** Fills a limit's running slots and queue with jobs that wait until released. */
function occupy(limit: WorkLimit, jobs: number) {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => { release = resolve; });
  const held = Array.from({ length: jobs }, () => limit.run(() => gate));
  return async () => { release(); await Promise.all(held); };
}

describe('WorkLimit', () => {
  it('runs at most `concurrency` jobs, queues `queue` more, and refuses the rest at once with 503 and a retry time', async () => {
    const limit = new WorkLimit({ concurrency: 2, queue: 3, retryAfterSeconds: 7, busyMessage: 'Busy.' });
    let running = 0;
    let most = 0;
    const job = async () => { running += 1; most = Math.max(most, running); await new Promise((r) => setTimeout(r, 20)); running -= 1; return 'done'; };
    const results = await Promise.allSettled(Array.from({ length: 9 }, () => limit.run(job)));
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(5);
    const refused = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
    expect(refused).toHaveLength(4);
    expect(refused[0].reason).toMatchObject({ status: 503, code: 'busy', retryAfterSeconds: 7 });
    expect(most).toBe(2);
    expect(limit.stats).toEqual({ running: 0, waiting: 0 });
  });
});

describe('photo processing cap', () => {
  it('answers 503 with Retry-After while the image workers and their queue are full, and stores nothing', async () => {
    const release = occupy(imageWork, 6);
    const before = await Photo.count();
    const res = await admin.upload(`/api/assets/${assetId}/photos`, 'photo', await jpegWithGps(), 'plate.jpg', 'image/jpeg');
    await release();
    expect(res.status).toBe(503);
    expect(res.headers['retry-after']).toBe('10');
    expect(res.body.error.code).toBe('busy');
    expect(await Photo.count()).toBe(before);
    // Once the work is done, the same upload goes through.
    expect((await admin.upload(`/api/assets/${assetId}/photos`, 'photo', await jpegWithGps(), 'plate.jpg', 'image/jpeg')).status).toBe(201);
  });
});

describe('CSV import caps', () => {
  const header = 'site,plantId,name,type';
  it('answers 503 with Retry-After while another import runs and one waits', async () => {
    const release = occupy(importWork, 2);
    const res = await admin.upload('/api/assets/import?dryRun=false', 'file', Buffer.from(`${header}\nRowan Depot,P-2,Pump 2,pump\n`), 'r.csv', 'text/csv');
    await release();
    expect(res.status).toBe(503);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(await Asset.count({ where: { plantId: 'P-2' } })).toBe(0);
  });

  it(`refuses a file with more than ${MAX_IMPORT_COLUMNS} columns while parsing it, naming the row`, async () => {
    const wide = `${header}${',x'.repeat(MAX_IMPORT_COLUMNS)}\nRowan Depot,P-3,Pump 3,pump\n`;
    const res = await admin.upload('/api/assets/import?dryRun=false', 'file', Buffer.from(wide), 'wide.csv', 'text/csv');
    expect(res.status).toBe(200);
    expect(res.body.created).toBe(0);
    expect(res.body.errors[0].message).toMatch(new RegExp(`Row 1 has ${MAX_IMPORT_COLUMNS + 4} columns; a register file has at most ${MAX_IMPORT_COLUMNS}`));
    expect(await Asset.count({ where: { plantId: 'P-3' } })).toBe(0);
  });

  it('refuses a row longer than 64 KiB', async () => {
    const res = await admin.upload('/api/assets/import?dryRun=true', 'file', Buffer.from(`${header}\nRowan Depot,P-4,${'n'.repeat(70_000)},pump\n`), 'long.csv', 'text/csv');
    expect(res.status).toBe(200);
    expect(res.body.errors[0].message).toMatch(/not valid CSV/);
  });
});
