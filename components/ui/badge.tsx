import { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

export type BadgeTone = 'danger' | 'caution' | 'mandatory' | 'safe' | 'neutral';
type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

// ISO 3864-1 meanings for the colours; the icon and the word carry the state on their own.
const tones: Record<BadgeTone, { bg: string; border: string; fg: string; iconColor: string }> = {
  danger: { bg: colors.danger, border: colors.danger, fg: colors.brandInk, iconColor: colors.brandInk },
  caution: { bg: colors.caution, border: colors.caution, fg: colors.cautionInk, iconColor: colors.cautionInk },
  mandatory: { bg: colors.mandatory, border: colors.mandatory, fg: colors.brandInk, iconColor: colors.brandInk },
  safe: { bg: colors.safeSoft, border: colors.safe, fg: colors.ink, iconColor: colors.safe },
  neutral: { bg: colors.surfaceSunk, border: colors.line, fg: colors.ink, iconColor: colors.inkMuted },
};

export function Badge({ tone, icon, label, testID }: { tone: BadgeTone; icon: IconName; label: string; testID?: string }) {
  const t = tones[tone];
  return (
    <View style={[styles.badge, { backgroundColor: t.bg, borderColor: t.border }]} testID={testID} accessibilityLabel={label}>
      <MaterialCommunityIcons name={icon} size={18} color={t.iconColor} />
      <Text variant="small" bold style={{ color: t.fg }}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: space.xs, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.pill, borderWidth: 2 },
});
