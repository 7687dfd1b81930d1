import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ClearInAbsenceForm } from '@/components/tags/clear-in-absence-form';
import { ClearTagForm } from '@/components/tags/clear-tag-form';
import { ExtendTagForm } from '@/components/tags/extend-tag-form';
import { HandoverForm } from '@/components/tags/handover-form';
import { TagNoteForm } from '@/components/tags/tag-note-form';
import { clearancePermission, mayExtend, mayTakeOver } from '@/shared/rules/tags';
import type { Tag } from '@/shared/types/tags';
import type { User } from '@/shared/types/user';

type Action = 'clear' | 'refused' | 'absence' | 'extend' | 'handover' | 'note';

const TITLES: Record<Action, string> = {
  clear: 'Clear this tag',
  refused: 'Clear this tag',
  absence: 'Clear in the holder’s absence',
  extend: 'Extend the expiry',
  handover: 'Take over this tag',
  note: 'Add a note',
};

const DONE: Record<Action, string> = {
  clear: 'Tag cleared. The item’s state is updated.',
  refused: '',
  absence: 'Tag cleared in the holder’s absence. The holder is to be told.',
  extend: 'Expiry extended.',
  handover: 'You now hold this tag.',
  note: 'Note added to the history.',
};

/** What the signed-in person may do with this tag, each as its own form. The server checks every rule again. */
export function TagActions({ tag, me }: { tag: Tag; me: User }) {
  const [open, setOpen] = useState<Action | null>(null);
  const [done, setDone] = useState<string | null>(null);
  if (tag.status !== 'live') {
    return done ? <Notice tone="safe" word="Done">{done}</Notice> : null;
  }
  if (me.role === 'viewer') return <Notice tone="info" word="Read only">Viewers can see tags but not change them.</Notice>;

  // The rules speak of the holder's id; the tag carries the holder as `author`.
  const held = { status: tag.status, holderId: tag.author.id };
  const permission = clearancePermission(me, held);
  const finish = (a: Action) => () => { setOpen(null); setDone(DONE[a]); };
  const start = (a: Action) => () => { setDone(null); setOpen(a); };
  const close = () => setOpen(null);
  // The same words the server answers with, so the refusal reads the same whichever of the two says it.
  const refusal = permission === 'in-absence'
    ? 'Only the holder can clear this tag. As a supervisor you can use clearance in absence.'
    : `Only the person who holds this tag can clear it. ${tag.author.name} holds it: ask them to clear it, or take it over first if you are continuing the work.`;

  const buttons: { action: Action; title: string; show: boolean; variant?: 'primary' | 'secondary' | 'danger' }[] = [
    { action: permission === 'own' ? 'clear' : 'refused', title: 'Clear this tag', show: true, variant: 'primary' },
    { action: 'absence', title: 'Clear in holder’s absence', show: permission === 'in-absence', variant: 'secondary' },
    { action: 'extend', title: 'Extend expiry', show: mayExtend(me, held), variant: 'secondary' },
    { action: 'handover', title: 'Take over', show: mayTakeOver(me, held), variant: 'secondary' },
    { action: 'note', title: 'Add a note', show: true, variant: 'secondary' },
  ];

  return (
    <Card>
      <Text variant="title">Actions</Text>
      {permission === 'own' ? <Text variant="small" muted>You hold this tag. Only you can clear it.</Text> : null}
      {done ? <Notice tone="safe" word="Done">{done}</Notice> : null}
      {open ? (
        <View style={{ gap: space.sm }} testID={`action-${open}`}>
          <Text variant="label" bold>{TITLES[open]}</Text>
          {open === 'clear' ? <ClearTagForm tag={tag} onDone={finish('clear')} onCancel={close} /> : null}
          {open === 'refused' ? (
            <>
              <View testID="clear-refused"><Notice tone="danger" word="Not allowed">{refusal}</Notice></View>
              <Button title="Close" variant="secondary" onPress={close} />
            </>
          ) : null}
          {open === 'absence' ? <ClearInAbsenceForm tag={tag} onDone={finish('absence')} onCancel={close} /> : null}
          {open === 'extend' ? <ExtendTagForm tag={tag} role={me.role} onDone={finish('extend')} onCancel={close} /> : null}
          {open === 'handover' ? <HandoverForm tag={tag} myName={me.name} onDone={finish('handover')} onCancel={close} /> : null}
          {open === 'note' ? <TagNoteForm tag={tag} onDone={finish('note')} onCancel={close} /> : null}
        </View>
      ) : (
        <View style={{ gap: space.sm }}>
          {buttons.filter((b) => b.show).map((b) => (
            <Button key={b.title} title={b.title} variant={b.variant} onPress={start(b.action)} testID={`tag-action-${b.action}`} />
          ))}
        </View>
      )}
    </Card>
  );
}
