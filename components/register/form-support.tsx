import type { FormikErrors } from 'formik';
import { nestErrors } from '@/components/forms/submit';
import { RequestError, errorMessage } from '@/hooks/api/request';

export { FormTextField } from '@/components/forms/bound-fields';
export { prepareValues } from '@/components/forms/submit';

/** A server error into the form: field messages (keys such as `attributes.capacityL`) beside their fields, the rest in the banner. */
export function applyServerError<T>(err: unknown, setErrors: (e: FormikErrors<T>) => void, setStatus: (s: string) => void) {
  if (err instanceof RequestError && err.fields) setErrors(nestErrors<T>(err.fields));
  setStatus(errorMessage(err));
}
