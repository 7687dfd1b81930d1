import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import { PlaceGrid, PlaceTile } from '@/components/register/place-tile';
import type { Site } from '@/shared/types/register';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Sites as large tiles to browse from: site → plant rooms → items. */
export function SiteList({ sites }: { sites: Site[] }) {
  if (sites.length === 0) return <EmptyState icon="office-building-outline" title="No sites yet">A supervisor adds the sites your team looks after.</EmptyState>;
  return (
    <PlaceGrid>
      {sites.map((s) => (
        <PlaceTile key={s.id} href={`/sites/${s.id}`} icon="office-building-outline" name={s.name} detail={s.address} testID={`site-${s.id}`}>
          <Text variant="small">{`${plural(s.plantRoomCount, 'plant room', 'plant rooms')} · ${plural(s.assetCount, 'item', 'items')}`}</Text>
        </PlaceTile>
      ))}
    </PlaceGrid>
  );
}
