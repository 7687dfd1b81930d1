import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { FLAG_STYLES } from '@/components/readings/flag-style';
import { colors, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Text } from '@/components/ui/text';
import { formatNumber, type CheckFlag, type CheckResult } from '@/shared/calc';

/** Every computed check with its working: value, formula, inputs and any flag. */
export function CheckResults({ results, emptyText, testID }: { results: CheckResult[]; emptyText?: string; testID?: string }) {
  const { isWide } = useBreakpoints();
  if (!results.length) {
    return <Text muted testID={testID}>{emptyText ?? 'No checks: enter readings to see the results.'}</Text>;
  }
  return (
    <View style={[styles.grid, isWide && styles.gridWide]} testID={testID}>
      {results.map((r) => <CheckResultCard key={r.key} result={r} wide={isWide} />)}
    </View>
  );
}

function CheckResultCard({ result, wide }: { result: CheckResult; wide?: boolean }) {
  const shown = result.valueText ?? `${formatNumber(result.value, 3)}${result.unit ? ` ${result.unit}` : ''}`;
  return (
    <View style={[styles.card, wide && styles.cardWide]} testID={`check-${result.key}`} accessibilityLabel={`${result.label}: ${shown}`}>
      <View style={styles.head}>
        <Text bold style={{ flex: 1 }}>{result.label}</Text>
        <Text variant="title" testID={`check-${result.key}-value`}>{shown}</Text>
      </View>
      <Text variant="small" style={styles.formula}>{result.formula}</Text>
      <View style={styles.inputs}>
        {result.inputs.map((i) => (
          <Text key={i.label} variant="small" muted>{`${i.label}: ${formatNumber(i.value, 4)}${i.unit ? ` ${i.unit}` : ''}`}</Text>
        ))}
      </View>
      {result.limit ? (
        <Text variant="small" testID={`check-${result.key}-limit`}>
          <Text variant="small" bold>Limit: </Text>
          {result.limit}
        </Text>
      ) : null}
      {result.source ? <Text variant="small" muted testID={`check-${result.key}-source`}>{`Source: ${result.source}`}</Text> : null}
      {result.flag ? <FlagLine flag={result.flag} testID={`check-${result.key}-flag`} /> : (
        <View style={styles.quiet}>
          <MaterialCommunityIcons name="check" size={18} color={colors.inkMuted} />
          <Text variant="small" muted>Within the expected band</Text>
        </View>
      )}
    </View>
  );
}

export function FlagLine({ flag, testID }: { flag: CheckFlag; testID?: string }) {
  const s = FLAG_STYLES[flag.level];
  return (
    <View style={[styles.flag, { backgroundColor: s.bg, borderColor: s.border }]} testID={testID} accessibilityRole="alert">
      <MaterialCommunityIcons name={s.icon} size={22} color={s.iconColor} />
      <Text variant="small" style={{ flex: 1, color: s.fg }}>
        <Text variant="small" bold style={{ color: s.fg }}>{`${s.word}: `}</Text>
        {flag.message}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.sm },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: space.xs },
  cardWide: { flexBasis: 320, flexGrow: 1 },
  head: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm, flexWrap: 'wrap' },
  formula: { fontFamily: 'monospace', color: colors.ink, backgroundColor: colors.paper, paddingHorizontal: space.xs, borderRadius: radius.sm },
  inputs: { gap: 0 },
  quiet: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  flag: { flexDirection: 'row', gap: space.sm, padding: space.sm, borderRadius: radius.sm, borderWidth: 2, borderLeftWidth: 6, marginTop: space.xs },
});
