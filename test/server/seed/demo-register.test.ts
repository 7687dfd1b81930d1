import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalPhotoStorage } from '@/server/lib/photo-storage-local';
import { Asset } from '@/server/models/asset.model';
import { Photo } from '@/server/models/photo.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { DEMO_SITES } from '@/server/seed/demo-register-data';
import { seedDemo } from '@/server/seed/demo';
import { isLabelCode } from '@/shared/rules/label-code';
import { ASSET_TYPES } from '@/shared/rules/register';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

let db: TestDatabase;
let photoDir: string;
let storage: LocalPhotoStorage;

beforeAll(async () => {
  db = await createTestDatabase();
  photoDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-seed-photos-'));
  storage = new LocalPhotoStorage(photoDir);
  expect(await seedDemo(db.sequelize, { storage })).toBe(true);
});
afterAll(async () => {
  await db.drop();
  fs.rmSync(photoDir, { recursive: true, force: true });
});

describe('demo register seed', () => {
  it('seeds three sites with two or three plant rooms each, every safety location written', async () => {
    const sites = await Site.findAll();
    expect(sites).toHaveLength(3);
    for (const site of sites) {
      const rooms = await PlantRoom.findAll({ where: { siteId: site.id } });
      expect(rooms.length).toBeGreaterThanOrEqual(2);
      expect(rooms.length).toBeLessThanOrEqual(3);
      for (const r of rooms) {
        for (const text of [r.emergencyStop, r.gasIsolation, r.electricalIsolator, r.firstAid, r.exits, r.accessNotes]) expect(text.length).toBeGreaterThan(10);
      }
    }
  });

  it('seeds at least 40 items covering every item type, with valid unique label codes, some overdue and some not', async () => {
    const assets = await Asset.findAll();
    expect(assets.length).toBeGreaterThanOrEqual(40);
    expect(new Set(assets.map((a) => a.type))).toEqual(new Set(ASSET_TYPES));
    expect(assets.every((a) => isLabelCode(a.labelCode))).toBe(true);
    expect(new Set(assets.map((a) => a.labelCode)).size).toBe(assets.length);
    const today = new Date().toISOString().slice(0, 10);
    const dated = assets.filter((a) => a.nextServiceDue);
    expect(dated.filter((a) => a.nextServiceDue! < today).length).toBeGreaterThanOrEqual(5);
    expect(dated.filter((a) => a.nextServiceDue! > today).length).toBeGreaterThanOrEqual(5);
    expect(assets.some((a) => a.plantRoomId === null)).toBe(true);
  });

  it('stores placeholder photos for some items and rooms as readable JPEGs with thumbnails', async () => {
    const photos = await Photo.findAll();
    expect(photos.filter((p) => p.assetId).length).toBeGreaterThanOrEqual(5);
    expect(photos.filter((p) => p.plantRoomId).length).toBeGreaterThanOrEqual(3);
    for (const p of photos) {
      const full = await sharp(await storage.get(p.storageKey)).metadata();
      const thumb = await sharp(await storage.get(p.thumbnailKey)).metadata();
      expect([full.format, full.width, full.height]).toEqual(['jpeg', p.width, p.height]);
      expect(Math.max(thumb.width!, thumb.height!)).toBeLessThanOrEqual(320);
    }
  });

  it('uses only invented makers, no brand names', async () => {
    const makers = new Set((await Asset.findAll()).map((a) => a.manufacturer));
    for (const m of makers) expect(m).toMatch(/^Maker [A-F]$/);
    expect(DEMO_SITES.every((s) => s.name.endsWith('(demo)'))).toBe(true);
  });

  it('seeds once: a second run changes nothing', async () => {
    const counts = async () => [await Site.count(), await PlantRoom.count(), await Asset.count(), await Photo.count()];
    const before = await counts();
    expect(await seedDemo(db.sequelize, { storage })).toBe(false);
    expect(await counts()).toEqual(before);
  });
});

describe('demo tags', () => {
  it('seeds live tags once: an overdue group isolation and an override left for today', async () => {
    const { Tag } = await import('@/server/models/tag.model');
    const { TagEvent } = await import('@/server/models/tag-event.model');
    const { isOverdue } = await import('@/shared/rules/tags');
    const tags = await Tag.findAll();
    expect(tags.map((t) => t.kind).sort()).toEqual(['isolation', 'isolation', 'override']);
    expect(tags.every((t) => t.status === 'live')).toBe(true);
    expect(tags.filter((t) => isOverdue(t, new Date())).length).toBe(2);
    expect(await TagEvent.count({ where: { type: 'raised' } })).toBe(3);
    const { TagPoint } = await import('@/server/models/tag-point.model');
    const isolations = tags.filter((t) => t.kind === 'isolation');
    // common practice, no published source: a personal lock number must not be mistaken for a high-voltage switchgear reference.
    expect(isolations.every((t) => t.lockNumber && !/^HV/i.test(t.lockNumber))).toBe(true);
    expect(tags.some((t) => /flame failure/.test(t.reason)) && !tags.some((t) => /lockout/i.test(t.reason))).toBe(true);
    // OSHA 29 CFR 1910.147(f)(3)(ii)(D): in a group isolation each authorized employee puts a personal device on the group mechanism (here: on every point).
    const points = await TagPoint.findAll({ where: { tagId: isolations.map((t) => t.id) } });
    const perTag = isolations.map((t) => points.filter((p) => p.tagId === t.id).map((p) => p.assetId ?? p.description).sort());
    expect(perTag[0]).toEqual(perTag[1]);
    expect(isolations.every((t) => points.filter((p) => p.tagId === t.id).every((p) => p.lockNumber === t.lockNumber))).toBe(true);
    expect(points.some((p) => p.assetId !== null)).toBe(true);
    // OSHA 29 CFR 1910.147(d)(6): each demo isolation carries a proof.
    const { TagProof } = await import('@/server/models/tag-proof.model');
    expect(await TagProof.count()).toBe(2);
    expect(await seedDemo(db.sequelize, { storage })).toBe(false);
    expect(await Tag.count()).toBe(3);
  });
});
