import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { EnergyChips } from '@/components/register/energy-chips';
import { METHOD_ICONS } from '@/components/tags/tag-vocabulary';
import { formatInZone } from '@/components/tags/tag-time';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import { PROOF_METHOD_LABELS } from '@/shared/rules/tag-isolation';
import type { Tag } from '@/shared/types/tags';

/** What the tag records: reason, energy sources and points (isolation) or normal → left state (override). */
export function TagFacts({ tag }: { tag: Tag }) {
  return (
    <Card>
      <Text variant="title">What was done</Text>
      <View>
        <Text variant="small" muted>Reason</Text>
        <Text testID="tag-reason">{tag.reason}</Text>
      </View>
      {tag.kind === 'isolation' ? (
        <>
          <View style={{ gap: space.xs }}>
            <Text variant="small" muted>Energy sources isolated</Text>
            <EnergyChips sources={tag.energySources} />
          </View>
          {tag.omittedSources.length ? (
            <View style={{ gap: space.xs }} testID="tag-omitted-sources">
              <Text variant="small" muted>Not isolated, and why</Text>
              {tag.omittedSources.map((o) => <Text key={o.source}>{`${ENERGY_SOURCE_LABELS[o.source]}: ${o.reason}`}</Text>)}
            </View>
          ) : null}
          <View style={{ gap: space.xs }} testID="tag-points">
            <Text variant="small" muted>{`Isolation points (${tag.points.length})`}</Text>
            {tag.points.map((p) => (
              <View key={p.id} style={styles.point}>
                <MaterialCommunityIcons name={METHOD_ICONS[p.method]} size={24} color={colors.ink} />
                <View style={{ flex: 1 }}>
                  {p.asset ? (
                    <Link href={`/assets/${p.asset.id}`} asChild>
                      <Pressable accessibilityRole="link" style={styles.link}>
                        <Text bold style={styles.linkText}>{`${p.asset.plantId} · ${p.asset.name}`}</Text>
                      </Pressable>
                    </Link>
                  ) : <Text bold>{p.description}</Text>}
                  {p.asset && p.description ? <Text variant="small">{p.description}</Text> : null}
                  <Text variant="small">{ISOLATION_METHOD_LABELS[p.method]}</Text>
                  {p.lockNumber ? <Text variant="small" bold>{`Lock at this point: ${p.lockNumber}`}</Text> : null}
                </View>
              </View>
            ))}
          </View>
          <View style={{ gap: space.xs }} testID="tag-proofs">
            <Text variant="small" muted>Proof of isolation</Text>
            {tag.proofs.length ? tag.proofs.map((p) => (
              <View key={p.id} style={styles.point}>
                <MaterialCommunityIcons name="check-decagram-outline" size={24} color={colors.safe} />
                <View style={{ flex: 1 }}>
                  <Text bold>{`Proved · ${PROOF_METHOD_LABELS[p.method]}`}</Text>
                  {p.instrument ? <Text variant="small">{`With: ${p.instrument}`}</Text> : null}
                  {p.reading ? <Text variant="small">{`Reading: ${p.reading}`}</Text> : null}
                  {p.note ? <Text variant="small">{p.note}</Text> : null}
                  <Text variant="small" muted>{`${p.by.name} · ${formatInZone(p.at, tag.asset.timeZone, new Date())}`}</Text>
                </View>
              </View>
            )) : <Text bold>Not proved: no proof recorded.</Text>}
          </View>
        </>
      ) : (
        <View style={styles.states} testID="tag-override-states">
          <View style={styles.state}>
            <Text variant="small" muted>Normal state</Text>
            <Text bold>{tag.normalState}</Text>
          </View>
          <MaterialCommunityIcons name="arrow-right-thin" size={32} color={colors.ink} accessibilityLabel="changed to" />
          <View style={styles.state}>
            <Text variant="small" muted>Left in</Text>
            <Text bold>{tag.leftState}</Text>
          </View>
        </View>
      )}
      {tag.lockNumber ? (
        <View>
          <Text variant="small" muted>{tag.kind === 'isolation' ? 'Holder’s lock number' : 'Lock or tag number'}</Text>
          <Text bold>{tag.lockNumber}</Text>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  point: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunk },
  link: { minHeight: layout.minTouch, justifyContent: 'center', alignSelf: 'flex-start' },
  linkText: { color: colors.brand, textDecorationLine: 'underline' },
  states: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  state: { flexGrow: 1, flexBasis: 120, padding: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md },
});
