import { forwardRef } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, layout, radius, space, type as typeScale } from '@/components/theme';
import { Text } from '@/components/ui/text';

interface Props extends TextInputProps {
  label: string;
  error?: string | false;
  hint?: string;
}

export const TextField = forwardRef<TextInput, Props>(function TextField({ label, error, hint, style, ...rest }, ref) {
  return (
    <View style={styles.wrap}>
      <Text variant="label" bold>{label}</Text>
      {hint ? <Text variant="small" muted>{hint}</Text> : null}
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        placeholderTextColor={colors.inkMuted}
        {...rest}
        style={[styles.input, error ? styles.inputError : null, style]}
      />
      {error ? (
        <Text variant="small" style={styles.error} accessibilityLiveRegion="polite">
          ⚠ {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs, marginBottom: space.md },
  input: {
    ...typeScale.body,
    fontFamily: fonts.regular,
    minHeight: layout.minTouch + 4,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingHorizontal: space.md,
    color: colors.ink,
  },
  inputError: { borderColor: colors.danger },
  error: { color: colors.danger },
});
