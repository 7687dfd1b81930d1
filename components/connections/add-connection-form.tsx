import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select-field';
import { ItemPicker } from '@/components/connections/item-picker';
import { errorMessage } from '@/hooks/api/request';
import { useCreateConnectionMutation } from '@/hooks/api/use-connections';
import { MEDIUM_LABELS, TYPE_MEDIA, canCarry, type Medium } from '@/shared/rules/connections';
import type { Asset } from '@/shared/types/register';

type Direction = 'from' | 'to';

/** Adds a link to this item: "supplied from" another item, or "supplies" another, in a medium both carry. */
export function AddConnectionForm({ asset }: { asset: Asset }) {
  const [direction, setDirection] = useState<Direction>('from');
  const [medium, setMedium] = useState<Medium | null>(null);
  const [other, setOther] = useState<Asset | null>(null);
  const create = useCreateConnectionMutation();
  const options = TYPE_MEDIA[asset.type].map((m) => ({ value: m, label: MEDIUM_LABELS[m] }));
  const submit = () => {
    if (!medium || !other) return;
    const [from, to] = direction === 'from' ? [other, asset] : [asset, other];
    create.mutate({ fromAssetId: from.id, toAssetId: to.id, medium }, { onSuccess: () => setOther(null) });
  };
  return (
    <View style={{ gap: space.md }} testID="add-connection">
      <View style={{ flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' }}>
        <Chip label="Supplied from" icon="arrow-down-bold" selected={direction === 'from'} onPress={() => setDirection('from')} testID="direction-from" />
        <Chip label="Supplies" icon="arrow-up-bold" selected={direction === 'to'} onPress={() => setDirection('to')} testID="direction-to" />
      </View>
      <SelectField label="Medium" value={medium} options={options} onChange={(m) => { setMedium(m); setOther(null); }} placeholder="Choose the medium" testID="connection-medium" />
      {medium ? (
        <ItemPicker
          siteId={asset.siteId}
          label={direction === 'from' ? `Item that supplies ${asset.plantId}` : `Item that ${asset.plantId} supplies`}
          accept={(a) => a.id !== asset.id && !a.archived && canCarry(a.type, medium)}
          chosen={other}
          onChoose={setOther}
        />
      ) : null}
      {create.isError ? <Notice tone="danger" word="Not added">{errorMessage(create.error)}</Notice> : null}
      <Button
        title={medium ? `Add ${MEDIUM_LABELS[medium].toLowerCase()} link` : 'Add link'}
        onPress={submit}
        disabled={!medium || !other}
        busy={create.isPending}
        testID="connection-add"
      />
    </View>
  );
}
