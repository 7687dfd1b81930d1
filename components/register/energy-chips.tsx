import { View } from 'react-native';
import { space } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { ENERGY_SOURCE_ICONS } from '@/components/register/register-vocabulary';
import { ENERGY_SOURCES, ENERGY_SOURCE_LABELS, type EnergySource } from '@/shared/rules/register';

/** The energy sources recorded for an item (read only). */
export function EnergyChips({ sources }: { sources: EnergySource[] }) {
  if (sources.length === 0) return <Text muted>None recorded.</Text>;
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
      {sources.map((s) => <Chip key={s} label={ENERGY_SOURCE_LABELS[s]} icon={ENERGY_SOURCE_ICONS[s]} />)}
    </View>
  );
}

/** Toggle chips for choosing energy sources in a form. */
export function EnergyToggles({ value, onChange }: { value: EnergySource[]; onChange: (next: EnergySource[]) => void }) {
  const toggle = (s: EnergySource) => onChange(value.includes(s) ? value.filter((v) => v !== s) : ENERGY_SOURCES.filter((e) => e === s || value.includes(e)));
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
      {ENERGY_SOURCES.map((s) => (
        <Chip key={s} label={ENERGY_SOURCE_LABELS[s]} icon={ENERGY_SOURCE_ICONS[s]} selected={value.includes(s)} onPress={() => toggle(s)} testID={`energy-${s}`} />
      ))}
    </View>
  );
}
