import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Text } from '@/components/ui/text';

/** Label/value pairs: stacked, or in two columns on wide screens when `twoColumns`. Empty values show a dash. */
export function DetailList({ rows, twoColumns }: { rows: [label: string, value: string | null | undefined][]; twoColumns?: boolean }) {
  const isWide = useBreakpoints().isWide && twoColumns;
  return (
    <View style={[styles.list, isWide && styles.wide]}>
      {rows.map(([label, value]) => (
        <View key={label} style={[styles.row, isWide && styles.rowWide]}>
          <Text variant="small" muted>{label}</Text>
          <Text>{value && value.trim() ? value : '—'}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { rowGap: space.sm },
  wide: { flexDirection: 'row', flexWrap: 'wrap' },
  row: { gap: 2, paddingBottom: space.xs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunk },
  rowWide: { flexBasis: '50%', paddingRight: space.lg },
});
