import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { multilineStyle } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useAcceptHandoverMutation, useOfferHandoverMutation, useTagColleaguesQuery } from '@/hooks/api/use-tags';
import { HANDOVER_OFFER_MINUTES } from '@/shared/rules/tag-handover';
import { handoverAcceptSchema, handoverOfferSchema, type HandoverAcceptInput } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface OfferValues { toUserId: number | null; note: string }

/**
 * The holder names the colleague who is to take the tag (OSHA 29 CFR 1910.147(f)(4)). Nothing changes hands until
 * that colleague accepts with their own lock on; an unanswered offer lapses after HANDOVER_OFFER_MINUTES.
 */
export function HandoverOfferForm({ tag, myId, onDone, onCancel }: { tag: Tag; myId: number; onDone: () => void; onCancel?: () => void }) {
  const offer = useOfferHandoverMutation(tag.id);
  const colleagues = useTagColleaguesQuery();
  const options = (colleagues.data ?? []).filter((c) => c.id !== myId).map((c) => ({ value: c.id, label: c.name }));
  return (
    <Formik<OfferValues>
      initialValues={{ toUserId: null, note: '' }}
      validate={async (v) => (await validateWith(handoverOfferSchema, v)) as FormikErrors<OfferValues>}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await offer.mutateAsync({ toUserId: values.toUserId!, note: values.note.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, setFieldValue, handleChange, handleBlur, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="handover-offer-form">
            <Notice tone="mandatory" title="both of you, at the plant">
              {`You stay the holder until your colleague accepts. They put their own lock on first; only then does yours come off. The offer lapses after ${HANDOVER_OFFER_MINUTES} minutes if they do not accept.`}
            </Notice>
            <SelectField<number> label="Colleague taking over" value={values.toUserId} options={options} onChange={(v) => void setFieldValue('toUserId', v)} placeholder="Choose a colleague…" error={shown.toUserId} testID="handover-to" />
            <TextField label="Hand-over note" hint="What is done, what is left, anything they must know." value={values.note} onChangeText={handleChange('note')} onBlur={handleBlur('note')} multiline numberOfLines={3} style={multilineStyle} error={shown.note} testID="handover-note" />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Offer the tag" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="handover-offer" />
          </View>
        );
      }}
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
      validate={async (v) => {
        const errors = await validateWith(handoverAcceptSchema, v);
        if (isolation && !v.lockNumber.trim()) errors.lockNumber = 'Put your own lock on first, then give its number.';
        return errors as FormikErrors<HandoverAcceptInput>;
      }}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await accept.mutateAsync({ lockNumber: values.lockNumber.trim(), contactPhone: values.contactPhone.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, handleChange, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="handover-accept-form">
            <Notice tone="mandatory" title="your lock on first">
              {isolation
                ? `Put your own lock and tag on every isolation point now, with ${tag.holder.name} there. Only after you accept does their lock come off. From then on only you can clear this tag.`
                : `Agree the hand-over with ${tag.holder.name}. From then on only you can clear this tag.`}
            </Notice>
            {isolation ? <TextField label="Your lock number" hint="The lock you have just put on." value={values.lockNumber} onChangeText={handleChange('lockNumber')} autoCapitalize="characters" error={shown.lockNumber} testID="handover-lock" /> : null}
            <TextField label="Your contact phone" hint={tag.contactPhone ? `Leave empty to keep ${tag.contactPhone}.` : 'Where you can be reached.'} value={values.contactPhone} onChangeText={handleChange('contactPhone')} keyboardType="phone-pad" error={shown.contactPhone} testID="handover-phone" />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Accept and hold this tag" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="handover-accept" />
          </View>
        );
      }}
    </Formik>
  );
}
