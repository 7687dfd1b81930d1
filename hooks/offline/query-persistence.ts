import type { Persister } from '@tanstack/react-query-persist-client';

/** Native keeps no copy on disk yet; the web's is in query-persistence.web.ts. */
export const queryPersister: Persister | null = null;
