import { AtkinsonHyperlegible_400Regular, AtkinsonHyperlegible_700Bold } from '@expo-google-fonts/atkinson-hyperlegible';
import { MaterialCommunityIcons } from '@expo/vector-icons';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { RequestError } from '@/hooks/api/request';
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
  void AtkinsonHyperlegible_400Regular;
  void AtkinsonHyperlegible_700Bold;
  const [queryClient] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          queries: {
            // A 4xx will not get better by asking again.
            retry: (count, err) => !(err instanceof RequestError && err.status >= 400 && err.status < 500) && count < 2,
          },
        },
      }),
  );
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <AuthProvider>
          <StatusBar style="dark" />
          {fontsLoaded ? <Slot /> : <LoadingView />}
        </AuthProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
