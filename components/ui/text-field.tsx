import { forwardRef, type ReactNode } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, layout, radius, space, type as typeScale } from '@/components/theme';
import { Text } from '@/components/ui/text';

interface FrameProps {
  label: string;
  error?: string | false;
  hint?: string;
  /** nativeID of the label, for inputs that point at it. */
  labelID?: string;
}

/** A field's label, hint and message around its input (a text box, a box with units, a row of boxes). */
export function FieldFrame({ label, error, hint, labelID, children }: FrameProps & { children: ReactNode }) {
  return (
    <View style={styles.wrap}>
      <Text variant="label" bold nativeID={labelID}>{label}</Text>
      {hint ? <Text variant="small" muted>{hint}</Text> : null}
      {children}
      {error ? (
        <Text variant="small" style={styles.error} accessibilityLiveRegion="polite">
          ⚠ {error}
        </Text>
      ) : null}
    </View>
  );
}

/** The look of every text box: large, high-contrast, red-bordered when its field has a message. */
export const inputStyle = (error?: string | false) => [styles.input, error ? styles.inputError : null];

export const TextField = forwardRef<TextInput, TextInputProps & FrameProps>(function TextField({ label, error, hint, labelID, style, ...rest }, ref) {
  return (
    <FieldFrame label={label} error={error} hint={hint} labelID={labelID}>
      <TextInput ref={ref} accessibilityLabel={label} placeholderTextColor={colors.inkMuted} {...rest} style={[...inputStyle(error), style]} />
    </FieldFrame>
  );
});

/** A search box: no capitals or corrections, the keyboard's search key. */
export function SearchField(props: TextInputProps & FrameProps) {
  return <TextField autoCapitalize="none" autoCorrect={false} inputMode="search" returnKeyType="search" {...props} />;
}

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
