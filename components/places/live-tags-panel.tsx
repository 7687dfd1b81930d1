import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { HolderContact } from '@/components/board/holder-contact';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import { agoPhrase, expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { PointWarning } from '@/components/places/point-warning';
import type { Tag } from '@/shared/types/tags';

/** Proved is recorded on isolations once the tag rules carry it; until then nothing is claimed either way. */
function provedWord(tag: Tag): string | null {
  const proved = (tag as Tag & { proved?: boolean | null }).proved;
  if (tag.kind !== 'isolation' || proved === undefined) return null;
  return proved ? 'Isolation proved' : 'Not proved yet';
}

function LiveTagRow({ tag, now }: { tag: Tag; now: Date }) {
  const kind = KIND_LOOK[tag.kind];
  const proved = provedWord(tag);
  const zone = tag.asset.timeZone;
  return (
    <View style={styles.row} testID={`live-tag-${tag.id}`}>
      <Link href={`/tags/${tag.id}`} asChild>
        <Pressable style={styles.head} accessibilityRole="link" accessibilityLabel={`${kind.word} on ${tag.asset.plantId} ${tag.asset.name}: open the tag`}>
          <Badge tone={kind.tone === 'danger' ? 'danger' : 'caution'} icon={kind.icon} label={kind.word} />
          <Text bold style={{ flex: 1 }} numberOfLines={2}>{`${tag.asset.plantId} · ${tag.asset.name}`}</Text>
          <MaterialCommunityIcons name="chevron-right" size={24} color={colors.inkMuted} />
        </Pressable>
      </Link>
      <Text testID={`live-tag-reason-${tag.id}`}>{tag.reason}</Text>
      <View style={styles.facts}>
        <View style={styles.fact}>
          <Text variant="small" muted>Held by</Text>
          <HolderContact row={tag} testID={`live-tag-call-${tag.id}`} />
        </View>
        <View style={styles.fact}>
          <Text variant="small" muted>Since</Text>
          <Text variant="small">{`${formatInZone(tag.raisedAt, zone, now)} · ${agoPhrase(tag.raisedAt, now)}`}</Text>
        </View>
        <View style={styles.fact}>
          <Text variant="small" muted>Expiry</Text>
          <View style={styles.expiry}>
            <MaterialCommunityIcons name={tag.overdue ? 'clock-alert' : 'calendar-clock'} size={18} color={colors.ink} />
            <Text variant="small" bold={tag.overdue}>{`${formatInZone(tag.expiresAt, zone, now)} · ${expiryPhrase(tag.expiresAt, now)}`}</Text>
          </View>
        </View>
        {proved ? (
          <View style={styles.fact}>
            <Text variant="small" muted>Proved</Text>
            <Text variant="small" bold>{proved}</Text>
          </View>
        ) : null}
      </View>
      {tag.points.filter((p) => p.asset).map((p) => <PointWarning key={p.id} point={p} tag={tag} />)}
    </View>
  );
}

/** At the top of a site or plant room (or on a person's home): live isolations and overrides, most urgent first. */
export function LiveTagsPanel({ tags, now, place, title, empty }: { tags: Tag[]; now: Date; place?: string; title?: string; empty?: string }) {
  return (
    <Card>
      <View style={styles.title}>
        <MaterialCommunityIcons name="tag-multiple-outline" size={24} color={colors.ink} />
        <Text variant="title" style={{ flex: 1 }} testID="live-tags-title">{`${title ?? `Live tags in ${place}`} (${tags.length})`}</Text>
      </View>
      {tags.length ? (
        <View style={{ gap: space.md }} testID="live-tags">
          {tags.map((t) => <LiveTagRow key={t.id} tag={t} now={now} />)}
        </View>
      ) : (
        <Text muted>{empty ?? 'Nobody has recorded an isolation or override here that is still in force. Check the plant itself before work: a record is only as good as the last person who kept it.'}</Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  title: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  row: { gap: space.xs, borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouch, borderRadius: radius.sm },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  fact: { minWidth: 150, flexGrow: 1, flexBasis: 150, gap: 2 },
  expiry: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs },
});
