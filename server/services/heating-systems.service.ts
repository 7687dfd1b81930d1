// Heating system design values (per site + system name) and what the register knows about
// each system: its pressurisation unit, its expansion vessels. Scoped to the caller's organisation.
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { HttpError, notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { HeatingSystem as HeatingSystemRow } from '@/server/models/heating-system.model';
import { User } from '@/server/models/user.model';
import { describeSettings, expansionSettingsFor, runExpansionCheck } from '@/server/services/calc.service';
import { findSite } from '@/server/services/register.lookup';
import { expansionInputsFor, SYSTEM_FILL_AND_CURVE_KEYS, type RegisterContext } from '@/shared/rules/readings';
import type { GasFamily } from '@/shared/calc';
import type { HeatingSystemInput } from '@/shared/schemas/readings';
import type { HeatingSystem, RegisterVessel, SystemExpansionCheck } from '@/shared/types/readings';
import type { ListResponse } from '@/shared/types/api';

const VALUE_KEYS = [
  'designDeltaTK',
  'flowSetpointC',
  'fillPressureGaugePa',
  'safetyValveSettingGaugePa',
  'systemVolumeM3',
  'staticHeightM',
  'maxFlowTemperatureC',
  'fillTemperatureC',
  'preChargeMarginBar',
  ...SYSTEM_FILL_AND_CURVE_KEYS,
] as const;

const numberAttr = (attributes: Record<string, unknown> | null | undefined, key: string): number | null => {
  const v = attributes?.[key];
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
};

const lowest = (values: (number | null)[]): number | null => {
  const known = values.filter((v): v is number => v !== null);
  return known.length ? Math.min(...known) : null;
};

/** Natural gas or LPG from the item's recorded fuel; a gas-fired item with no fuel recorded is taken as natural gas. */
function gasFamilyOf(asset: Asset): GasFamily | null {
  const fuel = asset.attributes?.fuel;
  if (fuel === 'natural-gas' || fuel === 'lpg') return fuel;
  if (fuel) return null;
  return asset.energySources.includes('gas') && (asset.type === 'boiler' || asset.type === 'water-heater') ? 'natural-gas' : null;
}

function toDto(siteId: number, name: string, row: HeatingSystemRow | null, assetCount: number): HeatingSystem {
  const values = Object.fromEntries(VALUE_KEYS.map((k) => [k, row?.[k] ?? null])) as Pick<HeatingSystem, (typeof VALUE_KEYS)[number]>;
  return {
    siteId,
    name: row?.name ?? name,
    configured: !!row,
    ...values,
    assetCount,
    updatedAt: row?.updatedAt.toISOString() ?? null,
    updatedBy: row ? { id: row.updatedBy, name: row.editor?.name ?? '' } : null,
  };
}

/** Items on a site whose system text matches (the column's collation ignores case). */
const systemAssets = (organisationId: number, siteId: number, name: string, transaction?: Transaction) =>
  Asset.findAll({ where: { organisationId, siteId, system: name, archivedAt: null }, order: [['plantId', 'ASC']], transaction });

async function findRow(organisationId: number, siteId: number, name: string, transaction?: Transaction) {
  return HeatingSystemRow.findOne({ where: { organisationId, siteId, name }, include: [{ model: User, as: 'editor' }], transaction });
}

/** Every system named on the site's items, plus any with saved values, in name order. */
export async function listSystems(actor: AuthUser, siteId: number): Promise<ListResponse<HeatingSystem>> {
  const site = await findSite(actor, siteId);
  const assets = await Asset.findAll({
    where: { organisationId: actor.organisationId, siteId: site.id, archivedAt: null, system: { [Op.ne]: '' } },
    attributes: ['system'],
  });
  const rows = await HeatingSystemRow.findAll({ where: { organisationId: actor.organisationId, siteId: site.id }, include: [{ model: User, as: 'editor' }] });
  const byKey = new Map<string, { name: string; count: number; row: HeatingSystemRow | null }>();
  const key = (name: string) => name.trim().toLowerCase();
  for (const a of assets) {
    const entry = byKey.get(key(a.system)) ?? { name: a.system.trim(), count: 0, row: null };
    entry.count += 1;
    byKey.set(key(a.system), entry);
  }
  for (const r of rows) {
    const entry = byKey.get(key(r.name)) ?? { name: r.name, count: 0, row: null };
    entry.row = r;
    byKey.set(key(r.name), entry);
  }
  const items = [...byKey.values()]
    .sort((a, b) => a.name.localeCompare(b.name, 'en', { numeric: true }))
    .map((e) => toDto(site.id, e.name, e.row, e.count));
  return { items, total: items.length, page: 1, pageSize: Math.max(items.length, 1) };
}

export async function getSystem(actor: AuthUser, siteId: number, name: string): Promise<HeatingSystem> {
  const site = await findSite(actor, siteId);
  const [row, assets] = await Promise.all([findRow(actor.organisationId, site.id, name), systemAssets(actor.organisationId, site.id, name)]);
  if (!row && !assets.length) throw notFound('System');
  return toDto(site.id, name, row, assets.length);
}

/** Saves the design values; the system must be named on at least one item of the site. */
export async function saveSystem(actor: AuthUser, siteId: number, name: string, input: HeatingSystemInput): Promise<HeatingSystem> {
  const site = await findSite(actor, siteId);
  const assets = await systemAssets(actor.organisationId, site.id, name);
  if (!assets.length) throw notFound('System');
  const values = Object.fromEntries(VALUE_KEYS.map((k) => [k, input[k] ?? null])) as unknown as Pick<HeatingSystemRow, (typeof VALUE_KEYS)[number]>;
  const existing = await findRow(actor.organisationId, site.id, name);
  if (existing) await existing.update({ ...values, updatedBy: actor.id });
  else {
    try {
      await HeatingSystemRow.create({ organisationId: actor.organisationId, siteId: site.id, name: assets[0].system.trim(), ...values, updatedBy: actor.id });
    } catch (err) {
      // Saved by someone else a moment ago: the unique (site, name) index stopped a second row; this save wins.
      if (!(err instanceof UniqueConstraintError)) throw err;
      await (await findRow(actor.organisationId, site.id, name))!.update({ ...values, updatedBy: actor.id });
    }
  }
  return toDto(site.id, name, await findRow(actor.organisationId, site.id, name), assets.length);
}

/** What the checks of one item need from the register: its system's values and pressurisation unit. */
export async function registerContextFor(asset: Asset, transaction?: Transaction): Promise<RegisterContext> {
  const systemName = asset.system.trim() || null;
  const setpoint = asset.type === 'boiler' ? numberAttr(asset.attributes, 'flowSetpointC') : null;
  const gas = { gasFamily: gasFamilyOf(asset), burnerPressureSettingMbar: numberAttr(asset.attributes, 'burnerPressureMbar') };
  if (!systemName) return { siteId: asset.siteId, systemName, system: null, pressurisationUnits: [], assetFlowSetpointC: setpoint, ...gas };
  const [row, assets] = await Promise.all([
    findRow(asset.organisationId, asset.siteId, systemName, transaction),
    systemAssets(asset.organisationId, asset.siteId, systemName, transaction),
  ]);
  return {
    siteId: asset.siteId,
    systemName,
    system: toDto(asset.siteId, systemName, row, assets.length),
    pressurisationUnits: assets
      .filter((a) => a.type === 'pressurisation-unit')
      .map((a) => ({ plantId: a.plantId, fillPressureBar: numberAttr(a.attributes, 'fillPressureBar') })),
    assetFlowSetpointC: setpoint,
    vesselPreChargeBar: lowest(assets.filter((a) => a.type === 'vessel').map((a) => numberAttr(a.attributes, 'preChargeBar'))),
    ...gas,
  };
}

/** The EN 12828 vessel check for a system, against the vessels recorded on it in the register. */
export async function systemExpansionCheck(actor: AuthUser, siteId: number, name: string): Promise<SystemExpansionCheck> {
  const system = await getSystem(actor, siteId, name);
  const assets = await systemAssets(actor.organisationId, system.siteId, name);
  const vessels: RegisterVessel[] = assets
    .filter((a) => a.type === 'vessel')
    .map((a) => ({
      assetId: a.id,
      plantId: a.plantId,
      name: a.name,
      capacityL: numberAttr(a.attributes, 'capacityL'),
      preChargeBar: numberAttr(a.attributes, 'preChargeBar'),
    }));
  const { inputs, missing, complete } = expansionInputsFor(system, vessels);
  const settings = expansionSettingsFor(system.preChargeMarginBar);
  let result: SystemExpansionCheck['result'] = null;
  try {
    result = complete ? runExpansionCheck(complete, settings) : null;
  } catch (err) {
    // Stored values the arithmetic refuses are reported like missing ones, not as a failed request.
    if (!(err instanceof HttpError)) throw err;
    missing.push(err.message);
  }
  return {
    siteId: system.siteId,
    systemName: system.name,
    system,
    vessels,
    missing,
    inputs,
    settings: describeSettings(settings),
    result,
  };
}
