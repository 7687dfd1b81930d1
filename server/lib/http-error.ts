import type { ErrorCode, FieldErrors } from '@/shared/types/api';

/** A failure with an HTTP status and a stable machine-readable code; the error handler sends it as JSON. */
export class HttpError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string,
    public readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const notFound = (what = 'Record') => new HttpError(404, 'not-found', `${what} not found.`);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const unprocessable = (message: string, fields?: FieldErrors) =>
  new HttpError(422, 'invalid', message, fields);
