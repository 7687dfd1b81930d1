import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { LocalPhotoStorage } from '@/server/lib/photo-storage-local';
import { Organisation } from '@/server/models/organisation.model';
import { Site } from '@/server/models/site.model';
import { DEMO_ORGANISATION, DEMO_PASSWORD, seedDemo } from '@/server/seed/demo';
import { generateLabelCode } from '@/shared/rules/label-code';
import { ASSET_TYPES } from '@/shared/rules/register';
import { setupTestApp } from '@/test/setup/app';

/** Queries typed into the search box, as they arrive while typing. */
export const SEARCHES = ['B', 'B-0', 'P-01', 'circ', 'circuit 2', 'cold wat', 'calor', 'pump', 'boiler 1'];

/** The demo organisation on a fresh database, plus `extraItems` generated items in one more site. */
export async function searchBench(extraItems: number) {
  const t = await setupTestApp();
  const photoDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-bench-photos-'));
  const started = performance.now();
  await seedDemo(t.db.sequelize, { storage: new LocalPhotoStorage(photoDir) });
  const seedMs = performance.now() - started;
  const org = (await Organisation.findOne({ where: { name: DEMO_ORGANISATION } }))!;
  if (extraItems > 0) {
    const site = await Site.create({ organisationId: org.id, name: 'Generated estate', timeZone: 'Europe/London', clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy: 1 });
    const words = ['Boiler', 'Pump', 'Valve', 'Vessel', 'Heater', 'Panel', 'Fan coil', 'Damper'];
    const systems = ['LTHW heating circuit', 'DHW primary', 'Cold water boosting', 'Chilled water circuit', 'Pool heating'];
    for (let start = 0; start < extraItems; start += 2000) {
      const rows = Array.from({ length: Math.min(2000, extraItems - start) }, (_, k) => {
        const i = start + k;
        return [org.id, site.id, `G${String(i).padStart(6, '0')}`, generateLabelCode(), `${words[i % words.length]} ${i}`, ASSET_TYPES[i % ASSET_TYPES.length], `${systems[i % systems.length]} ${i % 40}`, '[]', `SN-${i}`, '', '{}', 1];
      });
      await t.db.rootQuery(
        `INSERT INTO assets (organisation_id, site_id, plant_id, label_code, name, type, system, energy_sources, serial_number, notes, attributes, created_by, created_at, updated_at)
         VALUES ${rows.map(() => '(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, NOW(3), NOW(3))').join(', ')}`,
        rows.flat(),
      );
    }
    await t.db.rootQuery('ANALYZE TABLE assets');
  }
  const login = await request(t.app).post('/api/auth/login').send({ email: 'engineer@example.test', password: DEMO_PASSWORD });
  const token = login.body.token as string;
  const search = async (q: string) => {
    const res = await request(t.app).get(`/api/assets?q=${encodeURIComponent(q)}&pageSize=50`).set('Authorization', `Bearer ${token}`);
    if (res.status !== 200) throw new Error(`search failed: ${res.status}`);
    return res.body.total as number;
  };
  const close = async () => {
    await t.close();
    fs.rmSync(photoDir, { recursive: true, force: true });
  };
  return { search, seedMs, close };
}
