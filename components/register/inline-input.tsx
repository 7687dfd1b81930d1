import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, layout, radius, space, type as typeScale } from '@/components/theme';
import { Text } from '@/components/ui/text';

/** A compact text input for a table cell; its error sits under it in words, not only a red border. */
export function InlineInput({ label, error, ...rest }: TextInputProps & { label: string; error?: string }) {
  return (
    <View style={{ gap: 2 }}>
      <TextInput accessibilityLabel={label} placeholderTextColor={colors.inkMuted} {...rest} style={[styles.input, error ? styles.error : null]} />
      {error ? <Text variant="small" style={{ color: colors.danger }}>⚠ {error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  input: { ...typeScale.small, fontFamily: fonts.regular, minHeight: layout.minTouch, borderWidth: 2, borderColor: colors.line, borderRadius: radius.sm, backgroundColor: colors.surface, paddingHorizontal: space.sm, color: colors.ink, width: '100%' },
  error: { borderColor: colors.danger },
});
