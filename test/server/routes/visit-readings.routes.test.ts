import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { Site } from '@/server/models/site.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { latestCurrentReadingIds } from '@/server/services/reading-flags.service';
import { barToPa, LEGIONELLA_ADVICE, mbarToPa } from '@/shared/calc';
import { generateLabelCode } from '@/shared/rules/label-code';
import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { LatestFlaggedReading, ReadingSet } from '@/shared/types/readings';
import { as, type Client } from '@/test/server/support/register';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let u: OrgUsers;
let site: Site;
const a: Record<string, Asset> = {};
const c: Record<string, Client> = {};

// An invented plant room: a gas boiler, a calorifier, a pressurisation unit and a vessel on "LTHW 1".
beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('cedar');
  u = org.users;
  const birch = (await createOrganisation('birch')).users;
  site = await Site.create({ organisationId: org.organisation.id, name: 'Cedar School', timeZone: 'Europe/London', clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy: u.admin.id });
  const make = (plantId: string, type: AssetType, system: string, energySources: EnergySource[], attributes: Record<string, string | number>) =>
    Asset.create({
      organisationId: org.organisation.id, siteId: site.id, plantRoomId: null, plantId, labelCode: generateLabelCode(), name: `${type} ${plantId}`, type, system,
      energySources, manufacturer: '', model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null,
      nextServiceDue: null, notes: '', attributes, createdBy: u.admin.id, archivedAt: null,
    });
  a.boiler = await make('B-01', 'boiler', 'LTHW 1', ['gas', 'electrical'], { fuel: 'natural-gas', flowSetpointC: 80, burnerPressureMbar: 9 });
  a.calorifier = await make('CAL-01', 'water-heater', 'DHW', ['hot-water'], { capacityL: 1500, setpointC: 60 });
  a.unit = await make('PU-01', 'pressurisation-unit', 'LTHW 1', ['electrical'], { fillPressureBar: 1 });
  a.vessel = await make('EV-01', 'vessel', 'LTHW 1', ['stored-pressure'], { capacityL: 50, preChargeBar: 0.9 });
  for (const k of ['engineer', 'viewer', 'admin'] as const) c[k] = as(t, await tokenFor(t.app, u[k]));
  c.birch = as(t, await tokenFor(t.app, birch.engineer));
});
afterAll(() => t.close());

const log = (assetId: number, body: object) => c.engineer.post(`/api/assets/${assetId}/readings`, body);

