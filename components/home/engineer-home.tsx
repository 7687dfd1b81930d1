import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { LiveTagsPanel } from '@/components/places/live-tags-panel';
import { agoPhrase } from '@/components/tags/tag-time';
import { useNow } from '@/components/tags/use-now';
import { useMyTagsQuery, useMyVisitQuery, useRecentPlacesQuery } from '@/hooks/api/use-me';
import { useTagsQuery } from '@/hooks/api/use-tags';
import { TagNoticesBanner } from '@/components/tags/tag-notices-banner';
import type { RecentPlace } from '@/shared/types/visits';

function PlaceRow({ place, now }: { place: RecentPlace; now: Date }) {
  const href: Href = place.type === 'site' ? `/sites/${place.id}` : `/plant-rooms/${place.id}`;
  return (
    <Link href={href} asChild>
      <Pressable style={styles.row} accessibilityRole="link" testID={`recent-${place.type}-${place.id}`}>
        <MaterialCommunityIcons name={place.type === 'site' ? 'office-building-outline' : 'door-open'} size={24} color={colors.ink} />
        <View style={{ flex: 1 }}>
          <Text bold numberOfLines={1}>{place.name}</Text>
          <Text variant="small" muted numberOfLines={1}>{`${place.siteName ? `${place.siteName} · ` : ''}opened ${agoPhrase(place.openedAt, now)} · ${place.liveTagCount ? `${place.liveTagCount} live ${place.liveTagCount === 1 ? 'tag' : 'tags'}` : 'no live tags'}`}</Text>
        </View>
        <MaterialCommunityIcons name="chevron-right" size={24} color={colors.inkMuted} />
      </Pressable>
    </Link>
  );
}

/** An engineer's day at a glance: the visit they are on, the tags they hold, the places they were just in. */
export function EngineerHome() {
  const now = useNow();
  const visit = useMyVisitQuery();
  const tags = useMyTagsQuery();
  const offers = useTagsQuery({ offeredTo: 'me' });
  const places = useRecentPlacesQuery();
  const v = visit.data;
  return (
    <View style={{ gap: space.lg }}>
      <TagNoticesBanner />
      {offers.data?.items.length ? (
        <View testID="home-handover-offers">
          <LiveTagsPanel tags={offers.data.items} now={now} title="Offered to you in hand-over" empty="" />
        </View>
      ) : null}
      {v ? (
        <Link href={`/visits/${v.id}`} asChild>
          <Pressable style={styles.visit} accessibilityRole="link" testID="home-visit">
            <MaterialCommunityIcons name="account-hard-hat" size={30} color={colors.brandInk} />
            <View style={{ flex: 1 }}>
              <Text bold style={{ color: colors.brandInk }}>{`Visit in progress at ${v.site.name}`}</Text>
              <Text variant="small" style={{ color: colors.brandInk }} numberOfLines={2}>{`Started ${agoPhrase(v.startedAt, now)} · ${v.purpose}`}</Text>
            </View>
            <MaterialCommunityIcons name="chevron-right" size={28} color={colors.brandInk} />
          </Pressable>
        </Link>
      ) : null}
      {tags.data ? (
        <LiveTagsPanel tags={tags.data} now={now} title="Your live tags" empty="You hold no live isolations or overrides." />
      ) : null}
      {places.data?.length ? (
        <Card>
          <Text variant="title">Recently opened</Text>
          <View style={{ gap: space.sm }} testID="home-recent">
            {places.data.map((p) => <PlaceRow key={`${p.type}-${p.id}`} place={p} now={now} />)}
          </View>
        </Card>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, borderRadius: radius.md, minHeight: layout.minTouch },
  visit: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.lg, borderRadius: radius.lg, backgroundColor: colors.brand, minHeight: layout.minTouch + 24 },
});
