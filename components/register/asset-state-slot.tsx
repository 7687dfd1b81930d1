import { AssetTagsPanel } from '@/components/tags/asset-tags-panel';
import type { Asset } from '@/shared/types/register';

/** The item's live state on its record: its tags, state banner and tag history. */
export function AssetStateSlot({ asset }: { asset: Asset }) {
  return <AssetTagsPanel asset={asset} />;
}
