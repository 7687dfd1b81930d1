import { AssetTagsPanel } from '@/components/tags/asset-tags-panel';
import { PointUseNotice } from '@/components/tags/point-use-notice';
import type { Asset } from '@/shared/types/register';

/** The item's live state on its record: where it is an isolation point, its tags, state banner and tag history. */
export function AssetStateSlot({ asset }: { asset: Asset }) {
  return (
    <>
      <PointUseNotice uses={asset.pointUses ?? []} />
      <AssetTagsPanel asset={asset} />
    </>
  );
}
