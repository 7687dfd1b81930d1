import request from 'supertest';
import { afterAll, beforeEach, beforeAll, describe, expect, it } from 'vitest';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { Site } from '@/server/models/site.model';
import { latestReadingsForExport } from '@/server/services/readings.service';
import { barToPa, litresPerSecondToM3PerS, SAFETY_VALVE_DANGER_TEXT } from '@/shared/calc';
import { generateLabelCode } from '@/shared/rules/label-code';
import type { AssetType } from '@/shared/rules/register';
import type { ReadingSet } from '@/shared/types/readings';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let u: OrgUsers;
let birch: OrgUsers;
let site: Site;
const a: Record<string, Asset> = {};
const tok: Record<string, string> = {};

// An invented heating system: boiler, pump, pressurisation unit and two vessels on "LTHW 1".
async function plant(organisationId: number, createdBy: number, name: string) {
  const s = await Site.create({ organisationId, name, timeZone: 'Europe/London', clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy });
  const make = (plantId: string, type: AssetType, system: string, attributes: Record<string, number | null> = {}, archived = false) =>
    Asset.create({
      organisationId, siteId: s.id, plantRoomId: null, plantId, labelCode: generateLabelCode(), name: `${type} ${plantId}`, type, system,
      energySources: [], manufacturer: '', model: '', serialNumber: '', installDate: null, serviceIntervalMonths: null, lastServiceDate: null,
      nextServiceDue: null, notes: '', attributes, createdBy, archivedAt: archived ? new Date() : null,
    });
  return {
    site: s,
    boiler: await make('B-01', 'boiler', 'LTHW 1', { flowSetpointC: 80 }),
    pump: await make('P-01', 'pump', 'LTHW 1'),
    unit: await make('PU-01', 'pressurisation-unit', 'LTHW 1', { fillPressureBar: 1 }),
    vessel1: await make('EV-01', 'vessel', 'LTHW 1', { capacityL: 50, preChargeBar: 0.8 }),
    // Written with other capitals: the system is still the same one.
    vessel2: await make('EV-02', 'vessel', 'lthw 1', { capacityL: 25 }),
    archived: await make('P-99', 'pump', 'LTHW 1', {}, true),
  };
}

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('alder');
  u = org.users;
  birch = (await createOrganisation('birch')).users;
  const mine = await plant(org.organisation.id, u.supervisor.id, 'Alder Depot');
  site = mine.site;
  Object.assign(a, mine);
  a.foreign = (await plant(birch.admin.organisationId, birch.admin.id, 'Birch Depot')).pump;
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
  tok.birch = await tokenFor(t.app, birch.engineer);
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(u.viewer));

