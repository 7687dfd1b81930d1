import { ValidationError, type AnySchema } from 'yup';

/** Flat field errors keyed as the server keys them (`reason`, `points[0].method`, `checks.testedSafe`). */
export type FieldErrors = Record<string, string>;

/** Runs a shared schema on the body the server will get; the first message for each path wins. */
export async function validateWith(schema: AnySchema, body: unknown): Promise<FieldErrors> {
  try {
    await schema.validate(body, { abortEarly: false });
    return {};
  } catch (err) {
    if (!(err instanceof ValidationError)) throw err;
    const out: FieldErrors = {};
    for (const e of err.inner.length ? err.inner : [err]) {
      const path = e.path || '_';
      if (!out[path]) out[path] = e.message;
    }
    return out;
  }
}
