import { readMailConfig } from '@/server/config';
import { createOutboxWorker } from '@/server/mail/outbox-worker';
import { setupTestApp } from '@/test/setup/app';
import { MailInbox } from '@/test/support/mail-inbox';

export const TEST_PUBLIC_URL = 'http://isoledger.test:8080';

/** A test app whose mail goes over SMTP on loopback to a fake mail server of its own, and a worker to send it. */
export async function setupMailTestApp() {
  const inbox = await new MailInbox().start();
  const t = await setupTestApp({
    publicUrl: TEST_PUBLIC_URL,
    mail: { ...readMailConfig({}), port: inbox.smtpPort, from: 'Isoledger <no-reply@isoledger.example>' },
    loginRateLimit: { max: 1000, windowMs: 60_000 },
  });
  const worker = createOutboxWorker({ sequelize: t.db.sequelize, mail: t.config.mail, publicUrl: t.config.publicUrl, name: 'test-worker' });
  const close = async () => {
    await t.close();
    await inbox.stop();
  };
  return { t, inbox, worker, close };
}

/** Outbox rows as the database holds them. */
export async function outboxRows(t: Awaited<ReturnType<typeof setupTestApp>>, where = '1 = 1') {
  return t.db.rootQuery<{ id: number; kind: string; to_email: string; attempts: number; sent_at: Date | null; next_attempt_at: Date; last_error: string | null; payload: Record<string, unknown> }[]>(
    `SELECT id, kind, to_email, attempts, sent_at, next_attempt_at, last_error, payload FROM outbox WHERE ${where} ORDER BY id`,
  );
}
