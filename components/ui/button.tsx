import { ActivityIndicator, Pressable, StyleSheet, type PressableProps } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<Variant, { bg: string; fg: string; border: string }> = {
  primary: { bg: colors.brand, fg: colors.brandInk, border: colors.brand },
  secondary: { bg: colors.surface, fg: colors.ink, border: colors.ink },
  danger: { bg: colors.danger, fg: colors.brandInk, border: colors.danger },
  quiet: { bg: 'transparent', fg: colors.brand, border: 'transparent' },
};

export function Button({ title, variant = 'primary', busy, disabled, style, ...rest }: PressableProps & { title: string; variant?: Variant; busy?: boolean }) {
  const v = variants[variant];
  const off = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: !!off, busy: !!busy }}
      disabled={off}
      {...rest}
      style={(state) => [
        styles.base,
        { backgroundColor: v.bg, borderColor: v.border, opacity: off ? 0.55 : state.pressed ? 0.85 : 1 },
        typeof style === 'function' ? style(state) : style,
      ]}
    >
      {busy ? <ActivityIndicator color={v.fg} /> : <Text bold style={{ color: v.fg, textAlign: 'center' }}>{title}</Text>}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: layout.minTouch + 4,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 2,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
