import type { Query } from '@tanstack/react-query';

/** How long a record opened with a signal stays readable without one. */
export const OFFLINE_CACHE_MAX_AGE_MS = 7 * 24 * 60 * 60 * 1000;

// What an engineer needs in a plant room with no signal: who they are, the sites and plant rooms they opened,
// their items (by id and by label code), tags and readings. Board, team and settings need a signal anyway.
const KEPT_OFFLINE = new Set(['me', 'sites', 'plant-rooms', 'assets', 'labels', 'tags', 'readings', 'heating-systems']);

/**
 * Which answers are written to the device: any the resources above hold data for. A refetch that failed with no
 * signal leaves the query in error but keeps its data; dropping it then would lose the record at the next reload.
 */
export function keepOffline(query: Query): boolean {
  return query.state.data !== undefined && KEPT_OFFLINE.has(String(query.queryKey[0]));
}