describe('POST /api/assets/:id/readings for a whole visit', () => {
  it('flags a calorifier at 30 °C as a Legionella danger, with its advice, stored with the set', async () => {
    const res = await log(a.calorifier.id, { storeTemperatureC: 30, hotWaterReturnTemperatureC: 52 });
    expect(res.status).toBe(201);
    const set = res.body as ReadingSet;
    expect(set.values.storeTemperatureC).toBe(30);
    // HSE ACOP L8 / HSG274 Part 2: store ≥ 60 °C; 30 °C is inside the 20–45 °C growth range
    expect(set.flags).toEqual([{ key: 'store-temperature', level: 'danger', message: expect.stringContaining(LEGIONELLA_ADVICE) }]);
    const check = set.results.find((r) => r.key === 'store-temperature')!;
    expect(check.limit).toBe('60 °C or more');
    expect(check.source).toMatch(/HSE ACOP L8/);
    const [row] = await t.db.sequelize.query<{ store_temperature_c: number; worst_flag: string }>(
      'SELECT store_temperature_c, worst_flag FROM readings WHERE id = ?', { replacements: [set.id], type: 'SELECT' as never },
    );
    expect(row).toMatchObject({ store_temperature_c: 30, worst_flag: 'danger' });
  });

  it('checks a boiler’s gas pressures and flue gas against its recorded fuel', async () => {
    const res = await log(a.boiler.id, {
      gasStandingPressurePa: mbarToPa(21), gasWorkingPressurePa: mbarToPa(19.5), burnerPressurePa: mbarToPa(9.2),
      flueO2Percent: 4, flueCoPpm: 60, flueTemperatureC: 68, combustionEfficiencyPercent: 96.5,
    });
    expect(res.status).toBe(201);
    const set = res.body as ReadingSet;
    expect(set.results.map((r) => r.key)).toEqual(['gas-standing-pressure', 'gas-working-pressure', 'burner-pressure', 'flue-co2', 'flue-co', 'flue-co-co2-ratio']);
    expect(set.flags).toEqual([]);
    expect(set.settingsUsed.appliance).toEqual({ family: 'natural-gas', burnerPressureSettingMbar: 9 });
    // from memory: CO₂,max 11.7 % → CO₂ = 11.7 · 16.9/20.9 = 9.461 %; ratio = 0.006/9.461 = 0.000634 (worked by hand)
    expect(set.results.find((r) => r.key === 'flue-co-co2-ratio')?.value).toBeCloseTo(0.000634, 6);
    expect(set.values.combustionEfficiencyPercent).toBe(96.5);
  });

  it('checks the pressurisation unit against the vessel pre-charge and the water treatment', async () => {
    const res = await log(a.unit.id, {
      systemPressureGaugePa: barToPa(0.75), gaugeHeightM: 3, unitCutInPressureGaugePa: barToPa(0.85), unitCutOutPressureGaugePa: barToPa(1.3),
      inhibitorResult: 'low', waterPh: 8.4, conductivityUSPerCm: 640, waterAppearance: 'clear',
    });
    expect(res.status).toBe(201);
    const set = res.body as ReadingSet;
    // 0.75 bar + 3 m · 0.0981 bar/m = 1.044 bar at the unit: not below the 1 bar fill (worked by hand)
    expect(set.results.find((r) => r.key === 'system-pressure')?.value).toBeCloseTo(1.0442, 4);
    expect(set.flags.map((f) => [f.key, f.level])).toEqual([['unit-cut-in', 'caution'], ['inhibitor', 'caution']]);
    expect(set.values).toMatchObject({ inhibitorResult: 'low', waterAppearance: 'clear', waterPh: 8.4 });
  });

  it('refuses readings out of range and unknown categories (422), storing nothing', async () => {
    const before = await Reading.count();
    const res = await log(a.unit.id, { waterPh: 15, inhibitorResult: 'plenty', flueO2Percent: 30, storeTemperatureC: 130 });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['flueO2Percent', 'inhibitorResult', 'storeTemperatureC', 'waterPh']);
    expect(await Reading.count()).toBe(before);
  });

  it('has the database refuse an impossible value even past the API', async () => {
    const insert = (column: string, value: number | string) =>
      t.db.sequelize.query(
        `INSERT INTO readings (asset_id, taken_at, ${column}, surface_temperatures, note, results, flags, settings_used, created_by, created_at)
         VALUES (?, NOW(), ?, '[]', '', '[]', '[]', '{}', ?, NOW())`,
        { replacements: [a.unit.id, value, u.engineer.id] },
      );
    await expect(insert('water_ph', 15)).rejects.toThrow(/CONSTRAINT|check/i);
    await expect(insert('inhibitor_result', 'plenty')).rejects.toThrow(/CONSTRAINT|check/i);
    await expect(insert('store_temperature_c', -5)).rejects.toThrow(/CONSTRAINT|check/i);
  });
});

describe('GET /api/sites/:id/reading-flags', () => {
  it('lists each item’s latest flags, danger first, and drops an item whose latest set is clean', async () => {
    const res = await c.viewer.get(`/api/sites/${site.id}/reading-flags`);
    // A viewer sees only the sites given to them.
    expect(res.status).toBe(404);
    await UserSiteAccess.create({ userId: u.viewer.id, siteId: site.id, grantedBy: u.admin.id });
    const list = (await c.viewer.get(`/api/sites/${site.id}/reading-flags`)).body.items as LatestFlaggedReading[];
    expect(list.map((i) => [i.plantId, i.worstFlag])).toEqual([['CAL-01', 'danger'], ['PU-01', 'caution']]);
    expect(list[0].flags[0].message).toMatch(/^Legionella risk/);
    // The calorifier brought up to temperature: its latest set is clean, so it leaves the list.
    expect((await log(a.calorifier.id, { storeTemperatureC: 61 })).status).toBe(201);
    const after = (await c.engineer.get(`/api/sites/${site.id}/reading-flags`)).body.items as LatestFlaggedReading[];
    expect(after.map((i) => i.plantId)).toEqual(['PU-01']);
  });

  it('answers 404 for another organisation’s site, as for a missing one', async () => {
    expect((await c.birch.get(`/api/sites/${site.id}/reading-flags`)).status).toBe(404);
    expect((await c.engineer.get('/api/sites/999999/reading-flags')).status).toBe(404);
    expect((await c.engineer.get('/api/sites/abc/reading-flags')).status).toBe(400);
  });

  it('gives other services the latest current set per item', async () => {
    const ids = await latestCurrentReadingIds([a.calorifier.id, a.boiler.id]);
    const rows = await Reading.findAll({ where: { id: ids } });
    expect(rows.map((r) => [r.assetId, r.storeTemperatureC]).sort()).toEqual([[a.boiler.id, null], [a.calorifier.id, 61]].sort());
  });
});
