import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { Persister } from '@tanstack/react-query-persist-client';
import { createStore, del, get, set } from 'idb-keyval';

// Its own database: idb-keyval opens one object store per database.
const store = createStore('isoledger-queries', 'cache');

/** The react-query cache kept in IndexedDB, so a record opened earlier reads with no signal. */
export const queryPersister: Persister | null =
  typeof indexedDB === 'undefined'
    ? null
    : createAsyncStoragePersister({
        storage: {
          getItem: (key) => get<string>(key, store).then((v) => v ?? null),
          setItem: (key, value) => set(key, value, store),
          removeItem: (key) => del(key, store),
        },
        key: 'isoledger-query-cache',
        throttleTime: 1000,
      });
