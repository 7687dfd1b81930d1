import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeEach, beforeAll, describe, expect, it } from 'vitest';
import { Photo } from '@/server/models/photo.model';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { exifGpsLatitude, jpegWithGps, pngClaiming } from '@/test/server/support/images';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
const c = {} as Record<'supervisor' | 'engineer' | 'engineer2' | 'viewer', Client>;
let birch: Client;
let assetId: number;
let roomId: number;
let alder: OrgUsers;

beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  for (const role of ['supervisor', 'engineer', 'engineer2', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  birch = as(t, await tokenFor(t.app, (await createOrganisation('birch')).users.admin));
  const site = await created(c.supervisor.post('/api/sites', siteBody('Hazel Offices')));
  roomId = (await created(c.engineer.post('/api/plant-rooms', roomBody(site.id, 'Roof plant')))).id;
  assetId = (await created(c.engineer.post('/api/assets', assetBody(site.id, 'P-01', { plantRoomId: roomId })))).id;
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

const photoCount = () => Photo.count();
const storedFile = (key: string) => fs.readFileSync(path.join(t.config.dataDir, 'photos', ...key.split('/')));

describe('POST /api/assets/:id/photos', () => {
  it('re-encodes to JPEG without any EXIF: the GPS position is gone', async () => {
    const input = await jpegWithGps();
    // The test image really does carry a position before upload.
    expect(exifGpsLatitude((await sharp(input).metadata()).exif)).toEqual([51, 30, 0]);
    const res = await c.engineer2.upload(`/api/assets/${assetId}/photos`, 'photo', input, 'site.jpg', 'image/jpeg');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ url: `/api/photos/${res.body.id}`, thumbnailUrl: `/api/photos/${res.body.id}/thumbnail`, width: 64, height: 48 });
    const row = await Photo.findByPk(res.body.id);
    for (const key of [row!.storageKey, row!.thumbnailKey]) {
      const meta = await sharp(storedFile(key)).metadata();
      expect(meta.format).toBe('jpeg');
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(storedFile(key).includes(Buffer.from('Test camera'))).toBe(false);
    }
    const served = await c.viewer.get(res.body.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(exifGpsLatitude((await sharp(served.body).metadata()).exif)).toBeNull();
  });

  it('turns the picture upright by its EXIF orientation before dropping the tag', async () => {
    // EXIF orientation 6: the stored pixels must be rotated 90° clockwise to display (EXIF 2.32, tag 0x0112).
    const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', await jpegWithGps({ width: 80, height: 40, orientation: 6 }), 'tilted.jpg', 'image/jpeg');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ width: 40, height: 80 });
    const meta = await sharp((await c.viewer.get(res.body.url)).body).metadata();
    expect([meta.width, meta.height, meta.orientation]).toEqual([40, 80, undefined]);
  });

  it('accepts PNG, WebP and AVIF, stores JPEG, and makes a thumbnail of at most 320 px', async () => {
    const base = () => sharp({ create: { width: 1000, height: 500, channels: 4, background: { r: 10, g: 200, b: 30, alpha: 0.5 } } });
    for (const [buffer, name] of [[await base().png().toBuffer(), 'a.png'], [await base().webp().toBuffer(), 'b.webp'], [await base().avif().toBuffer(), 'c.avif']] as const) {
      const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', buffer, name);
      expect(res.status, name).toBe(201);
      const thumb = await c.viewer.get(res.body.thumbnailUrl);
      const meta = await sharp(thumb.body).metadata();
      expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 320, 160]);
    }
  });

  it('refuses a text file named .jpg with a clear 415 and stores nothing', async () => {
    const before = await photoCount();
    const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', Buffer.from('This is a shopping list, not a photo.\n'), 'photo.jpg', 'image/jpeg');
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: 'unsupported-image' });
    expect(res.body.error.message).toMatch(/not an image/);
    expect(await photoCount()).toBe(before);
  });

  it('refuses an SVG (an image, but not a photo format we take) with 415', async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>');
    const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', svg, 'drawing.jpg', 'image/jpeg');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/SVG/);
  });

  it('refuses a file over 10 MB with 413 and a message', async () => {
    const before = await photoCount();
    const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', Buffer.alloc(MAX_PHOTO_BYTES + 1, 0xff), 'huge.jpg', 'image/jpeg');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'file-too-large', message: 'The photo is larger than 10 MB.' });
    expect(await photoCount()).toBe(before);
  });

  it('refuses a small file claiming 30000 × 30000 pixels from its header, without decoding it (422)', async () => {
    const png = pngClaiming(30000, 30000);
    expect(png.length).toBeLessThan(1024);
    const res = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'photo', png, 'tiny.png', 'image/png');
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'image-too-large' });
    expect(res.body.error.message).toContain('30000 × 30000');
  });

  it('asks for the file in the photo field (400) and refuses two files', async () => {
    const none = await c.engineer.post(`/api/assets/${assetId}/photos`, {});
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toHaveProperty('photo');
    const wrongField = await c.engineer.upload(`/api/assets/${assetId}/photos`, 'image', await jpegWithGps(), 'a.jpg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.code).toBe('unexpected-file');
  });

  it('refuses viewers (403), other organisations (404) and archived items (409)', async () => {
    const jpeg = await jpegWithGps();
    expect((await c.viewer.upload(`/api/assets/${assetId}/photos`, 'photo', jpeg, 'a.jpg')).status).toBe(403);
    expect((await birch.upload(`/api/assets/${assetId}/photos`, 'photo', jpeg, 'a.jpg')).status).toBe(404);
    expect((await birch.upload(`/api/plant-rooms/${roomId}/photos`, 'photo', jpeg, 'a.jpg')).status).toBe(404);
    const site = (await c.supervisor.get('/api/sites')).body.items[0].id;
    const old = await created(c.engineer.post('/api/assets', assetBody(site, 'OLD-1')));
    await c.supervisor.post(`/api/assets/${old.id}/archive`);
    expect((await c.engineer.upload(`/api/assets/${old.id}/photos`, 'photo', jpeg, 'a.jpg')).status).toBe(409);
  });
});

