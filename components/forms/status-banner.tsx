import { useFormikContext } from 'formik';
import { View } from 'react-native';
import { Notice } from '@/components/ui/notice';
import type { FormStatus } from '@/components/forms/submit';

// The banner's word says what kind of refusal it is, so it is never told by colour alone.
const WORDS: Record<number, string> = { 0: 'Not sent', 400: 'Not understood', 401: 'Signed out', 403: 'Not allowed', 404: 'Not found', 409: 'Already changed', 413: 'Too large', 422: 'Check the form', 429: 'Too many tries' };

/** A refusal in the server's own words (403 not yours, 409 someone got there first, 422 a field is wrong). */
export function StatusBanner({ status, word, testID = 'form-status' }: { status?: FormStatus | null; word?: string; testID?: string }) {
  if (!status) return null;
  // Queued with no signal is not a refusal: it waits in the outbox and has not happened yet.
  const queued = status.code === 'queued';
  return (
    <View testID={testID}>
      <Notice tone={queued ? 'info' : 'danger'} word={queued ? 'No signal' : (word ?? WORDS[status.status] ?? 'Not done')}>{status.message}</Notice>
    </View>
  );
}

/** The status banner of the Formik form it sits in. */
export function FormStatusBanner({ word, testID }: { word?: string; testID?: string }) {
  const { status } = useFormikContext();
  return <StatusBanner status={status as FormStatus | undefined} word={word} testID={testID} />;
}
