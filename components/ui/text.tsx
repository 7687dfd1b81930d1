import { Text as RNText, type TextProps } from 'react-native';
import { colors, fonts, type as typeScale } from '@/components/theme';

type Variant = keyof typeof typeScale;

export function Text({ variant = 'body', bold, muted, style, ...rest }: TextProps & { variant?: Variant; bold?: boolean; muted?: boolean }) {
  const heading = variant === 'title' || variant === 'heading';
  return (
    <RNText
      {...rest}
      accessibilityRole={heading ? 'header' : rest.accessibilityRole}
      style={[
        typeScale[variant],
        { fontFamily: bold || heading ? fonts.bold : fonts.regular, color: muted ? colors.inkMuted : colors.ink },
        style,
      ]}
    />
  );
}
