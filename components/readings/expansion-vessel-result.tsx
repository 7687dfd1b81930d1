import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { formatNumber, type ExpansionVesselResult } from '@/shared/calc';
import type { ExpansionSettingsUsed } from '@/shared/types/readings';

const fmt = (v: number | null, unit: string) => (v === null ? '—' : `${formatNumber(v, 3)} ${unit}`);

/** The verdict, the figures an engineer compares with the vessel plate, and every step of the working. */
export function ExpansionVesselResultView({ result, settings, workingOpen = true }: { result: ExpansionVesselResult; settings: ExpansionSettingsUsed; workingOpen?: boolean }) {
  const { isWide } = useBreakpoints();
  const [showWorking, setShowWorking] = useState(workingOpen);
  const sized = result.verdict === 'sized';
  const all: [string, string][] = [
    ['Required nominal volume', fmt(result.requiredNominalVolumeL, 'L')],
    ['Installed nominal volume', fmt(result.installedNominalVolumeL, 'L')],
    ['Expansion volume', fmt(result.expansionVolumeL, 'L')],
    ['Water reserve', fmt(result.waterReserveL, 'L')],
    ['Minimum pre-charge (EN 12828)', fmt(result.standardMinimumPreChargeBarGauge, 'bar')],
    ['Minimum pre-charge with the chosen margin', fmt(result.minimumPreChargeBarGauge, 'bar')],
    ['Pre-charge used', fmt(result.preChargeBarGauge, 'bar')],
    ['Final pressure', fmt(result.finalPressureBarGauge, 'bar')],
    ['Cold fill pressure with installed vessels', fmt(result.fillPressureBarGauge, 'bar')],
  ];
  // Size only: there is no installed vessel to show.
  const figures = sized ? all.filter(([label]) => !/installed/i.test(label)) : all;
  return (
    <View style={{ gap: space.md }} testID="vessel-result">
      {sized ? (
        <Notice tone="info" word="Sized" title={`a vessel of at least ${fmt(result.requiredNominalVolumeL, 'L')}`}>
          {`Pre-charge it to ${fmt(result.preChargeBarGauge, 'bar')} and fill cold to about ${fmt(result.fillPressureAtRequiredVolumeBarGauge, 'bar')}. ` +
            'Size only: no installed vessel was checked.'}
        </Notice>
      ) : result.verdict === 'pass' ? (
        <Notice tone="safe" word="Pass" title="installed volume covers the requirement">
          For these inputs the installed vessels meet the EN 12828 sizing. This is a design check on paper, not an inspection of the vessels.
        </Notice>
      ) : (
        <Notice tone="caution" word="Fail" title="the vessel sizing does not work">
          <View style={{ gap: space.xs }}>
            {result.reasons.map((r) => <Text key={r} style={{ color: colors.cautionInk }} testID="vessel-reason">{`• ${r}`}</Text>)}
          </View>
        </Notice>
      )}
      {result.cautions.map((c) => <Notice key={c} tone="caution" word="Caution">{c}</Notice>)}
      {result.notes.map((n) => <Notice key={n} tone="info" word="Note">{n}</Notice>)}
      <View style={[styles.figures, isWide && styles.figuresWide]}>
        {figures.map(([label, value]) => (
          <View key={label} style={[styles.figure, isWide && styles.figureWide]}>
            <Text variant="small" muted>{label}</Text>
            <Text variant="title">{value}</Text>
          </View>
        ))}
      </View>
      <Text variant="small" muted>
        {`Pre-charge margin ${formatNumber(settings.preChargeMarginBar)} bar. Source: ${settings.preChargeMarginSource}`}
      </Text>
      <View style={styles.workingHead}>
        <Text variant="title">Working</Text>
        <Button title={showWorking ? 'Hide' : `Show all ${result.working.length} steps`} variant="quiet" onPress={() => setShowWorking((s) => !s)} />
      </View>
      <View style={{ gap: space.sm, display: showWorking ? 'flex' : 'none' }}>
        {result.working.map((s) => (
          <View key={s.key} style={styles.step} testID={`vessel-step-${s.key}`}>
            <View style={styles.stepHead}>
              <Text bold style={{ flex: 1 }}>{s.label}</Text>
              <Text bold>{`${formatNumber(s.value, 4)}${s.unit ? ` ${s.unit}` : ''}`}</Text>
            </View>
            <Text variant="small" style={styles.formula}>{s.formula}</Text>
            <Text variant="small" style={styles.formula}>{s.substituted}</Text>
            {s.source ? <Text variant="small" muted>{`Source: ${s.source}`}</Text> : null}
          </View>
        ))}
      </View>
      <Notice tone="caution" title="Stored pressure">
        Checking or resetting a vessel pre-charge means working on stored pressure: isolate and relieve the water side first, following
        site procedures and the manufacturer’s instructions. Local codes take precedence over this calculation.
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  // Two figures a row on a phone, four on a desktop.
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  figuresWide: {},
  figure: { flexBasis: 150, flexGrow: 1, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md },
  figureWide: { flexBasis: 240, flexGrow: 1 },
  step: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: space.xs },
  workingHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap' },
  stepHead: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  formula: { fontFamily: 'monospace', color: colors.ink },
});
