import { Formik, getIn, setIn, type FormikErrors } from 'formik';
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { ValidationError, type AnyObjectSchema } from 'yup';
import { CheckResults } from '@/components/readings/check-results';
import { MeasurementField } from '@/components/readings/measurement-field';
import {
  formPathFor,
  initialReadingForm,
  READING_FIELDS,
  readingFormToSi,
  type ReadingFormValues,
} from '@/components/readings/reading-fields';
import { SurfaceTemperaturesField } from '@/components/readings/surface-temperatures-field';
import { layout, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { RequestError, errorMessage } from '@/hooks/api/request';
import { useCorrectReadingMutation, useLogReadingsMutation } from '@/hooks/api/use-readings';
import { UNIT_OPTIONS } from '@/shared/calc';
import { emptyReadingValues, runReadingChecks } from '@/shared/rules/readings';
import { readingCorrectionSchema, readingSetSchema, type ReadingCorrectionInput, type ReadingSetInput } from '@/shared/schemas/readings';
import type { CheckSettings, ReadingSet, ReadingValues } from '@/shared/types/readings';

type Errors = FormikErrors<ReadingFormValues> & { _?: string };

/** Converts to SI and runs the same schema as the server; errors land on the form's own field names. */
async function validateReadings(values: ReadingFormValues, schema: AnyObjectSchema): Promise<Errors> {
  const { body, unreadable } = readingFormToSi(values);
  let errors: Errors = {};
  try {
    await schema.validate(body, { abortEarly: false });
  } catch (err) {
    if (!(err instanceof ValidationError)) throw err;
    for (const e of err.inner.length ? err.inner : [err]) {
      const path = e.path ? formPathFor(e.path) : '_';
      if (!getIn(errors, path)) errors = setIn(errors, path, e.message);
    }
  }
  for (const [path, message] of Object.entries(unreadable)) errors = setIn(errors, path, message);
  return errors;
}

/** Readings typed so far as SI values; unreadable entries count as not read. */
function liveValues(values: ReadingFormValues): ReadingValues {
  const { body } = readingFormToSi(values);
  const v = { ...emptyReadingValues(), ...body } as ReadingValues;
  v.surfaceTemperatures = [];
  return v;
}

interface Props {
  assetId: number;
  checkSettings: CheckSettings;
  /** When set, the form appends a correction to this set instead of logging a new one. */
  correcting?: ReadingSet | null;
  onDone: (saved: ReadingSet) => void;
  onCancel?: () => void;
}

export function ReadingsForm({ assetId, checkSettings, correcting, onDone, onCancel }: Props) {
  const { isWide } = useBreakpoints();
  const log = useLogReadingsMutation(assetId);
  const correct = useCorrectReadingMutation(assetId);
  const schema = correcting ? readingCorrectionSchema : readingSetSchema;
  const initialValues = useMemo(() => initialReadingForm(correcting?.values, correcting?.note ?? ''), [correcting]);
  return (
    <Formik<ReadingFormValues>
      initialValues={initialValues}
      validate={(values) => validateReadings(values, schema)}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        const { body } = readingFormToSi(values);
        try {
          const saved = correcting
            ? await correct.mutateAsync({ readingId: correcting.id, input: body as ReadingCorrectionInput })
            : await log.mutateAsync(body as ReadingSetInput);
          onDone(saved);
        } catch (err) {
          if (err instanceof RequestError && err.fields) {
            let mapped: Errors = {};
            for (const [path, message] of Object.entries(err.fields)) mapped = setIn(mapped, formPathFor(path), message);
            setErrors(mapped);
          }
          setStatus(errorMessage(err));
        }
      }}
    >
      {({ values, errors, touched, setFieldValue, setFieldTouched, handleSubmit, isSubmitting, submitCount, status }) => {
        const errs = errors as Errors;
        const show = (path: string) => (submitCount > 0 || getIn(touched, path) ? (getIn(errs, path) as string | undefined) : undefined);
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
            <View style={[styles.fields, isWide && styles.fieldsWide]}>
              {READING_FIELDS.map((f) => (
                <View key={f.key} style={isWide ? styles.fieldWide : undefined}>
                  <MeasurementField
                    label={f.label}
                    hint={f.hint}
                    value={values.entries[f.key]}
                    onChangeText={(t) => setFieldValue(`entries.${f.key}`, t)}
                    onBlur={() => setFieldTouched(`entries.${f.key}`, true)}
                    unit={values.units[f.key]}
                    units={UNIT_OPTIONS[f.quantity]}
                    onUnitChange={(u) => setFieldValue(`units.${f.key}`, u)}
                    error={show(`entries.${f.key}`)}
                    testID={`reading-${f.key}`}
                  />
                </View>
              ))}
            </View>
            <SurfaceTemperaturesField showErrors={submitCount > 0} />
            <TextField
              label="Note"
              value={values.note}
              onChangeText={(t) => setFieldValue('note', t)}
              multiline
              numberOfLines={3}
              style={{ minHeight: layout.minTouch * 2, paddingTop: space.sm, textAlignVertical: 'top' }}
              error={show('note')}
              testID="reading-note"
            />
            {correcting ? (
              <TextField
                label="What was wrong with the original"
                value={values.reason}
                onChangeText={(t) => setFieldValue('reason', t)}
                onBlur={() => setFieldTouched('reason', true)}
                error={show('reason')}
                testID="reading-reason"
              />
            ) : null}
            <View style={{ gap: space.sm }}>
              <Text variant="title">Checks as you type</Text>
              <Text variant="small" muted>The server runs the same checks again when the set is saved.</Text>
              {live ? <CheckResults results={live.results} testID="live-checks" /> : <Text muted>Checks appear once the readings are in range.</Text>}
            </View>
            {errs._ && submitCount > 0 ? <Notice tone="caution" word="Nothing to save">{errs._}</Notice> : null}
            {status ? <Notice tone="danger" word="Not saved">{status}</Notice> : null}
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
  fields: { gap: 0 },
  fieldsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
  fieldWide: { flexBasis: 300, flexGrow: 1 },
  actions: { gap: space.sm },
  actionsWide: { flexDirection: 'row' },
});
