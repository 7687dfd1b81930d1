import { Suspense, lazy, type ComponentType } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { colors, space } from '@/components/theme';

/**
 * A heavy part of a screen (charts, the camera's QR reader, the label's QR drawing) in a script of its own, fetched
 * when first shown: the bundler would otherwise put anything two screens share into the script every page loads.
 */
export function lazyPart<P extends object>(load: () => Promise<ComponentType<P>>): ComponentType<P> {
  const Lazy = lazy(async () => ({ default: await load() }));
  function LazyPart(props: P) {
    return (
      <Suspense fallback={<View style={{ padding: space.lg, alignItems: 'center' }} accessibilityLabel="Loading"><ActivityIndicator color={colors.brand} /></View>}>
        <Lazy {...props} />
      </Suspense>
    );
  }
  return LazyPart;
}
