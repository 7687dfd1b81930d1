import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { formatInZone } from '@/components/tags/tag-time';
import type { Visit } from '@/shared/types/visits';

/** Visits as rows that open the visit: who, when, what for, and whether it is still in progress. */
export function VisitList({ visits, now }: { visits: Visit[]; now: Date }) {
  if (!visits.length) return <Text muted>No visits recorded.</Text>;
  return (
    <View style={{ gap: space.sm }}>
      {visits.map((v) => (
        <Link key={v.id} href={`/visits/${v.id}`} asChild>
          <Pressable style={styles.row} accessibilityRole="link" testID={`visit-row-${v.id}`}>
            <MaterialCommunityIcons name={v.inProgress ? 'account-hard-hat' : 'clipboard-check-outline'} size={24} color={colors.ink} />
            <View style={{ flex: 1 }}>
              <Text bold>{`${v.person.name} · ${v.inProgress ? 'on site now' : 'visit ended'}`}</Text>
              <Text variant="small">{`${formatInZone(v.startedAt, v.site.timeZone, now)}${v.endedAt ? ` to ${formatInZone(v.endedAt, v.site.timeZone, now)}` : ''}`}</Text>
              <Text variant="small" muted numberOfLines={2}>{`${v.jobReference ? `${v.jobReference} · ` : ''}${v.purpose}`}</Text>
            </View>
            <MaterialCommunityIcons name="chevron-right" size={24} color={colors.inkMuted} />
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, minHeight: layout.minTouch },
});
