import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalPhotoStorage } from '@/server/lib/photo-storage-local';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { User } from '@/server/models/user.model';
import { seedDemo } from '@/server/seed/demo';
import { setupTestApp, type TestApp } from '@/test/setup/app';

let t: TestApp;
let dir: string;
beforeAll(async () => {
  t = await setupTestApp();
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-demo-readings-'));
  await seedDemo(t.db.sequelize, { bcryptCost: 4, storage: new LocalPhotoStorage(dir) });
});
afterAll(async () => {
  await t.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('demo readings', () => {
  it('gives the demo primary pump a few weeks of sets, one corrected by its author, checked by the server', async () => {
    const pump = await Asset.findOne({ where: { plantId: 'P-01A' }, order: [['id', 'ASC']] });
    const rows = await Reading.findAll({ where: { assetId: pump!.id }, order: [['takenAt', 'ASC'], ['id', 'ASC']] });
    expect(rows).toHaveLength(8);
    const correction = rows.find((r) => r.supersedesId !== null)!;
    const typo = rows.find((r) => r.id === correction.supersedesId)!;
    expect(typo.createdBy).toBe(correction.createdBy);
    // 19 bar against a 3 bar safety valve: the original keeps its danger flag on record
    expect(typo.flags.map((f) => f.level)).toContain('danger');
    expect(correction.flags.map((f) => f.level)).not.toContain('danger');
    expect(rows.filter((r) => r.flags.some((f) => f.key === 'delta-t'))).toHaveLength(1);
  });

  it('is seeded once: a second run adds nothing', async () => {
    await seedDemo(t.db.sequelize, { bcryptCost: 4, storage: new LocalPhotoStorage(dir) });
    expect(await Reading.count()).toBe(8 + 9);
  });

  it('gives a boiler, a calorifier and a pressurisation unit a whole visit’s readings, with their flags', async () => {
    const latest = async (plantId: string) => {
      const asset = await Asset.findOne({ where: { plantId }, order: [['id', 'ASC']] });
      return (await Reading.findAll({ where: { assetId: asset!.id }, order: [['takenAt', 'DESC']] }))[0];
    };
    const boiler = await latest('B-01');
    expect(boiler.results.map((r) => r.key)).toEqual(expect.arrayContaining(['gas-working-pressure', 'burner-pressure', 'flue-co-co2-ratio']));
    expect(boiler.flags).toEqual([]);
    // HSE ACOP L8: 57.5 °C is below the 60 °C store temperature
    expect((await latest('CAL-01')).flags.map((f) => [f.key, f.level])).toEqual([['store-temperature', 'caution']]);
    expect((await latest('PU-01')).flags.map((f) => f.key)).toEqual(['inhibitor']);
  });

  it('lets the demo system pass the vessel check with its 300 L vessel', async () => {
    const engineer = await User.findOne({ where: { email: 'engineer@example.test' } });
    const login = await request(t.app).post('/api/auth/login').send({ email: engineer!.email, password: 'isoledger-demo' });
    const sites = await request(t.app).get('/api/sites').set('Authorization', `Bearer ${login.body.token}`);
    const site = sites.body.items.find((s: { name: string }) => s.name === 'Quillmere Academy (demo)');
    const res = await request(t.app).get(`/api/sites/${site.id}/systems/LTHW%20primary/expansion-check`).set('Authorization', `Bearer ${login.body.token}`);
    expect(res.body.missing).toEqual([]);
    expect(res.body.result.installedNominalVolumeL).toBe(300);
    // EN 12828:2012 Annex D with 1600 L, 10 → 82 °C, 11 m, 3 bar valve, 1.5 bar pre-charge: about 195 L needed (worked by hand)
    expect(res.body.result.requiredNominalVolumeL).toBeGreaterThan(185);
    expect(res.body.result.requiredNominalVolumeL).toBeLessThan(205);
    expect(res.body.result.verdict).toBe('pass');
  });
});
