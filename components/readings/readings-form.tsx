import { Formik, type FormikErrors } from 'formik';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { FormTextField } from '@/components/forms/bound-fields';
import { submitForm } from '@/components/forms/submit';
import { CheckResults } from '@/components/readings/check-results';
import { formPathFor, initialReadingForm, readingFormToSi, validateMeasurements, type ReadingFormValues } from '@/components/readings/reading-fields';
import { ReadingSectionFields } from '@/components/readings/reading-section-fields';
import { SurfaceTemperaturesField } from '@/components/readings/surface-temperatures-field';
import { layout, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useCorrectReadingMutation, useLogReadingsMutation } from '@/hooks/api/use-readings';
import { READING_SECTIONS, readingSectionsFor } from '@/shared/rules/reading-sections';
import { emptyReadingValues, runReadingChecks } from '@/shared/rules/readings';
import { readingCorrectionSchema, readingSetSchema, type ReadingCorrectionInput, type ReadingSetInput } from '@/shared/schemas/readings';
import type { CheckSettings, ReadingSet, ReadingValues } from '@/shared/types/readings';
import type { Asset } from '@/shared/types/register';

type Errors = FormikErrors<ReadingFormValues> & { _?: string };

/** Readings typed so far as SI values; unreadable entries count as not read. */
function liveValues(values: ReadingFormValues): ReadingValues {
  const { body } = readingFormToSi(values);
  return { ...emptyReadingValues(), ...body, surfaceTemperatures: [] } as ReadingValues;
}

interface Props {
  asset: Pick<Asset, 'id' | 'type' | 'energySources'>;
  checkSettings: CheckSettings;
  /** When set, the form appends a correction to this set instead of logging a new one. */
  correcting?: ReadingSet | null;
  onDone: (saved: ReadingSet) => void;
  onCancel?: () => void;
}

export function ReadingsForm({ asset, checkSettings, correcting, onDone, onCancel }: Props) {
  const { isWide } = useBreakpoints();
  const log = useLogReadingsMutation(asset.id);
  const correct = useCorrectReadingMutation(asset.id);
  const [showAll, setShowAll] = useState(false);
  const schema = correcting ? readingCorrectionSchema : readingSetSchema;
  const initialValues = useMemo(() => initialReadingForm(correcting?.values, correcting?.note ?? ''), [correcting]);
  // The item's own sections, plus any a corrected set already has values in.
  const offered = readingSectionsFor(asset.type, asset.energySources);
  const filled = READING_SECTIONS.filter((s) => correcting && s.fields.some((k) => correcting.values[k] !== null));
  const mine = READING_SECTIONS.filter((s) => offered.includes(s) || filled.includes(s));
  const sections = showAll ? READING_SECTIONS : mine;
  return (
    <Formik<ReadingFormValues>
      initialValues={initialValues}
      validate={(values) => validateMeasurements<ReadingFormValues>(schema, readingFormToSi(values), formPathFor)}
      onSubmit={async (values, helpers) => {
        const { body } = readingFormToSi(values);
        const saved = await submitForm(
          helpers,
          () => (correcting ? correct.mutateAsync({ readingId: correcting.id, input: body as ReadingCorrectionInput }) : log.mutateAsync(body as ReadingSetInput)),
          formPathFor,
        );
        if (saved) onDone(saved);
      }}
    >
      {({ values, errors, handleSubmit, isSubmitting, submitCount }) => {
        const errs = errors as Errors;
        let live: ReturnType<typeof runReadingChecks> | null = null;
        try {
          live = runReadingChecks(liveValues(values), checkSettings);
        } catch {
          live = null; // a reading outside the range the arithmetic accepts; the field shows why
        }
        return (
          <View style={{ gap: space.md }} testID="readings-form">
            {correcting ? (
              <Notice tone="info" word="Correcting">
                {`The set taken ${new Date(correcting.takenAt).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })} stays on record; ` +
                  'this correction replaces it in checks, trends and exports.'}
              </Notice>
            ) : null}
            {sections.map((s) => <ReadingSectionFields key={s.key} section={s} />)}
            {mine.length < READING_SECTIONS.length ? (
              <Button
                title={showAll ? 'Show only this item’s readings' : 'Show every kind of reading'}
                variant="quiet"
                onPress={() => setShowAll((v) => !v)}
                testID="readings-show-all"
              />
            ) : null}
            <SurfaceTemperaturesField showErrors={submitCount > 0} />
            <FormTextField name="note" label="Note" multiline style={{ minHeight: layout.minTouch * 2 }} testID="reading-note" />
            {correcting ? <FormTextField name="reason" label="What was wrong with the original" testID="reading-reason" /> : null}
            <View style={{ gap: space.sm }}>
              <Text variant="title">Checks as you type</Text>
              <Text variant="small" muted>The server runs the same checks again when the set is saved.</Text>
              {live ? <CheckResults results={live.results} testID="live-checks" /> : <Text muted>Checks appear once the readings are in range.</Text>}
            </View>
            {errs._ && submitCount > 0 ? <Notice tone="caution" word="Nothing to save">{errs._}</Notice> : null}
            <FormStatusBanner word="Not saved" />
            <View style={[styles.actions, isWide && styles.actionsWide]}>
              <Button title={correcting ? 'Save correction' : 'Save readings'} onPress={() => handleSubmit()} busy={isSubmitting} testID="readings-save" />
              {onCancel ? <Button title="Cancel" variant="secondary" onPress={onCancel} testID="readings-cancel" /> : null}
            </View>
          </View>
        );
      }}
    </Formik>
  );
}

const styles = StyleSheet.create({
  actions: { gap: space.sm },
  actionsWide: { flexDirection: 'row' },
});
