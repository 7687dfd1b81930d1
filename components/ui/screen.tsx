import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { SafeAreaView } from 'react-native-safe-area-context';
import { colors, layout, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

/** Every screen sits in one of these: safe areas, scrolling, content centred at a maximum width. */
export function Screen({ title, subtitle, actions, children, scroll = true }: { title?: string; subtitle?: string; actions?: ReactNode; children: ReactNode; scroll?: boolean }) {
  const body = (
    <View style={styles.content}>
      {title ? (
        <View style={styles.header}>
          <View style={{ flex: 1, minWidth: 200 }}>
            <Text variant="heading">{title}</Text>
            {subtitle ? <Text muted>{subtitle}</Text> : null}
          </View>
          {actions ? <View style={styles.actions}>{actions}</View> : null}
        </View>
      ) : null}
      {children}
    </View>
  );
  return (
    <SafeAreaView style={styles.root} edges={['top', 'left', 'right']}>
      {scroll ? <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">{body}</ScrollView> : body}
    </SafeAreaView>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  scroll: { flexGrow: 1 },
  content: { width: '100%', maxWidth: layout.maxContentWidth, alignSelf: 'center', padding: space.lg, gap: space.lg },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.md },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
