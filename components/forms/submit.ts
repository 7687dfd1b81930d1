import { getIn, prepareDataForValidation, setIn, type FormikErrors, type FormikHelpers } from 'formik';
import type { AnySchema } from 'yup';
import { RequestError, errorMessage } from '@/hooks/api/request';
import { validateFields } from '@/shared/schemas/field-errors';
import type { ErrorCode, FieldErrors } from '@/shared/types/api';

/** What a form shows in its status banner after a try: the server's refusal, or nothing. */
export interface FormStatus {
  status: number;
  code: ErrorCode | 'unknown';
  message: string;
  /** The refusal's field messages as the server named them. */
  fields?: FieldErrors;
}

/**
 * Values as the shared schema should see them: Formik's own preparation (empty strings become undefined,
 * so optional fields take their schema defaults) — the same the form's validation runs on.
 */
export const prepareValues = <T extends object>(values: T) => prepareDataForValidation(values as Record<string, unknown>) as T;

/** A form whose field names differ from the API's (a number typed in a unit) maps each API path to its own. */
export type FieldPathMap = (apiPath: string) => string;

/**
 * Flat field messages (`attributes.capacityL`, `points[0].method`) as Formik's nested errors. A message on a
 * whole entry (`points[0]`) and one on its part (`points[0].method`) cannot both nest: the first one stays.
 */
export function nestErrors<T>(fields: FieldErrors, pathFor: FieldPathMap = (p) => p): FormikErrors<T> {
  let nested: FormikErrors<T> = {};
  for (const [apiPath, message] of Object.entries(fields)) {
    const path = pathFor(apiPath);
    const parts = path.split(/[.[\]]+/).filter(Boolean);
    const taken = parts.some((_, i) => getIn(nested, parts.slice(0, i + 1)) !== undefined);
    if (!taken) nested = setIn(nested, path, message);
  }
  return nested;
}

/** A failure as a form status: the HTTP status (0 without an answer), the code and the server's words. */
export function failureStatus(err: unknown): FormStatus {
  return err instanceof RequestError
    ? { status: err.status, code: err.code, message: err.message, fields: err.fields }
    : { status: 0, code: 'unknown', message: errorMessage(err) };
}

type Helpers<T> = Pick<FormikHelpers<T>, 'setErrors' | 'setStatus'>;

/** A failure into the form: field messages beside their fields, everything in the status banner. */
function applyFailure<T>(err: unknown, { setErrors, setStatus }: Helpers<T>, pathFor?: FieldPathMap) {
  if (err instanceof RequestError && err.fields) setErrors(nestErrors<T>(err.fields, pathFor));
  setStatus(failureStatus(err));
}

/**
 * The one submit: clears the banner, runs the action (usually a mutation's `mutateAsync`), and on failure
 * maps `error.fields` to the fields and the rest to the banner. Answers the action's result, or undefined.
 *   onSubmit={(values, helpers) => submitForm(helpers, () => invite.mutateAsync(values))}
 */
export async function submitForm<T, R>(helpers: Helpers<T>, action: () => Promise<R>, pathFor?: FieldPathMap): Promise<R | undefined> {
  helpers.setStatus(undefined);
  try {
    return await action();
  } catch (err) {
    applyFailure(err, helpers, pathFor);
    return undefined;
  }
}

/**
 * A Formik `validate` from a shared schema, run on the body the server will get (`toBody`), with `context`
 * for rules that depend on the tag's kind or the actor's role (a function when it holds the time now).
 * The server runs the same schema.
 */
export const validateWithSchema =
  <T>(schema: AnySchema, toBody: (values: T) => unknown = (v) => v, context?: Record<string, unknown> | (() => Record<string, unknown>)) =>
  async (values: T): Promise<FormikErrors<T>> =>
    nestErrors<T>(await validateFields(schema, toBody(values), typeof context === 'function' ? context() : context));
