import { Suspense, lazy, useEffect, useState, type ComponentType } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { colors, space } from '@/components/theme';

/**
 * A heavy part of a screen (charts, the camera's QR reader, the label's QR drawing, a record's readings) in a
 * script of its own, fetched when first shown. With `deferred`, the fetch starts only once the screen has
 * rendered, so what the person came for (a record's state, a form) never waits for a part further down.
 * Keep layouts and first-screen parts free of heavy imports: see "Keeping the first render small" in DEVELOPERS.md.
 */
export function lazyPart<P extends object>(load: () => Promise<ComponentType<P>>, { deferred = false }: { deferred?: boolean } = {}): ComponentType<P> {
  let loaded = false;
  const Lazy = lazy(async () => {
    const component = await load();
    loaded = true;
    return { default: component };
  });
  const fallback = <View style={{ padding: space.lg, alignItems: 'center' }} accessibilityLabel="Loading"><ActivityIndicator color={colors.brand} /></View>;
  function LazyPart(props: P) {
    const [started, setStarted] = useState(!deferred || loaded);
    useEffect(() => {
      if (!started) setStarted(true);
    }, [started]);
    return <Suspense fallback={fallback}>{started ? <Lazy {...props} /> : fallback}</Suspense>;
  }
  return LazyPart;
}
