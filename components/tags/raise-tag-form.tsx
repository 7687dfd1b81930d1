import { Formik, setNestedObjectValues, type FormikTouched } from 'formik';
import { useEffect, useMemo, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { IsolationCautions, OverrideCautions } from '@/components/tags/isolation-cautions';
import { scrollToStart } from '@/components/tags/scroll-to';
import { withPlan } from '@/components/connections/plan-to-raise';
import type { IsolationPlan } from '@/shared/types/connections';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm as submitWith } from '@/components/forms/submit';
import { firstStepWithError, initialRaiseValues, RAISE_STEPS, stepOf, toRaiseInput, validateRaise, type RaiseValues } from '@/components/tags/raise-form-values';
import { DetailsStep } from '@/components/tags/raise-steps-details';
import { KindReasonStep } from '@/components/tags/raise-steps-kind';
import { ExpiryContactStep, RaiseReview } from '@/components/tags/raise-steps-review';
import { newIdempotencyKey, useRaiseTagMutation } from '@/hooks/api/use-tags';
import type { TagKind } from '@/shared/rules/tags';
import { endOfDayInZone } from '@/shared/rules/time-zone';
import type { Asset, Site } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { User } from '@/shared/types/user';

interface Props {
  asset: Asset;
  site: Site;
  me: User;
  initialKind: TagKind;
  /** An isolation plan to start from (its sources and points, all editable). */
  plan?: IsolationPlan;
  onRaised: (tag: Tag) => void;
  onCancel: () => void;
}

const FIELD_NAMES: [RegExp, string][] = [
  [/^kind/, 'kind'], [/^reason/, 'reason'], [/^(energySources|omittedSources)/, 'energy sources'], [/^points/, 'isolation points'], [/^proof/, 'proof'],
  [/^lockNumber/, 'lock or tag number'], [/^normalState/, 'normal state'], [/^leftState/, 'state it was left in'],
  [/^expiresAt/, 'expiry'], [/^contactPhone/, 'contact phone'],
];

/** "Check: reason, normal state." — what still needs an answer, in the order of the form. */
function errorSummary(errors: object): string {
  const names = FIELD_NAMES.filter(([re]) => Object.keys(errors).some((k) => re.test(k))).map(([, n]) => n);
  return names.length ? `Some answers need attention: ${names.join(', ')}.` : '';
}

