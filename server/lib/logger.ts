import pino from 'pino';

export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
  redact: ['req.headers.authorization', 'req.headers.cookie', 'password', '*.password', 'token', '*.token'],
});

/** Query parameters that carry a one-time secret (set-password and invitation links) or a session. */
const SECRET_PARAMS = /([?&](?:token|access_token|code)=)[^&#]*/gi;

/** A URL as it may be logged: one-time tokens replaced, so a log never holds a working link. */
export const redactUrl = (url: string) => url.replace(SECRET_PARAMS, '$1[redacted]');
