import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import type { UndeliveredMail } from '@/shared/types/team';

/** Every e-mail Isoledger sends; the worker renders each kind from its payload (server/mail/templates.ts). */
export const MAIL_KINDS = [
  'tag-raised',
  'tag-cleared',
  'tag-cleared-in-absence',
  'my-tag-cleared-in-absence',
  'my-tag-handed-over',
  'my-tag-reassigned-in-absence',
  'tag-reassigned-to-you',
  'digest',
  'invite',
  'password-reset',
  'visit-summary',
] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export interface OutboxMail {
  organisationId: number | null;
  kind: MailKind;
  toEmail: string;
  toUserId: number | null;
  /** Everything the template needs, frozen at the moment of the event. */
  payload: Record<string, unknown>;
}

/**
 * Writes mail to the outbox inside the caller's transaction: the mail exists if and only if the event that
 * caused it was committed, and sending (later, by the worker) can never hold up or undo that event.
 */
export async function enqueueMail(sequelize: Sequelize, mails: OutboxMail[], transaction: Transaction | null, now: Date = clock.now()): Promise<void> {
  if (!mails.length) return;
  const values: unknown[] = [];
  for (const m of mails) values.push(m.organisationId, m.kind, m.toEmail, m.toUserId, JSON.stringify(m.payload), now, now);
  await sequelize.query(
    `INSERT INTO outbox (organisation_id, kind, to_email, to_user_id, payload, attempts, next_attempt_at, created_at)
     VALUES ${mails.map(() => '(?, ?, ?, ?, ?, 0, ?, ?)').join(', ')}`,
    { replacements: values, type: QueryTypes.INSERT, transaction: transaction ?? undefined },
  );
}

/** The subset of people in an organisation who want a given e-mail; a person without a settings row wants all. */
export async function recipientsWanting(
  sequelize: Sequelize,
  organisationId: number,
  setting: 'raised' | 'cleared' | 'digest' | 'my_tags',
  opts: { roles?: string[]; userIds?: number[]; transaction?: Transaction | null },
): Promise<{ id: number; name: string; email: string; role: string }[]> {
  const where: string[] = ['u.organisation_id = ?', 'u.active = 1', 'u.password_hash IS NOT NULL', `COALESCE(s.${setting}, 1) = 1`];
  const replacements: unknown[] = [organisationId];
  if (opts.roles) {
    where.push('u.role IN (?)');
    replacements.push(opts.roles);
  }
  if (opts.userIds) {
    if (!opts.userIds.length) return [];
    where.push('u.id IN (?)');
    replacements.push(opts.userIds);
  }
  return sequelize.query(
    `SELECT u.id, u.name, u.email, u.role FROM users u
     LEFT JOIN user_notification_settings s ON s.user_id = u.id
     WHERE ${where.join(' AND ')} ORDER BY u.id`,
    { replacements, type: QueryTypes.SELECT, transaction: opts.transaction ?? undefined },
  );
}

/** E-mails of an organisation that were given up, newest first (admins see them on the team screen). */
export async function undeliveredMail(sequelize: Sequelize, organisationId: number, limit = 50): Promise<{ items: UndeliveredMail[]; total: number }> {
  const rows = await sequelize.query<{ id: number | string; kind: string; toEmail: string; createdAt: Date; givenUpAt: Date; attempts: number; lastError: string | null }>(
    `SELECT id, kind, to_email AS toEmail, created_at AS createdAt, failed_at AS givenUpAt, attempts, last_error AS lastError
     FROM outbox WHERE organisation_id = ? AND failed_at IS NOT NULL ORDER BY failed_at DESC, id DESC LIMIT ${Number(limit)}`,
    { replacements: [organisationId], type: QueryTypes.SELECT },
  );
  const [{ n }] = await sequelize.query<{ n: number | bigint }>('SELECT COUNT(*) AS n FROM outbox WHERE organisation_id = ? AND failed_at IS NOT NULL', {
    replacements: [organisationId],
    type: QueryTypes.SELECT,
  });
  return {
    items: rows.map((r) => ({ ...r, id: Number(r.id), createdAt: new Date(r.createdAt).toISOString(), givenUpAt: new Date(r.givenUpAt).toISOString() })),
    total: Number(n),
  };
}

/** Across the service: e-mails waiting to go, and e-mails given up (for /api/health). */
export async function outboxCounts(sequelize: Sequelize): Promise<{ waiting: number; givenUp: number }> {
  const [row] = await sequelize.query<{ waiting: number | bigint | null; givenUp: number | bigint | null }>(
    'SELECT SUM(sent_at IS NULL AND failed_at IS NULL) AS waiting, SUM(failed_at IS NOT NULL) AS givenUp FROM outbox',
    { type: QueryTypes.SELECT },
  );
  return { waiting: Number(row?.waiting ?? 0), givenUp: Number(row?.givenUp ?? 0) };
}
