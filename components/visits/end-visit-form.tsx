import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { FormButtons } from '@/components/forms/form-buttons';
import { StatusBanner } from '@/components/forms/status-banner';
import { failureStatus, type FormStatus } from '@/components/forms/submit';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { multilineStyle } from '@/components/forms/bound-fields';
import { useNow } from '@/components/tags/use-now';
import { DecisionCard, type DecisionDraft } from '@/components/visits/decision-card';
import { RequestError } from '@/hooks/api/request';
import { useEndVisitMutation } from '@/hooks/api/use-visits';
import type { Tag } from '@/shared/types/tags';
import type { Visit } from '@/shared/types/visits';

const EMPTY: DecisionDraft = { action: null, note: '', checks: {} };

/**
 * Ending a visit: every live tag the engineer holds on the site is listed and needs a decision. The server
 * decides what is missing; its answer names each tag still undecided.
 */
export function EndVisitForm({ visit, held, onEnded, onCancel }: { visit: Visit; held: Tag[]; onEnded: () => void; onCancel: () => void }) {
  const end = useEndVisitMutation(visit.id);
  const now = useNow();
  const [drafts, setDrafts] = useState<Record<number, DecisionDraft>>({});
  const [note, setNote] = useState('');
  const [status, setStatus] = useState<FormStatus | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});

  const submit = async () => {
    setStatus(null);
    setFields({});
    const decisions = held
      .filter((t) => drafts[t.id]?.action)
      .map((t) => ({ tagId: t.id, action: drafts[t.id].action!, note: drafts[t.id].note.trim(), checks: drafts[t.id].checks, expiresAt: null, toUserId: drafts[t.id].action === 'handover' ? drafts[t.id].toUserId ?? null : null }));
    try {
      await end.mutateAsync({ decisions, note: note.trim() });
      onEnded();
    } catch (err) {
      setStatus(failureStatus(err));
      if (err instanceof RequestError && err.fields) setFields(err.fields);
    }
  };

  return (
    <View style={{ gap: space.md }} testID="end-visit-form">
      <Text variant="title">End your visit</Text>
      {held.length ? (
        <Text>{`You hold ${held.length} live ${held.length === 1 ? 'tag' : 'tags'} on this site. Decide for each what happens when you leave.`}</Text>
      ) : (
        <Notice tone="safe" word="Nothing held">You hold no live tags on this site.</Notice>
      )}
      {held.map((t) => (
        <DecisionCard key={t.id} tag={t} now={now} draft={drafts[t.id] ?? EMPTY} error={fields[`tags.${t.id}`]} onChange={(d) => { setDrafts((all) => ({ ...all, [t.id]: d })); setFields(({ [`tags.${t.id}`]: _answered, ...rest }) => rest); }} />
      ))}
      <TextField label="Note on leaving (optional)" value={note} onChangeText={setNote} multiline numberOfLines={3} style={multilineStyle} testID="end-visit-note" />
      <StatusBanner status={status} word={status?.code === 'undecided-tags' ? 'Tags left undecided' : undefined} testID="end-visit-status" />
      <FormButtons submitTitle="End visit" busy={end.isPending} onSubmit={() => void submit()} onCancel={onCancel} testID="end-visit" />
    </View>
  );
}
