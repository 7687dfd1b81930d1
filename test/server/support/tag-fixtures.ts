import { Tag } from '@/server/models/tag.model';
import type { TagKind } from '@/shared/rules/tags';

/**
 * A tag written straight to the database, so a test can place its expiry anywhere (the API refuses past
 * expiries). Raised an hour before `now` by its holder unless told otherwise.
 */
export function insertTag(opts: {
  organisationId: number; assetId: number; holderId: number; now: Date; expiresInHours: number;
  kind?: TagKind; reason?: string; status?: 'live' | 'cleared'; raisedHoursAgo?: number; contactPhone?: string;
}) {
  const hour = 3600_000;
  return Tag.create({
    organisationId: opts.organisationId,
    assetId: opts.assetId,
    kind: opts.kind ?? 'isolation',
    status: opts.status ?? 'live',
    reason: opts.reason ?? 'Planned maintenance',
    raisedById: opts.holderId,
    holderId: opts.holderId,
    raisedAt: new Date(opts.now.getTime() - (opts.raisedHoursAgo ?? 1) * hour),
    expiresAt: new Date(opts.now.getTime() + opts.expiresInHours * hour),
    contactPhone: opts.contactPhone ?? '+44 7700 900111',
    lockNumber: '',
    energySources: [],
    normalState: '',
    leftState: '',
    idempotencyKey: null,
  });
}