/** Raising a tag: step by step on a phone, one page on a wide screen; the same shared schema as the server. */
export function RaiseTagForm({ asset, site, me, initialKind, plan, onRaised, onCancel }: Props) {
  const { isWide } = useBreakpoints();
  const raise = useRaiseTagMutation(asset.id);
  // One key for this form until a tag is made: every retry of the submission sends it, so the server makes one tag.
  const idempotencyKey = useRef(newIdempotencyKey());
  const [step, setStep] = useState(0);
  const top = useRef<View>(null);
  useEffect(() => { if (step > 0) scrollToStart(top.current); }, [step]);
  const initialValues = useMemo(() => withPlan(initialRaiseValues(initialKind, endOfDayInZone(new Date(), site.timeZone), asset.energySources), plan), [initialKind, site.timeZone, asset.energySources, plan]);

  return (
    <Formik<RaiseValues>
      initialValues={initialValues}
      validate={validateRaise(me.role, asset.energySources)}
      onSubmit={async (values, { setErrors, setStatus }) => {
        // A refusal's field messages go beside their fields; on a phone the form turns back to the first step holding one.
        const onFields = (errors: Parameters<typeof setErrors>[0]) => { setErrors(errors); if (!isWide) setStep(firstStepWithError(errors)); };
        const tag = await submitWith({ setErrors: onFields, setStatus }, () => raise.mutateAsync({ input: toRaiseInput(values), idempotencyKey: idempotencyKey.current }));
        if (tag) onRaised(tag);
      }}
    >
      {({ values, errors, touched, setTouched, submitForm, validateForm, isSubmitting, submitCount, status }) => {
        const isolation = values.kind === 'isolation';

        // A step's messages show once Next was pressed on it (as the kit shows a field's once it was touched).
        const next = async () => {
          const found = Object.entries(await validateForm()).filter(([k]) => stepOf(k) === step);
          if (!found.length) setStep(step + 1);
          else void setTouched({ ...touched, ...setNestedObjectValues(Object.fromEntries(found), true) } as FormikTouched<RaiseValues>, false);
        };
        const submit = async () => {
          const found = await validateForm();
          if (!isWide && Object.keys(found).length) setStep(firstStepWithError(found));
          await submitForm();
        };

        const sections = [
          <KindReasonStep key="kind" />,
          <DetailsStep key="details" asset={asset} />,
          <ExpiryContactStep key="expiry" timeZone={site.timeZone} role={me.role} />,
          <RaiseReview key="review" values={values} asset={asset} timeZone={site.timeZone} holderName={me.name} />,
        ];
        const summary = submitCount > 0 ? errorSummary(errors) : '';
        const footer = (
          <View style={{ gap: space.md }}>
            {isolation ? <IsolationCautions /> : <OverrideCautions />}
            <FormStatusBanner word="Not raised" />
            {summary && !status ? <Notice tone="danger" word="Check">{summary}</Notice> : null}
          </View>
        );
        const raiseButton = (
          <Button title={isolation ? 'Raise isolation tag' : 'Raise override tag'} variant={isolation ? 'danger' : 'primary'} busy={isSubmitting} onPress={() => void submit()} testID="raise-submit" />
        );

        if (isWide) {
          return (
            <View style={{ gap: space.lg }} testID="raise-tag-form">
              {sections.slice(0, 3).map((s, i) => (
                <Card key={i}>
                  <Text variant="title">{`${i + 1}. ${RAISE_STEPS[i]}`}</Text>
                  {s}
                </Card>
              ))}
              <Card>
                <Text variant="title">{`4. ${RAISE_STEPS[3]}`}</Text>
                {sections[3]}
                {footer}
                <View style={{ flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm }}>
                  <Button title="Cancel" variant="secondary" onPress={onCancel} testID="raise-cancel" />
                  {raiseButton}
                </View>
              </Card>
            </View>
          );
        }

        return (
          <View style={{ gap: space.md }} testID="raise-tag-form">
            <View ref={top}><StepMarker step={step} /></View>
            {sections[step]}
            {step === 3 ? footer : null}
            <View style={styles.nav}>
              <Button title={step > 0 ? 'Back' : 'Cancel'} variant="secondary" onPress={() => (step > 0 ? setStep(step - 1) : onCancel())} style={{ flex: 1 }} testID={step > 0 ? 'raise-back' : 'raise-cancel'} />
              {step < 3 ? <Button title="Next" onPress={() => void next()} style={{ flex: 2 }} testID="raise-next" /> : <View style={{ flex: 2 }}>{raiseButton}</View>}
            </View>
          </View>
        );
      }}
    </Formik>
  );
}

/** "Step 2 of 4 · Details" with a bar of four segments; the words carry the position, not the colour. */
function StepMarker({ step }: { step: number }) {
  return (
    <View style={{ gap: space.xs }} testID="raise-step">
      <Text variant="small" bold muted>{`Step ${step + 1} of ${RAISE_STEPS.length}`}</Text>
      <Text variant="title">{RAISE_STEPS[step]}</Text>
      <View style={styles.bar}>
        {RAISE_STEPS.map((s, i) => <View key={s} style={[styles.segment, i <= step && styles.segmentDone]} />)}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  nav: { flexDirection: 'row', gap: space.sm },
  bar: { flexDirection: 'row', gap: space.xs },
  segment: { flex: 1, height: 6, borderRadius: radius.pill, backgroundColor: colors.line },
  segmentDone: { backgroundColor: colors.ink },
});
