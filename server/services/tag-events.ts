import type { Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import type { AuthUser } from '@/server/middleware/auth';
import type { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import type { Idempotency } from '@/server/services/tag-idempotency';
import type { TagEventType } from '@/shared/rules/tags';

/** Appends to a tag's history (append-only in the database); the event carries the action's Idempotency-Key. */
export async function appendEvent(tag: Tag, type: TagEventType, actor: AuthUser, data: Record<string, unknown>, transaction: Transaction, idem: Idempotency | null = null) {
  await TagEvent.create(
    { tagId: tag.id, organisationId: tag.organisationId, type, at: clock.now(), byId: actor.id, data, idempotencyKey: idem?.key ?? null, requestHash: idem?.hash ?? null },
    { transaction },
  );
}
