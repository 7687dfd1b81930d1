import os from 'node:os';
import { QueryTypes, type Sequelize } from 'sequelize';
import { enqueueMail, recipientsWanting } from '@/server/mail/outbox';
import { overdueReviews } from '@/server/services/procedure-reviews.service';
import { DIGEST_HOUR, DIGEST_LAST_HOUR } from '@/shared/rules/notifications';
import { endOfDayInZone, localDate, zonedTimeToUtc } from '@/shared/rules/time-zone';
import { rolesWith } from '@/shared/rules/permissions';

interface DigestTagRow { id: number; plantId: string; assetName: string; siteName: string; kind: string; holderName: string; expiresAt: Date | string }

export interface DigestResult {
  /** Digests queued by this call. */
  sent: number;
  /** Runs claimed with nothing to report (no mail). */
  empty: number;
  /** People whose digest for the day another run (or process) had already claimed. */
  skipped: number;
}

/**
 * The morning digest: at or after DIGEST_HOUR local time (and before DIGEST_LAST_HOUR, so a server that was down
 * all morning does not send a "morning" list in the evening), each supervisor and admin who wants it gets one
 * e-mail per site time zone listing the live tags on those sites that are overdue or expire before local midnight.
 *
 * Exactly once per person, zone and local date, however many processes call this at the same moment: each run is
 * claimed by inserting its key into digest_runs (unique key user + zone + date) in the same transaction as the
 * e-mail's outbox row. A second process's insert waits on the first one's row lock and then finds the key taken.
 */
export async function runDigests(now: Date, opts: { sequelize: Sequelize; name?: string }): Promise<DigestResult> {
  const { sequelize } = opts;
  const runBy = (opts.name ?? `${os.hostname()}:${process.pid}`).slice(0, 64);
  const result: DigestResult = { sent: 0, empty: 0, skipped: 0 };
  const groups = await sequelize.query<{ organisationId: number; timeZone: string }>(
    'SELECT DISTINCT organisation_id AS organisationId, time_zone AS timeZone FROM sites ORDER BY organisation_id, time_zone',
    { type: QueryTypes.SELECT },
  );
  for (const { organisationId, timeZone } of groups) {
    const date = localDate(now, timeZone);
    const [y, m, d] = date.split('-').map(Number);
    if (now < zonedTimeToUtc(y, m, d, DIGEST_HOUR, 0, 0, timeZone) || now >= zonedTimeToUtc(y, m, d, DIGEST_LAST_HOUR, 0, 0, timeZone)) continue;

    const people = await recipientsWanting(sequelize, organisationId, 'digest', { roles: rolesWith('receiveOrganisationMail') });
    if (!people.length) continue;
    const done = new Set(
      (await sequelize.query<{ userId: number }>('SELECT user_id AS userId FROM digest_runs WHERE time_zone = ? AND local_date = ? AND user_id IN (?)', {
        replacements: [timeZone, date, people.map((p) => p.id)],
        type: QueryTypes.SELECT,
      })).map((r) => r.userId),
    );
    const due = people.filter((p) => !done.has(p.id));
    result.skipped += people.length - due.length;
    if (!due.length) continue;

    const endOfDay = new Date(endOfDayInZone(now, timeZone).getTime() + 1000);
    const tags = await sequelize.query<DigestTagRow>(
      `SELECT t.id, a.plant_id AS plantId, a.name AS assetName, s.name AS siteName, t.kind, h.name AS holderName, t.expires_at AS expiresAt
       FROM tags t JOIN assets a ON a.id = t.asset_id JOIN sites s ON s.id = a.site_id JOIN users h ON h.id = t.holder_id
       WHERE t.organisation_id = ? AND t.status = 'live' AND t.expires_at < ? AND s.time_zone = ?
       ORDER BY t.expires_at, t.id`,
      { replacements: [organisationId, endOfDay, timeZone], type: QueryTypes.SELECT },
    );
    const rows = tags.map((t) => ({ ...t, expiresAt: new Date(t.expiresAt).toISOString() }));
    const overdue = rows.filter((t) => Date.parse(t.expiresAt) < now.getTime());
    const dueToday = rows.filter((t) => Date.parse(t.expiresAt) >= now.getTime());
    // Sites in this zone whose yearly procedure review is overdue (OSHA 29 CFR 1910.147(c)(6)).
    const zoneSites = (await sequelize.query<{ id: number }>('SELECT id FROM sites WHERE organisation_id = ? AND time_zone = ?', { replacements: [organisationId, timeZone], type: QueryTypes.SELECT })).map((s) => s.id);
    const reviewsOverdue = await overdueReviews(sequelize, organisationId, zoneSites, now);
    const itemCount = rows.length + reviewsOverdue.length;

    for (const person of due) {
      const claimed = await sequelize.transaction(async (transaction) => {
        const [, affected] = await sequelize.query(
          'INSERT IGNORE INTO digest_runs (user_id, time_zone, local_date, tag_count, run_by, created_at) VALUES (?, ?, ?, ?, ?, ?)',
          { replacements: [person.id, timeZone, date, rows.length, runBy, now], type: QueryTypes.INSERT, transaction },
        );
        if (Number(affected) !== 1) return false;
        // Nothing to report: the run is recorded (so it is not retried all morning) but no e-mail goes.
        if (itemCount) {
          await enqueueMail(sequelize, [{
            organisationId, kind: 'digest', toEmail: person.email, toUserId: person.id,
            payload: { recipientName: person.name, timeZone, localDate: date, overdue, dueToday, reviewsOverdue },
          }], transaction, now);
        }
        return true;
      });
      if (!claimed) result.skipped += 1;
      else if (itemCount) result.sent += 1;
      else result.empty += 1;
    }
  }
  return result;
}
