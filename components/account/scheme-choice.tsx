import { View } from 'react-native';
import { space } from '@/components/theme';
import { useSchemeChoice, type SchemeChoice } from '@/components/theme/color-scheme';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';

const CHOICES: { value: SchemeChoice; label: string; icon: 'theme-light-dark' | 'white-balance-sunny' | 'weather-night' }[] = [
  { value: 'system', label: 'As this device', icon: 'theme-light-dark' },
  { value: 'light', label: 'Light', icon: 'white-balance-sunny' },
  { value: 'dark', label: 'Dark', icon: 'weather-night' },
];

/** Light or dark screens: the device's setting unless the person picks one here (kept on this device). */
export function SchemeChoiceCard() {
  const [choice, choose] = useSchemeChoice();
  return (
    <Card>
      <Text variant="title">Appearance</Text>
      <Text muted>Dark screens are easier on the eyes in a dim plant room; light ones read better in daylight.</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }} accessibilityRole="radiogroup">
        {CHOICES.map((c) => (
          <Chip key={c.value} label={c.label} icon={c.icon} selected={choice === c.value} onPress={() => choose(c.value)} testID={`scheme-${c.value}`} />
        ))}
      </View>
    </Card>
  );
}
