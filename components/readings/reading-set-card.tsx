import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { CheckResults, FlagLine } from '@/components/readings/check-results';
import { FLAG_STYLES, worstLevel } from '@/components/readings/flag-style';
import { describeValues } from '@/components/readings/reading-fields';
import { colors, radius, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import type { ReadingSet } from '@/shared/types/readings';

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

function Values({ set, testID }: { set: ReadingSet; testID?: string }) {
  const items = describeValues(set.values);
  return (
    <View style={styles.values} testID={testID}>
      {items.map((v, i) => (
        <View key={`${v.label}-${i}`} style={styles.value}>
          <Text variant="small" muted>{v.label}</Text>
          <Text bold>{v.text}</Text>
        </View>
      ))}
    </View>
  );
}

/** One set with who logged it and when, its flags, and its checks with working on request. */
export function ReadingSetCard({ set, history = [], canCorrect, onCorrect }: { set: ReadingSet; history?: ReadingSet[]; canCorrect: boolean; onCorrect: () => void }) {
  const [showWorking, setShowWorking] = useState(false);
  const worst = worstLevel(set.flags);
  return (
    <View style={styles.card} testID={`reading-set-${set.id}`}>
      <View style={styles.head}>
        <View style={{ flex: 1, minWidth: 180 }}>
          <Text bold>{when(set.takenAt)}</Text>
          <Text variant="small" muted>{`Logged by ${set.createdBy.name}`}</Text>
        </View>
        {worst ? (
          <Badge tone={worst === 'info' ? 'neutral' : worst} icon={FLAG_STYLES[worst].icon} label={`${set.flags.length} ${set.flags.length === 1 ? 'flag' : 'flags'}`} />
        ) : (
          <Badge tone="neutral" icon="check" label="No flags" />
        )}
      </View>
      {set.supersedesId ? (
        <Text variant="small" testID="reading-correction-note">{`Correction: ${set.correctionReason ?? ''}`}</Text>
      ) : null}
      <Values set={set} />
      {set.note ? <Text style={styles.note}>{set.note}</Text> : null}
      {set.flags.map((f) => <FlagLine key={f.key} flag={f} />)}
      {showWorking ? <CheckResults results={set.results} emptyText="No checks could be run on this set." /> : null}
      <View style={styles.actions}>
        {set.results.length ? (
          <Button title={showWorking ? 'Hide the working' : `Show the working (${set.results.length})`} variant="quiet" onPress={() => setShowWorking((s) => !s)} testID={`reading-working-${set.id}`} />
        ) : null}
        {canCorrect ? <Button title="Correct this set" variant="secondary" onPress={onCorrect} testID={`reading-correct-${set.id}`} /> : null}
      </View>
      {history.map((original) => (
        <View key={original.id} style={styles.original} testID={`reading-original-${original.id}`}>
          <Text variant="small" bold>{`Superseded set logged ${when(original.takenAt)} by ${original.createdBy.name}, kept on record`}</Text>
          {original.supersedesId ? <Text variant="small">{`Correction: ${original.correctionReason ?? ''}`}</Text> : null}
          <Values set={original} />
          {original.note ? <Text variant="small">{original.note}</Text> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, padding: space.md, gap: space.sm },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.sm },
  values: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  value: { minWidth: 120 },
  note: { fontStyle: 'italic' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  original: { borderLeftWidth: 4, borderLeftColor: colors.line, paddingLeft: space.md, gap: space.xs, backgroundColor: colors.paper, paddingVertical: space.sm, borderRadius: radius.sm },
});
