import { getIn, prepareDataForValidation, setIn, useFormikContext, type FormikErrors } from 'formik';
import type { TextInputProps } from 'react-native';
import { TextField } from '@/components/ui/text-field';
import { RequestError, errorMessage } from '@/hooks/api/request';

/**
 * Values as the shared schema should see them: Formik's own preparation (empty strings become undefined,
 * so optional fields take their schema defaults) — the same the form's validation runs on.
 */
export const prepareValues = <T extends object>(values: T) => prepareDataForValidation(values as never) as T;

/** A server error into the form: field messages (keys such as `attributes.capacityL`) beside their fields, the rest in the banner. */
export function applyServerError<T>(err: unknown, setErrors: (e: FormikErrors<T>) => void, setStatus: (s: string) => void) {
  if (err instanceof RequestError && err.fields) {
    let nested: FormikErrors<T> = {};
    for (const [k, v] of Object.entries(err.fields)) nested = setIn(nested, k, v);
    setErrors(nested);
  }
  setStatus(errorMessage(err));
}

/** A TextField bound to a Formik field by its (possibly nested) name. */
export function FormTextField({ name, label, ...rest }: TextInputProps & { name: string; label: string; hint?: string }) {
  const { values, errors, touched, submitCount, handleChange, handleBlur } = useFormikContext();
  const error = getIn(errors, name) as string | undefined;
  const shown = !!error && (!!getIn(touched, name) || submitCount > 0);
  const value = getIn(values, name);
  return (
    <TextField
      label={label}
      value={value == null ? '' : String(value)}
      onChangeText={handleChange(name)}
      onBlur={handleBlur(name)}
      error={shown && error}
      testID={`field-${name}`}
      {...rest}
    />
  );
}
