import { useWindowDimensions } from 'react-native';
import { layout } from '@/components/theme';

export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return { width, isWide: width >= layout.wideFrom };
}
