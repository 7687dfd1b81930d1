import type { OutboxEntry, OutboxStore } from '@/hooks/offline/outbox-types';

/** Native keeps the outbox in memory for now; the web's survives reloads (outbox-store.web.ts). */
export function createOutboxStore(): OutboxStore {
  const entries = new Map<string, OutboxEntry>();
  return {
    all: async () => [...entries.values()],
    put: async (entry) => { entries.set(entry.key, entry); },
    remove: async (key) => { entries.delete(key); },
  };
}
