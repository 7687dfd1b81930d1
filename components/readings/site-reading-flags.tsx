import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { FlagLine } from '@/components/readings/check-results';
import { FLAG_STYLES } from '@/components/readings/flag-style';
import { colors, layout, radius, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { errorMessage } from '@/hooks/api/request';
import { useSiteReadingFlagsQuery } from '@/hooks/api/use-readings';
import type { LatestFlaggedReading } from '@/shared/types/readings';

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

function FlaggedItem({ item }: { item: LatestFlaggedReading }) {
  const style = FLAG_STYLES[item.worstFlag];
  return (
    <View style={styles.item} testID={`site-flag-${item.plantId}`}>
      <Link href={`/assets/${item.assetId}`} asChild>
        <Pressable accessibilityRole="link" style={StyleSheet.flatten(styles.head)}>
          <View style={{ flex: 1, minWidth: 180 }}>
            <Text bold>{`${item.plantId} · ${item.assetName}`}</Text>
            <Text variant="small" muted>{`${item.plantRoomName ?? 'No plant room'} · ${when(item.takenAt)} by ${item.takenBy}`}</Text>
          </View>
          <Badge tone={item.worstFlag === 'info' ? 'neutral' : item.worstFlag} icon={style.icon} label={`${item.flags.length} ${item.flags.length === 1 ? 'flag' : 'flags'}`} />
        </Pressable>
      </Link>
      {item.flags.map((f) => <FlagLine key={f.key} flag={f} />)}
    </View>
  );
}

/** The site's latest reading flags: each item whose newest set needs attention, danger first. */
export function SiteReadingFlags({ siteId }: { siteId: number }) {
  const flags = useSiteReadingFlagsQuery(siteId);
  return (
    <Card>
      <Text variant="title">Latest reading flags</Text>
      <Text variant="small" muted>Each item’s newest set of readings, where it carries a flag. Open an item for the checks and the trend.</Text>
      {flags.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(flags.error)}</Notice> : null}
      {flags.data && !flags.data.items.length ? <Text muted testID="site-flags-none">No item’s latest readings carry a flag.</Text> : null}
      <View style={{ gap: space.md }} testID="site-reading-flags">
        {flags.data?.items.map((item) => <FlaggedItem key={item.assetId} item={item} />)}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  item: { gap: space.xs, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, minHeight: layout.minTouch, borderRadius: radius.sm },
});
