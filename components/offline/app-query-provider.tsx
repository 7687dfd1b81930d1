import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { useState, type ReactNode } from 'react';
import { RequestError } from '@/hooks/api/request';
import { OFFLINE_CACHE_MAX_AGE_MS, keepOffline } from '@/hooks/offline/offline-cache';
import { queryPersister } from '@/hooks/offline/query-persistence';

function makeQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // A 4xx will not get better by asking again.
        retry: (count, err) => !(err instanceof RequestError && err.status >= 400 && err.status < 500) && count < 2,
        // Kept in memory as long as on disk, or the copy on disk would lose it.
        gcTime: OFFLINE_CACHE_MAX_AGE_MS,
      },
      // Sent at once, even with no signal: an action that cannot reach the server goes to the outbox instead of waiting silently.
      mutations: { networkMode: 'always' },
    },
  });
}

/** React Query for the app; on the web its cache is also kept in IndexedDB for use with no signal. */
export function AppQueryProvider({ children }: { children: ReactNode }) {
  const [client] = useState(makeQueryClient);
  if (!queryPersister) return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return (
    <PersistQueryClientProvider
      client={client}
      persistOptions={{
        persister: queryPersister,
        maxAge: OFFLINE_CACHE_MAX_AGE_MS,
        dehydrateOptions: { shouldDehydrateQuery: keepOffline },
      }}
    >
      {children}
    </PersistQueryClientProvider>
  );
}
