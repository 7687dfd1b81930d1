import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link, type Href } from 'expo-router';
import { Fragment } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, layout, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

export interface Crumb {
  label: string;
  href: Href & string;
}

/** Where this record sits: Register › site › plant room, each a link back up. */
export function Breadcrumbs({ trail }: { trail: Crumb[] }) {
  return (
    <View style={styles.row} aria-label="Breadcrumbs" testID="breadcrumbs">
      {trail.map((t, i) => (
        <Fragment key={t.href}>
          {i > 0 ? <MaterialCommunityIcons name="chevron-right" size={20} color={colors.inkMuted} /> : null}
          <Link href={t.href} style={styles.link}>
            <Text variant="small" bold style={{ color: colors.brand, textDecorationLine: 'underline' }}>{t.label}</Text>
          </Link>
        </Fragment>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs, marginBottom: -space.sm },
  link: { minHeight: layout.minTouch, justifyContent: 'center', display: 'flex', alignItems: 'center' },
});