const as = (who: string) => ({
  get: (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${tok[who]}`),
  post: (path: string, body: object) => request(t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).send(body),
  put: (path: string, body: object) => request(t.app).put(path).set('Authorization', `Bearer ${tok[who]}`).send(body),
});
const systemPath = () => `/api/sites/${site.id}/systems/${encodeURIComponent('LTHW 1')}`;
const readingCount = () => Reading.count();

describe('GET /api/assets/:id/readings', () => {
  it('starts empty and names where each design value comes from', async () => {
    const res = await as('viewer').get(`/api/assets/${a.boiler.id}/readings`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ items: [], total: 0, page: 1 });
    expect(res.body.checkSettings.systemName).toBe('LTHW 1');
    expect(res.body.checkSettings.settings).toEqual({ flowSetpointC: 80, fillPressureGaugePa: barToPa(1), vesselPreChargeGaugePa: barToPa(0.8) });
    expect(res.body.checkSettings.sources.vesselPreChargeGaugePa).toMatch(/Lowest vessel pre-charge/);
    expect(res.body.checkSettings.sources.fillPressureGaugePa).toBe('Pressurisation unit PU-01 in the register');
  });

  it('answers 404 for another organisation’s item, the same as for a missing one', async () => {
    const foreign = await as('engineer').get(`/api/assets/${a.foreign.id}/readings`);
    const missing = await as('engineer').get('/api/assets/999999/readings');
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(missing.body);
    expect((await as('engineer').get('/api/assets/abc/readings')).status).toBe(400);
  });
});

describe('PUT /api/sites/:id/systems/:name', () => {
  it('refuses a viewer (403), an unknown system or a foreign site (404) and a fill at the valve setting (422)', async () => {
    expect((await as('viewer').put(systemPath(), { designDeltaTK: 11 })).status).toBe(403);
    expect((await as('engineer').put(`/api/sites/${site.id}/systems/Chilled%20water`, { designDeltaTK: 6 })).status).toBe(404);
    expect((await as('birch').put(systemPath(), { designDeltaTK: 11 })).status).toBe(404);
    const bad = await as('engineer').put(systemPath(), { fillPressureGaugePa: barToPa(3), safetyValveSettingGaugePa: barToPa(3), designDeltaTK: -1 });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.designDeltaTK).toBe('Design ΔT must be above 0 K');
    expect(bad.body.error.fields._).toBe('Fill pressure must be below the safety valve setting');
  });

  it('lets an engineer record the design values and lists the system with its item count', async () => {
    const res = await as('engineer').put(systemPath(), {
      designDeltaTK: 11,
      safetyValveSettingGaugePa: barToPa(3),
      systemVolumeM3: 0.5,
      staticHeightM: 5,
      fillTemperatureC: 10,
      maxFlowTemperatureC: 80,
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'LTHW 1', configured: true, designDeltaTK: 11, fillPressureGaugePa: null, updatedBy: { id: u.engineer.id } });
    const list = await as('viewer').get(`/api/sites/${site.id}/systems`);
    // Five current items; the archived pump is not counted.
    expect(list.body.items).toEqual([expect.objectContaining({ name: 'LTHW 1', assetCount: 5, configured: true })]);
  });
});

describe('POST /api/assets/:id/readings', () => {
  it('refuses out-of-range, non-numeric and empty sets with 422 and the fields, storing nothing', async () => {
    const before = await readingCount();
    const res = await as('engineer').post(`/api/assets/${a.boiler.id}/readings`, {
      flowTemperatureC: 200,
      systemPressureGaugePa: 'high',
      surfaceTemperatures: [{ location: '', temperatureC: 900 }],
      takenAt: new Date(Date.now() + 3_600_000).toISOString(),
    });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(
      ['flowTemperatureC', 'surfaceTemperatures[0].location', 'surfaceTemperatures[0].temperatureC', 'systemPressureGaugePa', 'takenAt'].sort(),
    );
    const empty = await as('engineer').post(`/api/assets/${a.boiler.id}/readings`, { note: '  ' });
    expect(empty.status).toBe(422);
    expect(empty.body.error.fields._).toBe('Enter at least one reading or a note.');
    expect(await readingCount()).toBe(before);
  });

  it('refuses a viewer (403), a foreign item (404) and an archived item (409)', async () => {
    const body = { flowTemperatureC: 70 };
    expect((await as('viewer').post(`/api/assets/${a.boiler.id}/readings`, body)).status).toBe(403);
    expect((await as('engineer').post(`/api/assets/${a.foreign.id}/readings`, body)).status).toBe(404);
    expect((await as('birch').post(`/api/assets/${a.boiler.id}/readings`, body)).status).toBe(404);
    expect((await as('engineer').post(`/api/assets/${a.archived.id}/readings`, body)).status).toBe(409);
  });

  it('stores SI values and its own checks: a pressure above the safety valve setting is a danger flag', async () => {
    const res = await as('engineer').post(`/api/assets/${a.boiler.id}/readings`, {
      flowTemperatureC: 80,
      returnTemperatureC: 69,
      flowRateM3PerS: litresPerSecondToM3PerS(1),
      systemPressureGaugePa: barToPa(3.1),
      surfaceTemperatures: [{ location: 'Flue spigot', temperatureC: 142 }],
      note: 'Relief valve weeping',
      // Whatever a client sends as results is not what gets stored.
      results: [],
      flags: [{ key: 'system-pressure', level: 'info', message: 'fine' }],
    });
    expect(res.status).toBe(201);
    const set = res.body as ReadingSet;
    const pressure = set.flags.find((f) => f.key === 'system-pressure');
    expect(pressure?.level).toBe('danger');
    expect(pressure?.message).toContain(SAFETY_VALVE_DANGER_TEXT);
    expect(set.results.map((r) => r.key)).toEqual(['delta-t', 'heat-delivered', 'flow-setpoint-deviation', 'system-pressure']);
    const heat = set.results.find((r) => r.key === 'heat-delivered')!;
    // from memory: steam tables give ρ ≈ 974.9 kg/m³ and c_p ≈ 4.191 kJ/(kg·K) at 74.5 °C → Q ≈ 44.94 kW at 1 L/s, 11 K
    expect(Math.abs(heat.value - 44.94)).toBeLessThan(0.3);
    expect(set.results.find((r) => r.key === 'delta-t')?.inputs).toContainEqual({ label: 'Design ΔT', value: 11, unit: 'K' });
    expect(set.settingsUsed.sources.flowSetpointC).toBe('This item in the register');
    expect(set.createdBy).toEqual({ id: u.engineer.id, name: u.engineer.name });
    const [row] = await t.db.rootQuery<Record<string, unknown>[]>('SELECT * FROM readings WHERE id = ?', [set.id]);
    expect(row.system_pressure_gauge_pa).toBe(310000);
    expect(row.flow_rate_m3_per_s).toBeCloseTo(0.001, 12);
    expect(row.worst_flag).toBe('danger');
  });

  it('uses the setpoint written on the set over the register’s, and cautions a large overshoot', async () => {
    const res = await as('engineer').post(`/api/assets/${a.pump.id}/readings`, { flowTemperatureC: 75, flowSetpointC: 60 });
    expect(res.status).toBe(201);
    const check = (res.body as ReadingSet).results.find((r) => r.key === 'flow-setpoint-deviation');
    expect(check?.value).toBe(15);
    // common practice, no published source: more than 5 K over setpoint means the controls are not holding
    expect(check?.flag?.level).toBe('caution');
    expect(res.body.settingsUsed.sources.flowSetpointC).toBe('This reading');
  });
});

describe('POST /api/readings/:id/correct', () => {
  let original: ReadingSet;
  beforeAll(async () => {
    const res = await as('engineer').post(`/api/assets/${a.pump.id}/readings`, {
      systemPressureGaugePa: barToPa(2.9),
      takenAt: '2025-01-15T09:30:00.000Z',
      note: 'Gauge read at a glance',
    });
    original = res.body;
  });

  it('lets only the author correct (403 for other engineers and supervisors, 404 for another organisation)', async () => {
    const body = { systemPressureGaugePa: barToPa(1.9), reason: 'Read the wrong gauge' };
    expect((await as('engineer2').post(`/api/readings/${original.id}/correct`, body)).status).toBe(403);
    expect((await as('supervisor').post(`/api/readings/${original.id}/correct`, body)).status).toBe(403);
    expect((await as('birch').post(`/api/readings/${original.id}/correct`, body)).status).toBe(404);
    const noReason = await as('engineer').post(`/api/readings/${original.id}/correct`, { systemPressureGaugePa: barToPa(1.9) });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields.reason).toBeTruthy();
  });

  it('appends a correction that supersedes the original, keeping the original visible and unchanged', async () => {
    // EN 12828 Annex D: 2.9 bar lies between p_e = 3 − 0.5 = 2.5 bar and the 3 bar safety valve → caution
    expect(original.flags.map((f) => f.level)).toEqual(['caution']);
    const res = await as('engineer').post(`/api/readings/${original.id}/correct`, { systemPressureGaugePa: barToPa(1.9), reason: 'Read the wrong gauge' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ supersedesId: original.id, correctionReason: 'Read the wrong gauge', takenAt: original.takenAt, flags: [] });
    const list = await as('viewer').get(`/api/assets/${a.pump.id}/readings`);
    const old = (list.body.items as ReadingSet[]).find((r) => r.id === original.id)!;
    expect(old.supersededBy).toMatchObject({ id: res.body.id, by: { id: u.engineer.id } });
    expect(old.values.systemPressureGaugePa).toBe(barToPa(2.9));
    expect(old.note).toBe('Gauge read at a glance');
    expect((list.body.items as ReadingSet[]).find((r) => r.id === res.body.id)?.supersededBy).toBeNull();
    const again = await as('engineer').post(`/api/readings/${original.id}/correct`, { systemPressureGaugePa: barToPa(2), reason: 'Second thoughts' });
    expect(again.status).toBe(409);
  });

  it('is refused by the database itself if anyone tries to edit or delete a set', async () => {
    await expect(t.db.rootQuery('UPDATE readings SET note = ? WHERE id = ?', ['edited', original.id])).rejects.toThrow(/append-only/);
    await expect(t.db.rootQuery('DELETE FROM readings WHERE id = ?', [original.id])).rejects.toThrow(/append-only/);
  });

  it('lists newest first by the time taken', async () => {
    const list = await as('engineer').get(`/api/assets/${a.pump.id}/readings`);
    const times = (list.body.items as ReadingSet[]).map((r) => Date.parse(r.takenAt));
    expect(times).toEqual([...times].sort((x, y) => y - x));
    expect(list.body.total).toBe(3);
  });
});

describe('GET /api/sites/:id/systems/:name/expansion-check', () => {
  it('checks the system’s vessels from the register, including one written with other capitals', async () => {
    const res = await as('viewer').get(`${systemPath()}/expansion-check`);
    expect(res.status).toBe(200);
    expect(res.body.missing).toEqual([]);
    expect(res.body.vessels.map((v: { plantId: string }) => v.plantId)).toEqual(['EV-01', 'EV-02']);
    expect(res.body.inputs).toMatchObject({ systemVolumeL: 500, safetyValveSettingBarGauge: 3, installedVesselVolumesL: [50, 25], preChargeBarGauge: 0.8 });
    // EN 12828:2012 Annex D: V_n,min = (V_e + V_WR)(p_e + 1)/(p_e − p_0) = (14.35 + 3) · 3.5 / (2.5 − 0.8) = 35.7 L (worked by hand)
    expect(res.body.result.requiredNominalVolumeL).toBeCloseTo(35.7, 0);
    expect(res.body.result.installedNominalVolumeL).toBe(75);
    expect(res.body.result.verdict).toBe('pass');
    // EN 12828 Annex D: the standard's own 0.2 bar margin is the default
    expect(res.body.settings.preChargeMarginBar).toBe(0.2);
  });

  it('says what is missing instead of guessing, and hides other organisations’ sites', async () => {
    await as('supervisor').put(systemPath(), { designDeltaTK: 11, safetyValveSettingGaugePa: barToPa(3) });
    const res = await as('engineer').get(`${systemPath()}/expansion-check`);
    expect(res.body.result).toBeNull();
    expect(res.body.missing).toEqual(expect.arrayContaining(['System water volume (system settings)', 'Static height (system settings)']));
    expect((await as('birch').get(`${systemPath()}/expansion-check`)).status).toBe(404);
  });
});

describe('latestReadingsForExport', () => {
  it('gives each item its latest current set, with corrections replacing the originals', async () => {
    const latest = await latestReadingsForExport(u.admin.organisationId);
    expect([...latest.keys()].sort()).toEqual([a.boiler.id, a.pump.id].sort());
    const pump = latest.get(a.pump.id)!;
    // The 2025 set was corrected, so the latest is the one logged today with a 75 °C flow.
    expect(pump.values.flowTemperatureC).toBe(75);
    expect(latest.get(a.boiler.id)?.flags[0].level).toBe('danger');
    expect((await latestReadingsForExport(birch.admin.organisationId)).size).toBe(0);
  });
});
