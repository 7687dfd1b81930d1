import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ValidationError } from 'yup';
import { HttpError } from '@/server/lib/http-error';
import { isDatabaseUnavailable } from '@/server/db-errors';
import { logger, redactUrl } from '@/server/lib/logger';
import { BusyError } from '@/server/lib/work-limit';
import { fieldErrors } from '@/shared/schemas/field-errors';
import type { ApiErrorBody, ErrorCode } from '@/shared/types/api';

export const notFoundApi: RequestHandler = (_req, res) => {
  res.status(404).json({ error: { code: 'not-found', message: 'No such API endpoint.' } });
};

/** The one place errors become responses: no stack trace or SQL ever reaches a client. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof ValidationError) {
    res.status(422).json({ error: { code: 'invalid', message: 'Some fields need attention.', fields: fieldErrors(err) } });
    return;
  }
  if (err instanceof HttpError) {
    if (err instanceof BusyError) res.set('Retry-After', String(err.retryAfterSeconds));
    res.status(err.status).json({ error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } });
    return;
  }
  // body-parser, multer and similar libraries tag their client errors with a 4xx status.
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status >= 400 && status < 500) {
    const message = err.type === 'entity.too.large' ? 'The request is too large.' : err.type === 'entity.parse.failed' ? 'The request body is not valid JSON.' : 'The request could not be understood.';
    const code: ErrorCode = err.type === 'entity.too.large' || err.type === 'entity.parse.failed' ? err.type : 'bad-request';
    res.status(status).json({ error: { code, message } } satisfies ApiErrorBody);
    return;
  }
  // The database down, restarting or stalled: the client may retry shortly (its idempotency key makes that safe).
  if (isDatabaseUnavailable(err)) {
    logger.warn({ err: { message: err.message, name: err.name }, method: req.method, url: redactUrl(req.originalUrl) }, 'database unavailable');
    res.set('Retry-After', '5').status(503).json({ error: { code: 'unavailable', message: 'The database is not answering just now. Please try again in a few seconds.' } } satisfies ApiErrorBody);
    return;
  }
  logger.error({ err, method: req.method, url: redactUrl(req.originalUrl) }, 'unhandled error');
  res.status(500).json({ error: { code: 'server-error', message: 'Something went wrong on the server. It has been logged; please try again.' } });
};
