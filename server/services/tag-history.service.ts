/** A tag's history (append-only): appending and reading events, and replaying an action by the Idempotency-Key stored on its event. */
import { createHash } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import type { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { User } from '@/server/models/user.model';
import type { TagEventType } from '@/shared/rules/tags';

/** Appends to a tag's history (append-only in the database); the event carries the action's Idempotency-Key. */
export async function appendEvent(tag: Tag, type: TagEventType, actor: AuthUser, data: Record<string, unknown>, transaction: Transaction, idem: Idempotency | null = null) {
  await TagEvent.create(
    { tagId: tag.id, organisationId: tag.organisationId, type, at: clock.now(), byId: actor.id, data, idempotencyKey: idem?.key ?? null, requestHash: idem?.hash ?? null },
    { transaction },
  );
}

export async function loadEvents(tagId: number, transaction?: Transaction) {
  return TagEvent.findAll({ where: { tagId }, include: [{ model: User, as: 'by' }], order: [['id', 'ASC']], transaction });
}

/** An action's Idempotency-Key and a fingerprint of what it asked for (action, target and body). */
export interface Idempotency {
  key: string;
  hash: string;
}

/** Stable JSON: object keys sorted, Dates as ISO strings, Buffers as their own SHA-256. */
function stable(value: unknown): unknown {
  if (value instanceof Date) return value.toISOString();
  if (Buffer.isBuffer(value)) return `sha256:${createHash('sha256').update(value).digest('hex')}`;
  if (Array.isArray(value)) return value.map(stable);
  if (value && typeof value === 'object') return Object.fromEntries(Object.keys(value).sort().map((k) => [k, stable((value as Record<string, unknown>)[k])]));
  return value;
}

/**
 * Reads the `Idempotency-Key` header (the one convention for every tag action: raise, prove, extend, notes, photos,
 * hand-over offer/accept/withdraw, acknowledge) and fingerprints the request, or null when no key was sent.
 */
export function idempotencyFor(header: string | undefined, action: string, target: number, body: unknown): Idempotency | null {
  const key = header?.trim().slice(0, 100);
  if (!key) return null;
  return { key, hash: createHash('sha256').update(JSON.stringify(stable({ action, target, body }))).digest('hex') };
}

/** The tag an earlier request with this key acted on; 422 when the key came with a different request. */
async function earlier(actor: AuthUser, idem: Idempotency): Promise<number | null> {
  const event = await TagEvent.findOne({ where: { byId: actor.id, idempotencyKey: idem.key }, attributes: ['tagId', 'requestHash'] });
  if (!event) return null;
  if (event.requestHash !== idem.hash) {
    throw new HttpError(422, 'idempotency-key-reused', 'This Idempotency-Key was already used for a different request. Send a new key for a new action.');
  }
  return event.tagId;
}

/**
 * Runs an action once per key: a retry with the same key and request answers with the tag the first one acted on
 * and writes nothing; two racing retries are settled by the unique (by_id, idempotency_key) index on tag_events.
 */
export async function once(actor: AuthUser, idem: Idempotency | null, run: () => Promise<number>): Promise<{ tagId: number; replayed: boolean }> {
  if (idem) {
    const tagId = await earlier(actor, idem);
    if (tagId !== null) return { tagId, replayed: true };
  }
  try {
    return { tagId: await run(), replayed: false };
  } catch (err) {
    if (idem && err instanceof UniqueConstraintError) {
      const tagId = await earlier(actor, idem);
      if (tagId !== null) return { tagId, replayed: true };
    }
    throw err;
  }
}
