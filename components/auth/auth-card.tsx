import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { BrandMark } from '@/components/nav/brand-mark';

/** The frame shared by the public account screens: brand, then one card, then anything that goes `after` it. */
export function AuthCard({ title, children, testID, after }: { title: string; children: ReactNode; testID?: string; after?: ReactNode }) {
  return (
    <View style={styles.wrap}>
      <View style={styles.brand}>
        <BrandMark size={48} />
        <View>
          <Text variant="heading">Isoledger</Text>
          <Text muted>Plant register and isolation log</Text>
        </View>
      </View>
      <View style={styles.card} testID={testID}>
        <Text variant="title">{title}</Text>
        {children}
      </View>
      {after}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.lg, paddingTop: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.xl, gap: space.sm },
});
