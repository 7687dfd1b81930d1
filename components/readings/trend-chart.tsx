import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useMemo, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Line } from 'react-native-svg';
import { chart, seriesStyle, type SeriesStyle } from '@/components/readings/chart-theme';
import { Marker, TrendPlot } from '@/components/readings/trend-plot';
import { buildTrendSeries, limitLines, referenceLines, TREND_GROUPS, type TrendGroupKey, type TrendSeries } from '@/components/readings/trend-series';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { formatNumber } from '@/shared/calc';
import type { CheckSettings, ReadingSet } from '@/shared/types/readings';

function Swatch({ style }: { style: SeriesStyle }) {
  return (
    <Svg width={36} height={16}>
      <Line x1={2} x2={34} y1={8} y2={8} stroke={style.color} strokeWidth={chart.strokeWidth} strokeDasharray={style.dash} />
      <Marker shape={style.marker} x={18} y={8} r={chart.markerRadius} color={style.color} />
    </Svg>
  );
}

function SeriesToggle({ series, style, on, unit, onPress }: { series: TrendSeries; style: SeriesStyle; on: boolean; unit: string; onPress: () => void }) {
  const latest = series.points[series.points.length - 1];
  return (
    <Pressable
      onPress={onPress}
      accessibilityRole="checkbox"
      accessibilityState={{ checked: on }}
      accessibilityLabel={`${series.label}, latest ${formatNumber(latest.v, 3)} ${unit}`}
      testID={`trend-series-${series.key}`}
      style={StyleSheet.flatten([styles.toggle, on ? styles.toggleOn : styles.toggleOff])}
    >
      <MaterialCommunityIcons name={on ? 'checkbox-marked' : 'checkbox-blank-outline'} size={22} color={on ? colors.ink : colors.inkMuted} />
      <Swatch style={style} />
      <Text variant="label" bold={on} style={{ color: on ? colors.ink : colors.inkMuted }}>
        {`${series.label} · ${formatNumber(latest.v, 3)} ${unit}`}
      </Text>
    </Pressable>
  );
}

/**
 * Each reading over time on the item's record: choose a quantity, then which of its series to show.
 * Width follows the space it is given (onLayout), so it reads on a 390 px phone and spreads on a desktop.
 */
export function TrendChart({ readings, checkSettings }: { readings: ReadingSet[]; checkSettings?: CheckSettings | null }) {
  const { isWide } = useBreakpoints();
  const [width, setWidth] = useState(0);
  const all = useMemo(() => buildTrendSeries(readings), [readings]);
  const groups = TREND_GROUPS.filter((g) => all.some((s) => s.group === g.key));
  const [chosenGroup, setGroup] = useState<TrendGroupKey | null>(null);
  const [hidden, setHidden] = useState<Set<string>>(new Set());
  const group = groups.find((g) => g.key === chosenGroup) ?? groups[0];

  if (!group) {
    return <Text muted testID="trend-empty">No readings to chart yet. Logged sets appear here over time.</Text>;
  }
  const inGroup = all.filter((s) => s.group === group.key);
  const styled = inGroup.map((s, i) => ({ series: s, style: seriesStyle(i) }));
  const shown = styled.filter(({ series }) => !hidden.has(series.key));
  const refs = [...referenceLines(checkSettings), ...limitLines(all)].filter((r) => r.group === group.key);
  const sets = new Set(shown.flatMap((s) => s.series.points.map((p) => p.readingId))).size;
  const toggle = (key: string) =>
    setHidden((prev) => {
      const next = new Set(prev);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.floor(e.nativeEvent.layout.width));

  return (
    <View style={styles.wrap} testID="trend-chart">
      {/* One row that scrolls sideways on a phone, so the choices do not push the chart off screen. */}
      <ScrollView horizontal={!isWide} showsHorizontalScrollIndicator={false} contentContainerStyle={[styles.row, !isWide && styles.noWrap]} role="radiogroup" aria-label="Quantity to chart">
        {groups.map((g) => (
          <Chip key={g.key} label={g.unit ? `${g.label} (${g.unit})` : g.label} selected={g.key === group.key} onPress={() => setGroup(g.key)} testID={`trend-group-${g.key}`} />
        ))}
      </ScrollView>
      <View onLayout={onLayout} style={styles.plot}>
        {width > 0 ? (
          shown.length ? (
            <TrendPlot
              width={width}
              height={isWide ? chart.wideHeight : chart.phoneHeight}
              unit={group.unit}
              series={shown}
              references={refs}
              accessibilityLabel={`${group.label} in ${group.unit} over ${sets} reading ${sets === 1 ? 'set' : 'sets'}`}
            />
          ) : (
            <Text muted style={styles.none}>Choose at least one series below.</Text>
          )
        ) : null}
      </View>
      <View style={styles.row}>
        {styled.map(({ series, style }) => (
          <SeriesToggle key={series.key} series={series} style={style} unit={group.unit} on={!hidden.has(series.key)} onPress={() => toggle(series.key)} />
        ))}
      </View>
      {refs.length ? (
        <Text variant="small" muted>Dotted lines: design values and limits ({refs.map((r) => r.label).join(', ')}).</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  noWrap: { flexWrap: 'nowrap' },
  plot: { width: '100%', minHeight: chart.phoneHeight, backgroundColor: colors.surface, borderRadius: radius.md },
  none: { padding: space.lg },
  toggle: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: layout.minTouch, paddingHorizontal: space.sm, borderRadius: radius.md, borderWidth: 2 },
  toggleOn: { borderColor: colors.ink, backgroundColor: colors.surface },
  toggleOff: { borderColor: colors.line, backgroundColor: colors.paper },
});
