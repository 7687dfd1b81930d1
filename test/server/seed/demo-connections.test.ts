import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalPhotoStorage } from '@/server/lib/photo-storage-local';
import { Asset } from '@/server/models/asset.model';
import { Connection } from '@/server/models/connection.model';
import { User } from '@/server/models/user.model';
import { seedDemo } from '@/server/seed/demo';
import { getClosingAffects, getIsolationPlan } from '@/server/services/isolation-plan.service';
import { canCarry } from '@/shared/rules/connections';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

let db: TestDatabase;
let photoDir: string;

beforeAll(async () => {
  db = await createTestDatabase();
  photoDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-seed-connections-'));
  await seedDemo(db.sequelize, { storage: new LocalPhotoStorage(photoDir) });
});
afterAll(async () => {
  await db.drop();
  fs.rmSync(photoDir, { recursive: true, force: true });
});

describe('demo connections', () => {
  it('links only items that carry the medium, within one site', async () => {
    const links = await Connection.findAll({ include: ['fromAsset', 'toAsset'] });
    expect(links.length).toBeGreaterThan(40);
    for (const l of links) {
      expect([canCarry(l.fromAsset!.type, l.medium), canCarry(l.toAsset!.type, l.medium)]).toEqual([true, true]);
      expect(l.fromAsset!.siteId).toBe(l.toAsset!.siteId);
    }
  });

  it('plans boiler 2 at its own gas cock, fused spur and flow and return valves; the header valve takes every boiler off', async () => {
    const engineer = (await User.findOne({ where: { email: 'engineer@example.test' } }))!;
    const actor = { id: engineer.id, organisationId: engineer.organisationId, role: engineer.role, name: engineer.name, email: engineer.email };
    const boiler = (await Asset.findAll({ where: { plantId: 'B-02' }, include: ['site'] })).find((a) => a.site!.name.startsWith('Quillmere'))!;
    const plan = await getIsolationPlan(actor, boiler.id, 'gas,electrical,hot-water');
    const points = plan.sources.map((s) => s.points.map((p) => p.item.plantId).sort());
    // common practice, no published source: each boiler has its own gas cock, electrical isolator and flow/return valves
    expect(points).toEqual([['GV-B02'], ['FS-B02'], ['FV-B02', 'RV-B02']]);
    expect(plan.sources.every((s) => s.gaps.length === 0)).toBe(true);
    const v01 = (await Asset.findAll({ where: { plantId: 'V-01' } })).find((a) => a.siteId === boiler.siteId)!;
    const closing = await getClosingAffects(actor, v01.id);
    expect(closing.affects[0].items.map((i) => i.plantId)).toEqual(['B-01', 'B-02', 'B-03']);
    // The twin pumps of circuit 1 share an isolator and the circuit's bypass must be closed as well.
    const pump = (await Asset.findAll({ where: { plantId: 'P-02A', siteId: boiler.siteId } }))[0];
    const pumpPlan = await getIsolationPlan(actor, pump.id, 'electrical,hot-water');
    expect(pumpPlan.sources.map((s) => s.points.map((p) => p.item.plantId).sort())).toEqual([['ISO-P02'], ['BV-C1', 'IV-C1', 'IV-C1R']]);
    expect(pumpPlan.affects.map((i) => i.plantId)).toEqual(['P-02B']);
  });
});
