import { ValidationError, type AnySchema } from 'yup';
import type { FieldErrors } from '@/shared/types/api';

/**
 * A yup ValidationError as `{ path: message }`, the first message per field. The server's error handler
 * answers with this, and forms run the same function on the same schema, so both name fields alike.
 */
export function fieldErrors(err: ValidationError): FieldErrors {
  const fields: FieldErrors = {};
  for (const e of err.inner.length ? err.inner : [err]) {
    const key = e.path || '_';
    if (!fields[key]) fields[key] = e.message;
  }
  return fields;
}

/** Runs a shared schema on what will be sent; `{}` when it passes. `context` carries rules that depend on who acts. */
export async function validateFields(schema: AnySchema, value: unknown, context?: Record<string, unknown>): Promise<FieldErrors> {
  try {
    await schema.validate(value, { abortEarly: false, context });
    return {};
  } catch (err) {
    if (err instanceof ValidationError) return fieldErrors(err);
    throw err;
  }
}
