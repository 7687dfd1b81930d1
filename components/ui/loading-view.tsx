import { ActivityIndicator, View } from 'react-native';
import { colors } from '@/components/theme';

export function LoadingView() {
  return (
    <View style={{ flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper }} accessibilityLabel="Loading">
      <ActivityIndicator size="large" color={colors.brand} />
    </View>
  );
}
