import { assetStateFromTags, type AssetTagSummary, type TagLike } from '@/shared/rules/tags';

/** Either a summary from the server or the item's live tags; both give the same at-a-glance state. */
export type StateSource = { summary: AssetTagSummary; tags?: never } | { tags: Pick<TagLike, 'kind' | 'status' | 'expiresAt' | 'proved'>[]; summary?: never };

export const summaryOf = (source: StateSource, now: Date): AssetTagSummary => source.summary ?? assetStateFromTags(source.tags, now);

/** "Isolated ×2" style count, plain words for one. */
export const isolatedLabel = (n: number) => (n > 1 ? `Isolated ×${n}` : 'Isolated');
