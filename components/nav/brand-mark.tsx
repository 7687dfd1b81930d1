import Svg, { Path, Rect } from 'react-native-svg';
import { colors } from '@/components/theme';

/** Isoledger's mark: an open shackle over a ledger block. */
export function BrandMark({ size = 32 }: { size?: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 64 64" accessibilityLabel="Isoledger">
      <Rect width={64} height={64} rx={12} fill={colors.ink} />
      <Rect x={14} y={26} width={36} height={26} rx={4} fill={colors.caution} />
      <Path d="M22 26v-7a10 10 0 0 1 20 0v7" stroke={colors.paper} strokeWidth={5} fill="none" />
      <Rect x={20} y={34} width={24} height={3} fill={colors.ink} />
      <Rect x={20} y={41} width={16} height={3} fill={colors.ink} />
    </Svg>
  );
}
