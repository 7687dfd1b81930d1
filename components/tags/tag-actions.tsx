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
import { HandoverAcceptForm, HandoverOfferForm } from '@/components/tags/handover-form';
import { HandoverOfferNotice } from '@/components/tags/handover-offer-notice';
import { ProveForm } from '@/components/tags/prove-form';
import { ReassignInAbsenceForm } from '@/components/tags/reassign-in-absence-form';
import { TagNoteForm } from '@/components/tags/tag-note-form';
import { handoverRole } from '@/shared/rules/tag-handover';
import { clearancePermission } from '@/shared/rules/permissions';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { Tag } from '@/shared/types/tags';
import type { User } from '@/shared/types/user';

type Action = 'clear' | 'refused' | 'absence' | 'reassign' | 'extend' | 'prove' | 'offer' | 'accept' | 'note';

const TITLES: Record<Action, string> = {
  clear: 'Clear this tag',
  refused: 'Clear this tag',
  absence: 'Clear in the holder’s absence',
  reassign: 'Reassign in the holder’s absence',
  extend: 'Extend the expiry',
  prove: 'Record how you proved the isolation',
  offer: 'Offer this tag to a colleague',
  accept: 'Accept the hand-over',
  note: 'Add a note',
};

const DONE: Record<Action, string> = {
  clear: 'Tag cleared. The item’s state is updated.',
  refused: '',
  absence: 'Tag cleared in the holder’s absence. The holder is told and must acknowledge.',
  reassign: 'Tag reassigned. The absent holder is told and must acknowledge.',
  extend: 'Expiry extended.',
  prove: 'Proof recorded. The isolation shows as proved.',
  offer: 'Hand-over offered. You hold the tag until your colleague accepts.',
  accept: 'You now hold this tag. Your colleague may take their lock off.',
  note: 'Note added to the history.',
};

/** What the signed-in person may do with this tag, each as its own form. The server checks every rule again. */
export function TagActions({ tag, me, now }: { tag: Tag; me: User; now: Date }) {
  const [open, setOpen] = useState<Action | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { may, mayOn } = usePermissions();
  if (tag.status !== 'live') {
    return done ? <Notice tone="safe" word="Done">{done}</Notice> : null;
  }
  if (!may('annotateTag')) return <Notice tone="info" word="Read only">Viewers can see tags but not change them.</Notice>;

  const offer = tag.handoverOffer;
  const held = { status: tag.status, holderId: tag.holder.id, toUserId: offer?.to.id ?? null, lapsesAt: offer?.lapsesAt ?? null };
  const permission = clearancePermission(me, held);
  const role = handoverRole(me, held, now);
  const finish = (a: Action) => () => { setOpen(null); setDone(DONE[a]); };
  const start = (a: Action) => () => { setDone(null); setOpen(a); };
  const close = () => setOpen(null);
  // The same words the server answers with, so the refusal reads the same whichever of the two says it.
  const refusal = permission === 'in-absence'
    ? 'Only the holder can clear this tag. As a supervisor you can use clearance in absence.'
    : `Only the person who holds this tag can clear it. ${tag.holder.name} holds it: ask them to clear it, or to offer it to you if you are continuing the work.`;

  const buttons: { action: Action; title: string; show: boolean; variant?: 'primary' | 'secondary' | 'danger' }[] = [
    { action: 'accept', title: 'Accept the hand-over', show: role === 'offered', variant: 'primary' },
    { action: 'prove', title: 'Record proof of isolation', show: role === 'holder' && tag.proved === false, variant: 'primary' },
    { action: permission === 'own' ? 'clear' : 'refused', title: 'Clear this tag', show: true, variant: permission === 'own' ? 'primary' : 'secondary' },
    { action: 'absence', title: 'Clear in holder’s absence', show: permission === 'in-absence', variant: 'secondary' },
    { action: 'reassign', title: 'Reassign in holder’s absence', show: mayOn('reassignTagInAbsence', held), variant: 'secondary' },
    { action: 'extend', title: 'Extend expiry', show: mayOn('extendTag', held), variant: 'secondary' },
    { action: 'offer', title: 'Offer to a colleague', show: role === 'holder' && !offer, variant: 'secondary' },
    { action: 'note', title: 'Add a note', show: may('annotateTag'), variant: 'secondary' },
  ];

  return (
    <Card>
      <Text variant="title">Actions</Text>
      {permission === 'own' ? <Text variant="small" muted>You hold this tag. Only you can clear it.</Text> : null}
      {done ? <Notice tone="safe" word="Done">{done}</Notice> : null}
      {offer ? <HandoverOfferNotice tag={tag} me={me} now={now} /> : null}
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
          {open === 'reassign' ? <ReassignInAbsenceForm tag={tag} onDone={finish('reassign')} onCancel={close} /> : null}
          {open === 'extend' ? <ExtendTagForm tag={tag} role={me.role} onDone={finish('extend')} onCancel={close} /> : null}
          {open === 'prove' ? <ProveForm tag={tag} onDone={finish('prove')} onCancel={close} /> : null}
          {open === 'offer' ? <HandoverOfferForm tag={tag} myId={me.id} onDone={finish('offer')} onCancel={close} /> : null}
          {open === 'accept' ? <HandoverAcceptForm tag={tag} onDone={finish('accept')} onCancel={close} /> : null}
          {open === 'note' ? <TagNoteForm tag={tag} onDone={finish('note')} onCancel={close} /> : null}
        </View>
      ) : (
        <View style={{ gap: space.sm }}>
          {buttons.filter((b) => b.show).map((b) => (
            <Button key={b.action} title={b.title} variant={b.variant} onPress={start(b.action)} testID={`tag-action-${b.action}`} />
          ))}
        </View>
      )}
    </Card>
  );
}
