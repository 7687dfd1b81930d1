import { MaterialCommunityIcons } from '@/components/ui/icons';
import { ActivityIndicator, Image, Pressable, StyleSheet, View } from 'react-native';
import { colors, radius } from '@/components/theme';
import { usePhotoUri } from '@/hooks/api/use-photos';

interface Props {
  /** Authenticated photo URL from the API, or null for "no photo yet". */
  url: string | null;
  size: number;
  label: string;
  onPress?: () => void;
  /** Fill the parent's width instead of a square of `size` (the full-size viewer). */
  aspectRatio?: number;
  testID?: string;
}

export function PhotoThumb({ url, size, label, onPress, aspectRatio, testID }: Props) {
  const { uri, isPending, isError } = usePhotoUri(url);
  const box = aspectRatio ? { width: '100%' as const, aspectRatio } : { width: size, height: size };
  const inner = uri ? (
    <Image source={{ uri }} style={[styles.image, box]} resizeMode={aspectRatio ? 'contain' : 'cover'} accessibilityLabel={label} testID={testID} />
  ) : (
    <View style={[styles.placeholder, box]} accessibilityLabel={isError ? `${label}: could not load` : label}>
      {isPending ? <ActivityIndicator color={colors.brand} /> : <MaterialCommunityIcons name={isError ? 'image-broken-variant' : 'image-off-outline'} size={Math.min(32, size / 2)} color={colors.inkMuted} />}
    </View>
  );
  if (!onPress) return inner;
  return (
    <Pressable onPress={onPress} accessibilityRole="button" accessibilityLabel={`Open ${label}`} style={({ pressed }) => ({ opacity: pressed ? 0.8 : 1 })}>
      {inner}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  image: { borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  placeholder: { borderRadius: radius.md, backgroundColor: colors.surfaceSunk, alignItems: 'center', justifyContent: 'center', borderWidth: 1, borderColor: colors.line },
});
