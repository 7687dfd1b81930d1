import nodemailer from 'nodemailer';
import type { MailConfig } from '@/server/config';

/** An SMTP connection per message (no pool): the worker sends in small batches and must notice a server coming back. */
export function createMailTransport(mail: MailConfig) {
  return nodemailer.createTransport({
    host: mail.host,
    port: mail.port,
    secure: mail.secure,
    auth: mail.user ? { user: mail.user, pass: mail.pass ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}

export type MailTransport = Pick<ReturnType<typeof createMailTransport>, 'sendMail'>;
