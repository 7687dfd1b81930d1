import { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

export function EmptyState({ icon, title, children, action }: { icon: ComponentProps<typeof MaterialCommunityIcons>['name']; title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <View style={styles.box}>
      <MaterialCommunityIcons name={icon} size={40} color={colors.inkMuted} />
      <Text bold style={{ textAlign: 'center' }}>{title}</Text>
      {typeof children === 'string' ? <Text muted style={{ textAlign: 'center' }}>{children}</Text> : children}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: space.sm, padding: space.xl, borderRadius: radius.lg, borderWidth: 2, borderStyle: 'dashed', borderColor: colors.line },
});
