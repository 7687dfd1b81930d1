import type { FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { RequestError, errorMessage } from '@/hooks/api/request';

export interface ActionStatus {
  status: number;
  message: string;
}

/** A failed action as the form keeps it: field messages beside their fields, the server's words in the banner. */
export function actionFailed<T>(err: unknown, setErrors: (e: FormikErrors<T>) => void, setStatus: (s: ActionStatus) => void) {
  if (err instanceof RequestError && err.fields) setErrors(err.fields as FormikErrors<T>);
  setStatus({ status: err instanceof RequestError ? err.status : 0, message: errorMessage(err) });
}

const WORDS: Record<number, string> = { 403: 'Not allowed', 404: 'Not found', 409: 'Already changed', 422: 'Check the form' };

/** The server's refusal in its own words (403 not yours, 409 someone got there first, 422 a field is wrong). */
export function ActionStatusNotice({ status }: { status?: ActionStatus }) {
  if (!status) return null;
  return (
    <View testID="action-refusal">
      <Notice tone="danger" word={WORDS[status.status] ?? 'Not done'}>{status.message}</Notice>
    </View>
  );
}

export function ActionButtons({ submitTitle, busy, onSubmit, onCancel, danger, testID }: { submitTitle: string; busy: boolean; onSubmit: () => void; onCancel?: () => void; danger?: boolean; testID: string }) {
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'flex-end' }}>
      {onCancel ? <Button title="Cancel" variant="secondary" onPress={onCancel} testID={`${testID}-cancel`} /> : null}
      <Button title={submitTitle} variant={danger ? 'danger' : 'primary'} busy={busy} onPress={onSubmit} testID={`${testID}-submit`} />
    </View>
  );
}

/** Errors worth showing: all of them once the person has tried to submit, before that only touched fields. */
export function visibleErrors(errors: object, touched: Record<string, unknown>, submitCount: number): Record<string, string | undefined> {
  const out: Record<string, string | undefined> = {};
  for (const [k, v] of Object.entries(errors as Record<string, unknown>)) {
    if (typeof v === 'string' && (submitCount > 0 || touched[k.split('.')[0]])) out[k] = v;
  }
  return out;
}
