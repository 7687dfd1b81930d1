// Reading sets on plant items. The server always recomputes the checks with shared/calc and
// stores them with the set; the client's live checks are a convenience, never the record.
import { UniqueConstraintError, type Includeable, type Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { conflict, forbidden, notFound, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { User } from '@/server/models/user.model';
import { registerContextFor } from '@/server/services/heating-systems.service';
import { toReadingSet } from '@/server/services/readings.dto';
import { pickReadingValues } from '@/shared/rules/reading-keys';
import { resolveCheckSettings, runReadingChecks } from '@/shared/rules/readings';
import type { ReadingCorrectionInput, ReadingSetInput } from '@/shared/schemas/readings';
import type { ReadingList, ReadingSet, ReadingValues } from '@/shared/types/readings';
import type { CheckFlagLevel } from '@/shared/calc';
import { siteWhere } from '@/server/services/site-access.service';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';


const RANK: Record<CheckFlagLevel, number> = { info: 0, caution: 1, danger: 2 };

const readingIncludes = (): Includeable[] => [
  { model: User, as: 'creator', attributes: ['id', 'name'] },
  { model: Reading, as: 'correction', attributes: ['id', 'createdAt', 'createdBy'], include: [{ model: User, as: 'creator', attributes: ['id', 'name'] }] },
];

/** Another organisation's item is answered exactly like a missing one. */
async function findAsset(actor: AuthUser, id: number): Promise<Asset> {
  const asset = await Asset.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor) } });
  if (!asset) throw notFound('Item');
  return asset;
}

const values = (input: ReadingSetInput): ReadingValues => ({
  ...pickReadingValues(input),
  surfaceTemperatures: (input.surfaceTemperatures ?? []).map((s) => ({ location: s.location, temperatureC: s.temperatureC })),
});

/** Values, checks and flags of a new row, computed here from the register as it is now. */
export async function computedRow(asset: Asset, input: ReadingSetInput, transaction?: Transaction) {
  const v = values(input);
  const base = resolveCheckSettings(await registerContextFor(asset, transaction));
  let checked: ReturnType<typeof runReadingChecks>;
  try {
    checked = runReadingChecks(v, base);
  } catch (err) {
    if (err instanceof RangeError) throw unprocessable(err.message, { _: err.message });
    throw err;
  }
  const worst = checked.flags.reduce<CheckFlagLevel | null>((w, f) => (w === null || RANK[f.level] > RANK[w] ? f.level : w), null);
  return { ...v, note: input.note ?? '', results: checked.results, flags: checked.flags, settingsUsed: checked.settingsUsed, worstFlag: worst };
}

async function loadSet(id: number): Promise<ReadingSet> {
  const row = await Reading.findByPk(id, { include: readingIncludes() });
  return toReadingSet(row!);
}

/** Newest first by the time taken; corrected originals stay in the list, marked as superseded. */
export async function listReadings(actor: AuthUser, assetId: number, paging: Paging): Promise<ReadingList> {
  const asset = await findAsset(actor, assetId);
  const { rows, count } = await Reading.findAndCountAll({
    where: { assetId: asset.id },
    include: readingIncludes(),
    order: [['takenAt', 'DESC'], ['id', 'DESC']],
    ...pageRows(paging),
    distinct: true,
  });
  const checkSettings = resolveCheckSettings(await registerContextFor(asset));
  return { ...listPage(rows.map(toReadingSet), count, paging), checkSettings };
}

/**
 * Logs a set. With an Idempotency-Key, a repeat from the same person (an outbox sending again after a lost answer)
 * returns the set already stored instead of storing a second one.
 */
export async function logReadings(actor: AuthUser, assetId: number, input: ReadingSetInput, idempotencyKey: string | null = null): Promise<ReadingSet> {
  const asset = await findAsset(actor, assetId);
  const earlier = async () => (idempotencyKey ? Reading.findOne({ where: { createdBy: actor.id, idempotencyKey, assetId: asset.id } }) : null);
  const existing = await earlier();
  if (existing) return loadSet(existing.id);
  if (asset.archivedAt) throw conflict('This item is archived; readings can no longer be logged on it.');
  try {
    const row = await Reading.create({
      assetId: asset.id,
      takenAt: input.takenAt ?? clock.now(),
      ...(await computedRow(asset, input)),
      supersedesId: null,
      correctionReason: null,
      createdBy: actor.id,
      idempotencyKey,
    });
    return loadSet(row.id);
  } catch (err) {
    // Two copies of the same request at once: the unique index lets one in; the other answers with it.
    const first = err instanceof UniqueConstraintError ? await earlier() : null;
    if (first) return loadSet(first.id);
    throw err;
  }
}

/** Appends a correction by the original's author; the original is kept and marked superseded. */
export async function correctReading(actor: AuthUser, readingId: number, input: ReadingCorrectionInput): Promise<ReadingSet> {
  const original = await Reading.findByPk(readingId, { include: [{ model: Reading, as: 'correction', attributes: ['id'] }] });
  const asset = original ? await Asset.findOne({ where: { id: original.assetId, organisationId: actor.organisationId, ...siteWhere(actor) } }) : null;
  if (!original || !asset) throw notFound('Reading set');
  if (original.createdBy !== actor.id) throw forbidden('Only the engineer who logged a set can correct it.');
  if (original.correction) throw conflict(`This set has already been corrected (set ${original.correction.id}); correct the latest version instead.`);
  if (asset.archivedAt) throw conflict('This item is archived; its readings can no longer be corrected.');
  try {
    const row = await Reading.create({
      assetId: asset.id,
      takenAt: input.takenAt ?? original.takenAt,
      ...(await computedRow(asset, input)),
      supersedesId: original.id,
      correctionReason: input.reason,
      createdBy: actor.id,
    });
    return await loadSet(row.id);
  } catch (err) {
    // Two corrections racing for the same original: the unique index lets only one through.
    if (err instanceof UniqueConstraintError) throw conflict('This set has just been corrected; reload to see the latest version.');
    throw err;
  }
}

export { latestReadingsForExport, READING_EXPORT_COLUMNS } from '@/server/services/readings.export';
