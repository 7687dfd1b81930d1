import { createStore, del, set, values } from 'idb-keyval';
import type { OutboxEntry, OutboxStore } from '@/hooks/offline/outbox-types';

/** The outbox in IndexedDB: it survives a reload, a closed tab and an expired session. */
export function createOutboxStore(dbName = 'isoledger-outbox'): OutboxStore {
  // Its own database: idb-keyval opens one object store per database.
  const store = createStore(dbName, 'entries');
  return {
    all: () => values<OutboxEntry>(store),
    put: (entry) => set(entry.key, entry, store),
    remove: (key) => del(key, store),
  };
}
