import type { QueryClient } from '@tanstack/react-query';
import { RequestError } from '@/hooks/api/request';
import { knownOffline } from '@/hooks/offline/connectivity';
import type { Asset } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/user';

type Cached = Asset | ListResponse<Asset> | undefined;

/** Every item the cache holds: single records, and the rows of lists (a plant room's items, a search). */
function* cachedAssets(qc: QueryClient, keys: readonly (readonly unknown[])[]): Generator<{ asset: Asset; updatedAt: number }> {
  for (const queryKey of keys) {
    for (const query of qc.getQueryCache().findAll({ queryKey })) {
      const data = query.state.data as Cached;
      if (!data || typeof data !== 'object') continue;
      const items = 'items' in data && Array.isArray(data.items) ? data.items : 'labelCode' in data ? [data] : [];
      for (const asset of items) yield { asset, updatedAt: query.state.dataUpdatedAt };
    }
  }
}

// Item records, lists of items, and label look-ups (their answer is the item's record).
const ITEM_KEYS = [['assets'], ['labels']] as const;

/** The newest copy of an item the cache holds under any of those keys. */
function newest(qc: QueryClient, match: (a: Asset) => boolean): { asset: Asset; updatedAt: number } | undefined {
  let best: { asset: Asset; updatedAt: number } | undefined;
  for (const found of cachedAssets(qc, ITEM_KEYS)) {
    if (match(found.asset) && (!best || found.updatedAt > best.updatedAt)) best = found;
  }
  return best;
}

/**
 * The item a label code names, from what the cache holds: so a label scanned in a basement opens its record with
 * no signal when the item, or its plant room's list of items, was opened recently (the cache is kept on the device).
 */
export const cachedAssetByLabel = (qc: QueryClient, code: string) => newest(qc, (a) => a.labelCode === code)?.asset;

/**
 * With no signal, an item never opened on its own still opens from the row its plant room's list (or a search)
 * left in the cache: as the query's first data when the device already knows there is no signal, and in place of
 * the record when the request finds none.
 */
export function offlineAssetCopy(qc: QueryClient, id: number): { data: Asset; updatedAt: number } | undefined {
  if (!knownOffline()) return undefined;
  const found = newest(qc, (a) => a.id === id);
  return found ? { data: found.asset, updatedAt: found.updatedAt } : undefined;
}

export function assetCopyOr(qc: QueryClient, id: number, err: unknown): Asset {
  const copy = err instanceof RequestError && err.status === 0 ? newest(qc, (a) => a.id === id) : undefined;
  if (!copy) throw err;
  return copy.asset;
}
