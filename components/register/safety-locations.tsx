import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { SAFETY_LOCATIONS } from '@/components/register/register-vocabulary';
import type { SafetyLocations } from '@/shared/types/register';

// Red for the emergency stop (from memory: ISO 13850 asks for a red actuator); ISO 3864-1 green (safe condition)
// for first aid and escape; blue (mandatory action) for the isolation points someone has to operate.
const ICON_COLOURS: Record<keyof SafetyLocations, string> = {
  emergencyStop: colors.danger,
  gasIsolation: colors.mandatory,
  electricalIsolator: colors.mandatory,
  firstAid: colors.safe,
  exits: colors.safe,
};

/** The safety-critical locations, large and first on the plant room screen. */
export function SafetyLocationsPanel({ safety }: { safety: SafetyLocations }) {
  const { isWide } = useBreakpoints();
  return (
    <View style={{ gap: space.sm }} testID="safety-locations">
      <Text variant="title">Safety-critical locations</Text>
      <View style={[styles.grid, isWide && styles.gridWide]}>
        {SAFETY_LOCATIONS.map((l) => {
          const text = safety[l.key]?.trim();
          return (
            <View key={l.key} style={[styles.item, isWide && styles.itemWide]}>
              <View style={[styles.icon, { backgroundColor: ICON_COLOURS[l.key] }]}>
                <MaterialCommunityIcons name={l.icon} size={30} color={colors.brandInk} />
              </View>
              <View style={{ flex: 1, gap: 2 }}>
                <Text bold>{l.label}</Text>
                {text ? <Text>{text}</Text> : (
                  <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.xs }}>
                    <MaterialCommunityIcons name="alert" size={18} color={colors.cautionInk} />
                    <Text bold style={{ color: colors.cautionInk }}>Not recorded — find it before you start work</Text>
                  </View>
                )}
              </View>
            </View>
          );
        })}
      </View>
      <Notice tone="caution" word="Check on site">
        Locations recorded by engineers; verify on site. Plant may have been moved or changed since. Follow the site’s own procedures and signage.
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.sm },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 2, borderColor: colors.ink, padding: space.md },
  itemWide: { flexBasis: 360, flexGrow: 1 },
  icon: { width: 52, height: 52, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center' },
});
