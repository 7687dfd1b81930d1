import bcrypt from 'bcryptjs';
import { WorkLimit } from '@/server/lib/work-limit';

/**
 * Every bcrypt hash or comparison goes through this limit: bcryptjs runs on the event loop, so a flood of sign-ins
 * could otherwise starve every other request. Two at once (the machine has few cores), 32 waiting, then 503.
 */
export const passwordWork = new WorkLimit({
  concurrency: 2,
  queue: 32,
  retryAfterSeconds: 5,
  busyMessage: 'The server is busy with other sign-ins. Try again in a few seconds.',
});

export const hashPassword = (password: string, cost: number) => passwordWork.run(() => bcrypt.hash(password, cost));

// Hashes to compare against when there is no stored hash, one per cost, so a missing account costs what a real one does.
const dummyHashes = new Map<number, Promise<string>>();

/**
 * Compares a password with a stored hash, or with a stand-in of the same cost when there is none, so an unknown
 * account takes as long as a known one. Returns whether it matched and whether the stored hash should be redone
 * at the configured cost (hashes made at another cost would make known and unknown accounts take different times).
 */
export async function checkPassword(password: string, storedHash: string | null, cost: number): Promise<{ ok: boolean; rehash: boolean }> {
  if (!dummyHashes.has(cost)) dummyHashes.set(cost, bcrypt.hash('no account has this password', cost));
  const hash = storedHash ?? (await dummyHashes.get(cost)!);
  const ok = await passwordWork.run(() => bcrypt.compare(password, hash));
  return { ok: ok && !!storedHash, rehash: ok && !!storedHash && bcrypt.getRounds(storedHash) !== cost };
}
