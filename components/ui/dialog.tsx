import type { ReactNode } from 'react';
import { Modal, Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

/** A modal card over a dimmed backdrop; pressing the backdrop or Escape (web) closes it. */
export function Dialog({ visible, title, onClose, children, wide, testID }: { visible: boolean; title: string; onClose: () => void; children: ReactNode; wide?: boolean; testID?: string }) {
  return (
    <Modal visible={visible} transparent animationType="fade" onRequestClose={onClose}>
      <View style={styles.backdrop}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onClose} accessibilityLabel="Close" />
        <View style={[styles.card, wide && styles.wide]} role="dialog" aria-label={title} testID={testID}>
          <Text variant="title">{title}</Text>
          <ScrollView style={{ flexShrink: 1 }} contentContainerStyle={{ gap: space.md }}>{children}</ScrollView>
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1, backgroundColor: colors.scrim, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  card: { width: '100%', maxWidth: 480, maxHeight: '90%', backgroundColor: colors.surface, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  wide: { maxWidth: 960 },
});
