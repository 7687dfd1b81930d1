import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useEffect } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { AppQueryProvider } from '@/components/offline/app-query-provider';
import { registerServiceWorker } from '@/hooks/offline/register-service-worker';
import { AuthProvider } from '@/hooks/auth/auth-provider';
import { LoadingView } from '@/components/ui/loading-view';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  // Fonts ship inside the bundle; nothing is fetched from the network.
  const [fontsLoaded] = useFonts({
    AtkinsonHyperlegible_400Regular: require('@/assets/fonts/AtkinsonHyperlegible_400Regular.ttf'),
    AtkinsonHyperlegible_700Bold: require('@/assets/fonts/AtkinsonHyperlegible_700Bold.ttf'),
    ...MaterialCommunityIcons.font,
  });
  useEffect(registerServiceWorker, []);
  return (
    <SafeAreaProvider>
      <AppQueryProvider>
        <AuthProvider>
          <StatusBar style="dark" />
          {fontsLoaded ? <Slot /> : <LoadingView />}
        </AuthProvider>
      </AppQueryProvider>
    </SafeAreaProvider>
  );
}
