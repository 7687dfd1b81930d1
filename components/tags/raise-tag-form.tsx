import { Formik, type FormikErrors } from 'formik';
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
import { firstStepWithError, initialRaiseValues, RAISE_STEPS, stepOf, toRaiseInput, validateRaise, type RaiseValues } from '@/components/tags/raise-form-values';
import { DetailsStep } from '@/components/tags/raise-steps-details';
import { KindReasonStep } from '@/components/tags/raise-steps-kind';
import { ExpiryContactStep, RaiseReview } from '@/components/tags/raise-steps-review';
import type { FieldErrors } from '@/components/tags/validate-with';
import { RequestError, errorMessage } from '@/hooks/api/request';
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
function errorSummary(errors: FieldErrors): string {
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
  const [tried, setTried] = useState<Set<number>>(new Set());
  const top = useRef<View>(null);
  useEffect(() => { if (step > 0) scrollToStart(top.current); }, [step]);
  const initialValues = useMemo(() => withPlan(initialRaiseValues(initialKind, endOfDayInZone(new Date(), site.timeZone), asset.energySources), plan), [initialKind, site.timeZone, asset.energySources, plan]);

  return (
    <Formik<RaiseValues>
      initialValues={initialValues}
      validate={(v) => validateRaise(v, me.role, asset.energySources) as Promise<FormikErrors<RaiseValues>>}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          const tag = await raise.mutateAsync({ input: toRaiseInput(values), idempotencyKey: idempotencyKey.current });
          onRaised(tag);
        } catch (err) {
          if (err instanceof RequestError && err.fields) {
            setErrors(err.fields as FormikErrors<RaiseValues>);
            if (!isWide) setStep(firstStepWithError(err.fields));
          }
          setStatus(errorMessage(err));
        }
      }}
    >
      {({ values, errors, setFieldValue, submitForm, validateForm, isSubmitting, submitCount, status }) => {
        const all = errors as FieldErrors;
        const shown: Record<string, string | undefined> = {};
        for (const [k, v] of Object.entries(all)) if (submitCount > 0 || tried.has(stepOf(k))) shown[k] = v;
        const set = <K extends keyof RaiseValues>(key: K, value: RaiseValues[K]) => void setFieldValue(key as string, value);
        const stepProps = { values, set, errors: shown };
        const isolation = values.kind === 'isolation';

        const next = async () => {
          const found = (await validateForm()) as FieldErrors;
          setTried((t) => new Set(t).add(step));
          if (!Object.keys(found).some((k) => stepOf(k) === step)) setStep(step + 1);
        };
        const submit = async () => {
          const found = (await validateForm()) as FieldErrors;
          if (!isWide && Object.keys(found).length) setStep(firstStepWithError(found));
          await submitForm();
        };

        const sections = [
          <KindReasonStep key="kind" {...stepProps} />,
          <DetailsStep key="details" {...stepProps} asset={asset} />,
          <ExpiryContactStep key="expiry" {...stepProps} timeZone={site.timeZone} role={me.role} />,
          <RaiseReview key="review" values={values} asset={asset} timeZone={site.timeZone} holderName={me.name} />,
        ];
        const summary = submitCount > 0 ? errorSummary(all) : '';
        const footer = (
          <View style={{ gap: space.md }}>
            {isolation ? <IsolationCautions /> : <OverrideCautions />}
            {status ? <Notice tone="danger" word="Not raised">{status}</Notice> : null}
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
