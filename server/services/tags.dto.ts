/** A tag in the API's shape (`Tag` of shared/types/tags.ts), and the one query include that shape needs. */
import { clock } from '@/server/lib/clock';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { User } from '@/server/models/user.model';
import { isDueSoon, isOverdue } from '@/shared/rules/tags';
import { offerIsOpen } from '@/shared/rules/tag-handover';
import type { Tag as TagDto, TagEvent as TagEventDto } from '@/shared/types/tags';

export const person = (u: User | null | undefined) => (u ? { id: u.id, name: u.name } : { id: 0, name: 'Unknown' });

/** Everything a tag answer needs, in one query. */
export const tagInclude = [
  { model: Asset, as: 'asset', include: [{ model: Site, as: 'site' }, { model: PlantRoom, as: 'plantRoom' }] },
  { model: TagPoint, as: 'points', include: [{ model: Asset, as: 'asset' }] },
  { model: User, as: 'holder' },
  { model: User, as: 'raisedBy' },
  { model: User, as: 'clearedBy' },
  { model: User, as: 'offerTo' },
  { model: TagProof, as: 'proofs', include: [{ model: User, as: 'by' }] },
];

/** An isolation is proved once a proof is recorded; an override has nothing to prove (null). */
export const provedOf = (tag: Pick<Tag, 'kind' | 'proofs'>) => (tag.kind === 'isolation' ? (tag.proofs ?? []).length > 0 : null);

export function toTagDto(tag: Tag, events?: TagEvent[]): TagDto {
  const now = clock.now();
  const asset = (tag as Tag & { asset: Asset }).asset;
  return {
    id: tag.id,
    assetId: tag.assetId,
    asset: {
      id: asset.id,
      plantId: asset.plantId,
      name: asset.name,
      siteId: asset.siteId,
      siteName: asset.site?.name ?? '',
      plantRoomName: asset.plantRoom?.name ?? null,
      timeZone: asset.site?.timeZone ?? 'UTC',
    },
    kind: tag.kind,
    status: tag.status,
    overdue: isOverdue(tag, now),
    dueSoon: isDueSoon(tag, now),
    reason: tag.reason,
    holder: person(tag.holder),
    holderId: tag.holderId,
    raisedBy: person(tag.raisedBy),
    raisedAt: tag.raisedAt.toISOString(),
    expiresAt: tag.expiresAt.toISOString(),
    contactPhone: tag.contactPhone,
    lockNumber: tag.lockNumber,
    energySources: tag.energySources,
    omittedSources: tag.omittedSources ?? [],
    points: (tag.points ?? []).map((p) => {
      const pa = (p as TagPoint & { asset: Asset | null }).asset;
      return { id: p.id, assetId: p.assetId, asset: pa ? { id: pa.id, plantId: pa.plantId, name: pa.name } : null, description: p.description, method: p.method, lockNumber: p.lockNumber };
    }),
    proved: provedOf(tag),
    proofs: [...(tag.proofs ?? [])].sort((a, b) => a.id - b.id).map((p) => ({
      id: p.id, method: p.method, instrument: p.instrument, reading: p.reading, note: p.note, by: person(p.by), at: p.at.toISOString(),
    })),
    handoverOffer: tag.status === 'live' && offerIsOpen({ toUserId: tag.offerToId ?? null, lapsesAt: tag.offerLapsesAt ?? null }, now)
      ? { to: person(tag.offerTo), note: tag.offerNote ?? '', offeredAt: tag.offeredAt!.toISOString(), lapsesAt: tag.offerLapsesAt!.toISOString() }
      : null,
    normalState: tag.normalState,
    leftState: tag.leftState,
    clearedAt: tag.clearedAt ? tag.clearedAt.toISOString() : null,
    clearedBy: tag.clearedBy ? person(tag.clearedBy) : null,
    checks: tag.checks ?? null,
    photoCount: 0,
    ...(events ? { events: events.map(toEventDto) } : {}),
  };
}

function toEventDto(e: TagEvent): TagEventDto {
  return { id: Number(e.id), type: e.type, at: e.at.toISOString(), by: person(e.by), data: e.data };
}
