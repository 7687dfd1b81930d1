import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let users: OrgUsers;
const tokens: Partial<Record<keyof OrgUsers, string>> = {};

beforeAll(async () => {
  t = await setupTestApp();
  users = (await createOrganisation('calc')).users;
  for (const role of ['engineer', 'viewer'] as const) tokens[role] = await tokenFor(t.app, users[role]);
});
afterAll(() => t.close());

// A 500 L low-temperature hot water system, invented for these tests.
const smallSystem = {
  systemVolumeL: 500,
  fillTemperatureC: 10,
  maxFlowTemperatureC: 80,
  staticHeightM: 5,
  safetyValveSettingBarGauge: 3,
  installedVesselVolumesL: [50],
};
const post = (body: unknown, role: keyof OrgUsers = 'engineer') =>
  request(t.app).post('/api/calc/expansion-vessel').set('Authorization', `Bearer ${tokens[role]}`).send(body as object);

describe('POST /api/calc/expansion-vessel', () => {
  it('needs a signed-in user', async () => {
    const res = await request(t.app).post('/api/calc/expansion-vessel').send(smallSystem);
    expect(res.status).toBe(401);
  });

  it('sizes the vessel for any role, with the working and the default pre-charge margin and its source', async () => {
    const res = await post(smallSystem, 'viewer');
    expect(res.status).toBe(200);
    expect(res.body.inputs).toMatchObject({ ...smallSystem, preChargeBarGauge: null });
    // EN 12828 Annex D: p_0 ≥ p_st + p_D + 0.2 bar is the default margin
    expect(res.body.settings.preChargeMarginBar).toBe(0.2);
    expect(res.body.settings.preChargeMarginSource).toMatch(/EN 12828/);
    expect(res.body.settings.choices.map((c: { value: number }) => c.value)).toEqual([0.2, 0.3]);
    // EN 12828:2012 Annex D: V_n,min = (V_e + V_WR)(p_e + 1)/(p_e − p_0) = 17.355 · 3.5 / 1.8097 = 33.56 L (worked by hand)
    expect(res.body.result.requiredNominalVolumeL).toBeCloseTo(33.56, 1);
    // from memory: EN 12828:2012 Annex D, p_e = p_SV − 0.5 bar for p_SV ≤ 5 bar
    expect(res.body.result.finalPressureBarGauge).toBe(2.5);
    expect(res.body.result.verdict).toBe('pass');
    expect(res.body.result.working.map((s: { key: string }) => s.key)).toContain('required-nominal-volume');
    expect(res.body.result.working.every((s: { substituted: string }) => s.substituted.includes('='))).toBe(true);
  });

  it('uses the 0.3 bar site practice when chosen, needing a bigger vessel', async () => {
    const res = await post({ ...smallSystem, preChargeMarginBar: 0.3 });
    expect(res.status).toBe(200);
    expect(res.body.settings.preChargeMarginBar).toBe(0.3);
    // common practice, no published source: 0.3 bar above the static head, offered as a site practice
    expect(res.body.settings.preChargeMarginSource).toMatch(/no published source/);
    // 5 m / 10.197 m/bar + 0.3 bar = 0.7903 bar (worked by hand)
    expect(res.body.result.preChargeBarGauge).toBeCloseTo(0.7903, 4);
    // EN 12828 Annex D: (14.355 + 3) · 3.5 / (2.5 − 0.7903) = 35.53 L (worked by hand)
    expect(res.body.result.requiredNominalVolumeL).toBeCloseTo(35.53, 1);
  });

  it('sizes with glycol, in size-only mode, and cautions a measured pressure above p_e', async () => {
    const res = await post({ ...smallSystem, installedVesselVolumesL: [], mode: 'size', glycol: { kind: 'propylene', percent: 30 }, measuredPressureBarGauge: 2.6 });
    expect(res.status).toBe(200);
    expect(res.body.result.verdict).toBe('sized');
    expect(res.body.result.working[0].source).toMatch(/M\. Conde/);
    // EN 12828 Annex D: p_e = 3 − 0.5 = 2.5 bar; 2.6 bar is between p_e and p_SV
    expect(res.body.result.cautions[0]).toMatch(/waterlogged/);
    expect((await post({ ...smallSystem, glycol: { kind: 'propylene', percent: 80 } })).status).toBe(422);
  });

  it('fails an undersized vessel and says why', async () => {
    const res = await post({ ...smallSystem, installedVesselVolumesL: [18, 8] });
    expect(res.status).toBe(200);
    expect(res.body.result.verdict).toBe('fail');
    expect(res.body.result.installedNominalVolumeL).toBe(26);
    expect(res.body.result.reasons.join(' ')).toMatch(/Installed 26 L is less than the required 33\.5\d* L/);
  });

  it('refuses missing, out-of-range and inconsistent inputs with 422 and the fields', async () => {
    const res = await post({
      ...smallSystem,
      systemVolumeL: undefined,
      maxFlowTemperatureC: 5,
      safetyValveSettingBarGauge: 0,
      installedVesselVolumesL: [25, -1],
      preChargeMarginBar: 0.25,
    });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(
      ['installedVesselVolumesL[1]', 'maxFlowTemperatureC', 'preChargeMarginBar', 'safetyValveSettingBarGauge', 'systemVolumeL'].sort(),
    );
    expect(res.body.error.fields.maxFlowTemperatureC).toBe('Maximum flow temperature must be above the fill temperature');
  });

  it('refuses text where a number belongs', async () => {
    const res = await post({ ...smallSystem, staticHeightM: 'five' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.staticHeightM).toBeTruthy();
  });
});
