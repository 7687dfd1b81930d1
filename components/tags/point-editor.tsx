import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { FormSelectField, FormTextField, useFieldError } from '@/components/forms/bound-fields';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { PointDraft } from '@/components/tags/raise-form-values';
import { useAssetsQuery } from '@/hooks/api/use-assets';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { ISOLATION_METHODS, ISOLATION_METHOD_LABELS, type IsolationMethod } from '@/shared/rules/tags';

const METHOD_OPTIONS = ISOLATION_METHODS.map((m) => ({ value: m, label: ISOLATION_METHOD_LABELS[m] }));
const RESULTS = 6;

interface Props {
  index: number;
  point: PointDraft;
  siteId: number;
  /** The item being tagged: not offered as its own isolation point. */
  excludeAssetId: number;
  onChange: (next: PointDraft) => void;
  onRemove?: () => void;
}

/**
 * One isolation point, bound to the raise form's `points[index]`: a plant item at the same site found by search, or a
 * described point, and the method used there.
 */
export function PointEditor({ index, point, siteId, excludeAssetId, onChange, onRemove }: Props) {
  const name = `points[${index}]`;
  // The schema's rule on the whole point: an item chosen or a point described.
  const pointError = useFieldError(name);
  const [mode, setMode] = useState<'item' | 'text'>(point.description && !point.asset ? 'text' : 'item');
  const [q, setQ] = useState('');
  const query = useDebouncedValue(q.trim(), 250);
  const results = useAssetsQuery({ q: query, siteId, pageSize: RESULTS + 1 }, mode === 'item' && !point.asset && query.length > 0);
  const found = (results.data?.items ?? []).filter((a) => a.id !== excludeAssetId).slice(0, RESULTS);
  const tid = `point-${index}`;

  return (
    <View style={styles.box} testID={tid}>
      <View style={styles.head}>
        <Text bold style={{ flex: 1 }}>{`Isolation point ${index + 1}`}</Text>
        {onRemove ? <Button title="Remove" variant="quiet" onPress={onRemove} testID={`${tid}-remove`} /> : null}
      </View>
      <View style={styles.modes} role="radiogroup" aria-label="Kind of isolation point">
        {(['item', 'text'] as const).map((m) => (
          <Pressable
            key={m}
            onPress={() => { setMode(m); onChange({ ...point, asset: m === 'text' ? null : point.asset, description: m === 'item' ? '' : point.description }); }}
            accessibilityRole="radio"
            accessibilityState={{ checked: mode === m }}
            aria-checked={mode === m}
            style={StyleSheet.flatten([styles.mode, mode === m && styles.modeOn])}
            testID={`${tid}-mode-${m}`}
          >
            <MaterialCommunityIcons name={mode === m ? 'radiobox-marked' : 'radiobox-blank'} size={20} color={colors.ink} />
            <Text variant="label" bold={mode === m} style={{ flexShrink: 1 }}>{m === 'item' ? 'A plant item' : 'Described point'}</Text>
          </Pressable>
        ))}
      </View>

      {mode === 'item' ? (
        point.asset ? (
          <View style={styles.chosen} testID={`${tid}-chosen`}>
            <MaterialCommunityIcons name="map-marker-outline" size={22} color={colors.ink} />
            <Text style={{ flex: 1 }}>{`${point.asset.plantId} · ${point.asset.name}`}</Text>
            <Button title="Change" variant="quiet" onPress={() => onChange({ ...point, asset: null })} testID={`${tid}-change`} />
          </View>
        ) : (
          <View>
            <TextField label="Find a valve, isolator or other item at this site" placeholder="Plant ID or name, e.g. V-0" value={q} onChangeText={setQ} autoCapitalize="none" testID={`${tid}-search`} />
            {query && results.isFetching && !found.length ? <Text variant="small" muted>Searching…</Text> : null}
            {query && results.data && !found.length ? <Text variant="small" muted>No item at this site matches. Describe the point instead.</Text> : null}
            {found.map((a) => (
              <Pressable key={a.id} onPress={() => { onChange({ ...point, asset: { id: a.id, plantId: a.plantId, name: a.name } }); setQ(''); }} accessibilityRole="button" style={({ pressed }) => [styles.result, pressed && { opacity: 0.8 }]} testID={`${tid}-result-${a.id}`}>
                <Text bold>{a.plantId}</Text>
                <Text style={{ flex: 1 }} numberOfLines={1}>{a.name}</Text>
                <MaterialCommunityIcons name="plus-circle-outline" size={22} color={colors.brand} />
              </Pressable>
            ))}
          </View>
        )
      ) : (
        <FormTextField name={`${name}.description`} label="Describe the point" placeholder="e.g. Distribution board DB-2, way 7" testID={`${tid}-description`} />
      )}
      {pointError ? <Text variant="small" style={{ color: colors.danger }}>{`⚠ ${pointError}`}</Text> : null}

      <FormSelectField<IsolationMethod> name={`${name}.method`} label="Method at this point" options={METHOD_OPTIONS} placeholder="Choose how it is isolated…" testID={`${tid}-method`} />
      {point.method === 'other' ? <Text variant="small" muted>Say how in the reason or a note.</Text> : null}
      <FormTextField
        name={`${name}.lockNumber`}
        label="Lock or tag number at this point (optional)"
        hint="Only if it differs from your personal lock, e.g. a lock box or a multi-lock hasp number."
        autoCapitalize="characters"
        testID={`${tid}-lock`}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.paper },
  head: { flexDirection: 'row', alignItems: 'center' },
  modes: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  mode: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: layout.minTouch, paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  modeOn: { borderColor: colors.ink },
  chosen: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.sm, borderRadius: radius.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line },
  result: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouch, paddingHorizontal: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, backgroundColor: colors.surface },
});
