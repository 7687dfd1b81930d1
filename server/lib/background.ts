import { logger } from '@/server/lib/logger';

const pending = new Set<Promise<void>>();

/**
 * Runs work after the answer has gone (so its length tells the client nothing); a failure is logged.
 * The work must not need the request any more.
 */
export function afterResponse(what: string, work: () => Promise<unknown>): void {
  const p: Promise<void> = work()
    .then(() => undefined)
    .catch((err) => logger.error({ err }, `${what} failed`))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Resolves when all work started by afterResponse so far has finished (tests, and a graceful stop). */
export async function backgroundSettled(): Promise<void> {
  while (pending.size) await Promise.all([...pending]);
}
