import { Formik } from 'formik';
import { View } from 'react-native';
import { FormSelectField, FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { useAcceptHandoverMutation, useOfferHandoverMutation, useTagColleaguesQuery } from '@/hooks/api/use-tags';
import { HANDOVER_OFFER_MINUTES } from '@/shared/rules/tag-handover';
import { handoverAcceptSchema, handoverOfferSchema, type HandoverAcceptInput } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface OfferValues { toUserId: number | ''; note: string }

/** Colleagues who may take a tag over, as choices: everyone but `exceptId` (the holder). */
export function useColleagueOptions(exceptId: number) {
  const colleagues = useTagColleaguesQuery();
  return (colleagues.data ?? []).filter((c) => c.id !== exceptId).map((c) => ({ value: c.id, label: c.name }));
}

/**
 * The holder names the colleague who is to take the tag (OSHA 29 CFR 1910.147(f)(4)). Nothing changes hands until
 * that colleague accepts with their own lock on; an unanswered offer lapses after HANDOVER_OFFER_MINUTES.
 */
export function HandoverOfferForm({ tag, myId, onDone, onCancel }: { tag: Tag; myId: number; onDone: () => void; onCancel?: () => void }) {
  const offer = useOfferHandoverMutation(tag.id);
  const options = useColleagueOptions(myId);
  return (
    <Formik<OfferValues>
      initialValues={{ toUserId: '', note: '' }}
      validate={validateWithSchema(handoverOfferSchema)}
      onSubmit={async (values, helpers) => {
        if (await submitForm(helpers, () => offer.mutateAsync({ toUserId: Number(values.toUserId), note: values.note.trim() }))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="handover-offer-form">
          <Notice tone="mandatory" title="both of you, at the plant">
            {`You stay the holder until your colleague accepts. They put their own lock on first; only then does yours come off. The offer lapses after ${HANDOVER_OFFER_MINUTES} minutes if they do not accept.`}
          </Notice>
          <FormSelectField<number> name="toUserId" label="Colleague taking over" options={options} placeholder="Choose a colleague…" testID="handover-to" />
          <FormTextField name="note" label="Hand-over note" hint="What is done, what is left, anything they must know." multiline testID="handover-note" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Offer the tag" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="handover-offer" />
        </View>
      )}
    </Formik>
  );
}

/** The named colleague accepts: their lock goes on before the holder's comes off, and they become the holder. */
export function HandoverAcceptForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const accept = useAcceptHandoverMutation(tag.id);
  const isolation = tag.kind === 'isolation';
  return (
    <Formik<HandoverAcceptInput>
      initialValues={{ lockNumber: '', contactPhone: '' }}
      validate={validateWithSchema(handoverAcceptSchema, undefined, { kind: tag.kind })}
      onSubmit={async (values, helpers) => {
        if (await submitForm(helpers, () => accept.mutateAsync({ lockNumber: values.lockNumber.trim(), contactPhone: values.contactPhone.trim() }))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="handover-accept-form">
          <Notice tone="mandatory" title="your lock on first">
            {isolation
              ? `Put your own lock and tag on every isolation point now, with ${tag.holder.name} there. Only after you accept does their lock come off. From then on only you can clear this tag.`
              : `Agree the hand-over with ${tag.holder.name}. From then on only you can clear this tag.`}
          </Notice>
          {isolation ? <FormTextField name="lockNumber" label="Your lock number" hint="The lock you have just put on." autoCapitalize="characters" testID="handover-lock" /> : null}
          <FormTextField name="contactPhone" label="Your contact phone" hint={tag.contactPhone ? `Leave empty to keep ${tag.contactPhone}.` : 'Where you can be reached.'} keyboardType="phone-pad" testID="handover-phone" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Accept and hold this tag" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="handover-accept" />
        </View>
      )}
    </Formik>
  );
}
