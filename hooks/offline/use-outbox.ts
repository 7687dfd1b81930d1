import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { useEffect, useSyncExternalStore } from 'react';
import { useAuth } from '@/hooks/auth/auth-provider';
import { flushOutbox, outbox, tokenOwner } from '@/hooks/offline/send-or-queue';
import type { OutboxEntry } from '@/hooks/offline/outbox-types';

// How often waiting entries are tried again while the app is open, besides the browser's "online" event.
const RETRY_EVERY_MS = 15_000;
// How often, with no signal, the server is looked for.
const PROBE_EVERY_MS = 5_000;

/** Every entry on this device, oldest first; re-renders when one is added, sent or refused. */
export function useOutboxEntries(): OutboxEntry[] {
  const all = useSyncExternalStore(outbox.subscribe, outbox.snapshot, outbox.snapshot);
  const { token } = useAuth();
  useEffect(() => { void outbox.load(); }, []);
  // Only the signed-in person's actions: a shared device never shows one person's entries to the next.
  const owner = tokenOwner(token);
  return all.filter((e) => e.owner === owner);
}

/**
 * Sends the outbox after sign-in, when the connection returns and every few seconds while entries wait;
 * refreshes the records once something was sent. Mounted once, inside the signed-in layout.
 */
export function useOutboxSender() {
  const { token } = useAuth();
  const qc = useQueryClient();
  useEffect(() => {
    if (!token) return undefined;
    let stopped = false;
    const send = async () => {
      const result = await flushOutbox();
      if (!stopped && (result.sent > 0 || result.refused > 0)) await qc.invalidateQueries();
    };
    void send();
    const onOnline = () => void send();
    const timer = setInterval(() => { if (outbox.snapshot().some((e) => e.state === 'waiting')) void send(); }, RETRY_EVERY_MS);
    // With no signal nothing else asks the server, so a small request looks for it; its answer resumes react-query.
    const probe = setInterval(() => { if (!onlineManager.isOnline()) void request('/health').catch(() => undefined); }, PROBE_EVERY_MS);
    const stopWatching = onlineManager.subscribe((online) => { if (online) void send(); });
    if (typeof window !== 'undefined' && window.addEventListener) window.addEventListener('online', onOnline);
    return () => {
      stopped = true;
      clearInterval(timer);
      clearInterval(probe);
      stopWatching();
      if (typeof window !== 'undefined' && window.removeEventListener) window.removeEventListener('online', onOnline);
    };
  }, [token, qc]);
}