describe('photos on plant rooms and in item lists', () => {
  it('adds a photo to a plant room with a caption and shows it on the room', async () => {
    const res = await c.engineer2
      .upload(`/api/plant-rooms/${roomId}/photos`, 'photo', await jpegWithGps(), 'room.jpg', 'image/jpeg')
      .field('caption', 'Gas valve by the door');
    expect(res.status).toBe(201);
    const room = (await c.viewer.get(`/api/plant-rooms/${roomId}`)).body;
    expect(room.photos).toEqual([expect.objectContaining({ id: res.body.id, caption: 'Gas valve by the door', createdBy: expect.objectContaining({ name: 'alder engineer2' }) })]);
  });

  it('gives list rows the thumbnail of their first photo and the detail all photos', async () => {
    const detail = (await c.viewer.get(`/api/assets/${assetId}`)).body;
    expect(detail.photos.length).toBeGreaterThanOrEqual(2);
    const row = (await c.viewer.get('/api/assets?q=P-01')).body.items[0];
    expect(row.photos).toBeUndefined();
    expect(row.thumbnailUrl).toBe(detail.photos[0].thumbnailUrl);
  });
});

describe('GET /api/photos/:id', () => {
  it('serves only to signed-in users of the same organisation', async () => {
    const photo = (await c.viewer.get(`/api/assets/${assetId}`)).body.photos[0];
    expect((await request(t.app).get(photo.url)).status).toBe(401);
    const foreign = await birch.get(photo.url);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual((await birch.get('/api/photos/999999')).body);
    expect((await birch.get(photo.thumbnailUrl)).status).toBe(404);
    const own = await c.viewer.get(photo.thumbnailUrl);
    expect(own.status).toBe(200);
    expect(own.headers['cache-control']).toMatch(/private/);
  });
});
