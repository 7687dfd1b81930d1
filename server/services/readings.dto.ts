import type { Reading } from '@/server/models/reading.model';
import { pickReadingValues } from '@/shared/rules/reading-keys';
import type { ReadingSet, ReadingValues } from '@/shared/types/readings';

// Shapes of shared/types/readings.ts: column names never reach the client.

export function readingValues(r: Reading): ReadingValues {
  return { ...pickReadingValues(r), surfaceTemperatures: r.surfaceTemperatures ?? [] };
}

/** Expects `creator` and `correction` (with its `creator`) to be loaded. */
export function toReadingSet(r: Reading): ReadingSet {
  const c = r.correction ?? null;
  return {
    id: r.id,
    assetId: r.assetId,
    takenAt: r.takenAt.toISOString(),
    values: readingValues(r),
    note: r.note,
    results: r.results,
    flags: r.flags,
    settingsUsed: r.settingsUsed,
    createdBy: { id: r.createdBy, name: r.creator?.name ?? '' },
    createdAt: r.createdAt.toISOString(),
    supersedesId: r.supersedesId,
    correctionReason: r.correctionReason,
    supersededBy: c ? { id: c.id, at: c.createdAt.toISOString(), by: { id: c.createdBy, name: c.creator?.name ?? '' } } : null,
  };
}
