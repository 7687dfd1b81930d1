import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { SystemSettingsForm } from '@/components/readings/system-settings-form';
import { colors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSiteSystemsQuery } from '@/hooks/api/use-heating-systems';
import { formatNumber, paToBar, type HeatingSystemSettings } from '@/shared/calc';
import type { CheckSettings } from '@/shared/types/readings';

const ROWS: { key: keyof HeatingSystemSettings; label: string; show: (v: number) => string }[] = [
  { key: 'designDeltaTK', label: 'Design ΔT', show: (v) => `${formatNumber(v)} K` },
  { key: 'flowSetpointC', label: 'Flow setpoint', show: (v) => `${formatNumber(v)} °C` },
  { key: 'fillPressureGaugePa', label: 'Fill pressure', show: (v) => `${formatNumber(paToBar(v))} bar` },
  { key: 'safetyValveSettingGaugePa', label: 'Safety valve setting', show: (v) => `${formatNumber(paToBar(v))} bar` },
];

/** The design values readings on this item are checked against, where each comes from, and the way to change them. */
export function SystemPanel({ siteId, checkSettings, canEdit }: { siteId: number; checkSettings: CheckSettings; canEdit: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const name = checkSettings.systemName;
  const systems = useSiteSystemsQuery(name ? siteId : 0);
  const system = systems.data?.items.find((s) => s.name.toLowerCase() === name?.toLowerCase());
  if (!name) {
    return (
      <Notice tone="info" word="No system">
        This item is not on a named system. Give it a system in the register to compare readings with the system’s design values.
      </Notice>
    );
  }
  return (
    <View style={styles.box} testID="system-panel">
      <Text bold>{`System: ${name}`}</Text>
      <View style={{ gap: space.xs }}>
        {ROWS.map((r) => {
          const v = checkSettings.settings[r.key];
          return (
            <Text key={r.key} variant="small">
              <Text variant="small" bold>{`${r.label}: `}</Text>
              {typeof v === 'number' ? `${r.show(v)} · ${checkSettings.sources[r.key] ?? ''}` : 'not set'}
            </Text>
          );
        })}
      </View>
      <View style={styles.actions}>
        {canEdit && system ? <Button title="Edit system values" variant="secondary" onPress={() => setEditing(true)} testID="system-edit" /> : null}
        <Button
          title="Expansion vessel check"
          variant="secondary"
          onPress={() => router.push({ pathname: '/tools/expansion-vessel', params: { siteId: String(siteId), system: name } })}
          testID="system-expansion-link"
        />
      </View>
      {system ? (
        <Dialog visible={editing} title={`System values: ${name}`} onClose={() => setEditing(false)} wide>
          <SystemSettingsForm system={system} onDone={() => setEditing(false)} />
        </Dialog>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.paper, borderWidth: 1, borderColor: colors.line },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
