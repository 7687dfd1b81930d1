import { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

type Tone = 'danger' | 'caution' | 'mandatory' | 'safe' | 'info';
type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

// Each tone carries an icon and a word as well as a colour (ISO 3864-1 meanings), so colour is never the only cue.
const tones: Record<Tone, { bg: string; border: string; fg: string; icon: IconName; word: string }> = {
  danger: { bg: colors.dangerSoft, border: colors.danger, fg: colors.ink, icon: 'alert-octagon', word: 'Danger' },
  caution: { bg: colors.cautionSoft, border: colors.caution, fg: colors.ink, icon: 'alert', word: 'Caution' },
  mandatory: { bg: colors.mandatorySoft, border: colors.mandatory, fg: colors.ink, icon: 'information', word: 'Required' },
  safe: { bg: colors.safeSoft, border: colors.safe, fg: colors.ink, icon: 'check-circle', word: 'OK' },
  info: { bg: colors.surfaceSunk, border: colors.line, fg: colors.ink, icon: 'information-outline', word: 'Note' },
};

export function Notice({ tone, title, children, word }: { tone: Tone; title?: string; children?: ReactNode; word?: string }) {
  const t = tones[tone];
  return (
    <View style={[styles.box, { backgroundColor: t.bg, borderColor: t.border }]} accessibilityRole="alert">
      <MaterialCommunityIcons name={t.icon} size={26} color={t.border === colors.line ? colors.ink : t.border} />
      <View style={{ flex: 1, gap: space.xs }}>
        <Text bold style={{ color: t.fg }}>{`${word ?? t.word}${title ? `: ${title}` : ''}`}</Text>
        {typeof children === 'string' ? <Text style={{ color: t.fg }}>{children}</Text> : children}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', gap: space.md, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderLeftWidth: 8 },
});
