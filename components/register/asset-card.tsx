import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { PhotoThumb } from '@/components/ui/photo-thumb';
import { Text } from '@/components/ui/text';
import { ASSET_TYPE_ICONS } from '@/components/register/register-vocabulary';
import { ServiceBadge } from '@/components/register/service-badge';
import { TagStateBadge } from '@/components/tags/tag-state-badge';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';
import type { Asset } from '@/shared/types/register';

/** One plant item in a phone list: what an engineer needs to pick the right one at a glance. */
export function AssetCard({ asset, showPlace = true }: { asset: Asset; showPlace?: boolean }) {
  const place = [asset.siteName, asset.plantRoomName].filter(Boolean).join(' · ');
  return (
    <Link href={`/assets/${asset.id}`} asChild>
      <Pressable style={styles.card} accessibilityRole="link" accessibilityLabel={`${asset.plantId} ${asset.name}`} testID={`asset-card-${asset.id}`}>
        <PhotoThumb url={asset.thumbnailUrl} size={72} label={`Photo of ${asset.plantId}`} />
        <View style={styles.body}>
          <Text bold numberOfLines={1}>{asset.plantId}</Text>
          <Text numberOfLines={2}>{asset.name}</Text>
          <View style={styles.line}>
            <MaterialCommunityIcons name={ASSET_TYPE_ICONS[asset.type]} size={18} color={colors.inkMuted} />
            <Text variant="small" muted numberOfLines={1} style={{ flexShrink: 1 }}>
              {[ASSET_TYPE_LABELS[asset.type], asset.system].filter(Boolean).join(' · ')}
            </Text>
          </View>
          {showPlace && place ? (
            <View style={styles.line}>
              <MaterialCommunityIcons name="map-marker-outline" size={18} color={colors.inkMuted} />
              <Text variant="small" muted numberOfLines={1} style={{ flexShrink: 1 }}>{place}</Text>
            </View>
          ) : null}
          <View style={[styles.line, { flexWrap: 'wrap' }]}>
            <TagStateBadge summary={asset} hideNormal testID={`asset-state-${asset.plantId}`} />
            <ServiceBadge asset={asset} compact />
            {asset.archived ? <Badge tone="neutral" icon="archive-outline" label="Archived" /> : null}
          </View>
        </View>
        <MaterialCommunityIcons name="chevron-right" size={28} color={colors.inkMuted} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.md, minHeight: layout.minTouch + 24 },
  body: { flex: 1, gap: 2, minWidth: 0 },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.xs, marginTop: 2 },
});
