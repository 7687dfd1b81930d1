import crypto from 'node:crypto';
import os from 'node:os';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { MailConfig } from '@/server/config';
import { clock } from '@/server/lib/clock';
import { logger } from '@/server/lib/logger';
import type { MailKind } from '@/server/mail/outbox';
import { renderMail } from '@/server/mail/templates';
import { createMailTransport, type MailTransport } from '@/server/mail/transport';

/** First retry after 30 s, doubling each time, never more than an hour apart. */
export const BACKOFF_BASE_MS = 30_000;
export const BACKOFF_MAX_MS = 3600_000;
/** A message the mail server refuses outright (5xx) is given up after this many refusals; a server that is down never counts. */
export const MAX_REFUSALS = 5;
/**
 * A claimed row left by a process that died is taken by another after this long (so a message may, rarely, go twice;
 * it keeps its Message-ID, so a receiving server or mail program can tell the copies apart). Leases are reckoned on
 * the database's clock, so processes on machines whose clocks disagree still agree on them.
 */
const CLAIM_SECONDS = 120;
/** Tries at recording a sent message before it is kept in memory and recorded on the next batch instead. */
const MARK_SENT_TRIES = 3;

interface SentMark { id: number | string; attempts: number; at: Date }

/**
 * The Message-ID of an outbox row (RFC 5322 §3.6.4): the same for every attempt at the same row, unique across rows
 * and installations (the row's creation time rides along with its id), on the sending address's domain.
 */
export function outboxMessageId(row: { id: number | string; created_at: Date | string }, from: string): string {
  const domain = /@([A-Za-z0-9.-]+)>?\s*$/.exec(from)?.[1] ?? 'isoledger.invalid';
  return `<outbox.${row.id}.${new Date(row.created_at).getTime().toString(36)}@${domain}>`;
}

export function backoffMs(attempts: number): number {
  return Math.min(BACKOFF_MAX_MS, BACKOFF_BASE_MS * 2 ** Math.max(0, attempts - 1));
}

interface OutboxRow {
  id: number | string;
  created_at: Date | string;
  kind: MailKind;
  to_email: string;
  payload: string | Record<string, unknown>;
  attempts: number;
  refusals: number;
}

export interface OutboxWorkerOptions {
  sequelize: Sequelize;
  mail: MailConfig;
  publicUrl: string;
  transport?: MailTransport;
  /** Distinguishes processes in claimed_by; defaults to host:pid. */
  name?: string;
  batchSize?: number;
}

export interface OutboxWorker {
  /** Claims and sends one batch of due mail; returns how many were sent and how many attempts failed this time. */
  runOnce(): Promise<{ sent: number; failed: number }>;
  /** Runs batches every `mail.pollMs` until stopped. */
  start(): void;
  stop(): Promise<void>;
}

export function createOutboxWorker(opts: OutboxWorkerOptions): OutboxWorker {
  const { sequelize } = opts;
  const transport = opts.transport ?? createMailTransport(opts.mail);
  const name = (opts.name ?? `${os.hostname()}:${process.pid}`).slice(0, 40);
  const batchSize = opts.batchSize ?? 20;

  /**
   * Safe with several processes: one UPDATE … LIMIT marks due, unclaimed rows with a claim id unique to this
   * batch (the row locks make two concurrent UPDATEs take disjoint rows), then only rows carrying that id are read.
   */
  async function claim(claimId: string): Promise<OutboxRow[]> {
    await sequelize.query(
      `UPDATE outbox SET claimed_by = ?, claimed_until = UTC_TIMESTAMP(3) + INTERVAL ${CLAIM_SECONDS} SECOND
       WHERE sent_at IS NULL AND failed_at IS NULL AND next_attempt_at <= ? AND (claimed_until IS NULL OR claimed_until < UTC_TIMESTAMP(3))
       ORDER BY next_attempt_at, id LIMIT ${Number(batchSize)}`,
      { replacements: [claimId, clock.now()] },
    );
    return sequelize.query<OutboxRow>('SELECT id, created_at, kind, to_email, payload, attempts, refusals FROM outbox WHERE claimed_by = ? AND sent_at IS NULL ORDER BY id', {
      replacements: [claimId],
      type: QueryTypes.SELECT,
    });
  }

  /** 'unreachable' means the mail server could not be reached at all: the rest of the batch would fail the same way. */
  async function deliver(row: OutboxRow, claimId: string): Promise<'sent' | 'failed' | 'unreachable' | 'lost-claim'> {
    // Renew the claim just before sending, so a slow batch is never overtaken by another process.
    await sequelize.query(`UPDATE outbox SET claimed_until = UTC_TIMESTAMP(3) + INTERVAL ${CLAIM_SECONDS} SECOND WHERE id = ? AND claimed_by = ? AND sent_at IS NULL`, {
      replacements: [row.id, claimId],
    });
    // Read back rather than trust the affected-row count, which is 0 when the new time equals the old one.
    const [current] = await sequelize.query<{ claimedBy: string | null; sentAt: Date | null }>('SELECT claimed_by AS claimedBy, sent_at AS sentAt FROM outbox WHERE id = ?', {
      replacements: [row.id],
      type: QueryTypes.SELECT,
    });
    if (!current || current.claimedBy !== claimId || current.sentAt) return 'lost-claim';
    const payload = typeof row.payload === 'string' ? (JSON.parse(row.payload) as Record<string, unknown>) : row.payload;
    const attempts = row.attempts + 1;
    try {
      const mail = renderMail(row.kind, payload, opts.publicUrl);
      await transport.sendMail({
        from: opts.mail.from, to: row.to_email, subject: mail.subject, text: mail.text, html: mail.html,
        messageId: outboxMessageId(row, opts.mail.from),
      });
    } catch (err) {
      const e = err as Error & { responseCode?: number; code?: string };
      const refused = typeof e.responseCode === 'number' && e.responseCode >= 500;
      const refusals = row.refusals + (refused ? 1 : 0);
      const giveUp = refusals >= MAX_REFUSALS;
      const now = clock.now();
      // A message given up keeps no one-time link token: nobody will ever receive it.
      await sequelize.query(
        `UPDATE outbox SET attempts = ?, refusals = ?, next_attempt_at = ?, last_error = ?, claimed_by = NULL, claimed_until = NULL, failed_at = ?,
           payload = IF(?, JSON_REMOVE(payload, '$.token'), payload)
         WHERE id = ? AND sent_at IS NULL`,
        { replacements: [attempts, refusals, new Date(now.getTime() + backoffMs(attempts)), `${e.code ?? e.responseCode ?? 'error'}: ${e.message}`.slice(0, 1000), giveUp ? now : null, giveUp, row.id] },
      );
      logger.warn({ outboxId: row.id, kind: row.kind, attempts, code: e.code ?? e.responseCode, giveUp }, giveUp ? 'mail refused; given up' : 'mail not sent; will retry');
      return e.responseCode === undefined ? 'unreachable' : 'failed';
    }
    // Sent: from here on nothing may count as a failed attempt, or the message would go again.
    await recordSent({ id: row.id, attempts, at: clock.now() });
    return 'sent';
  }

  /** Messages the mail server accepted whose sending could not yet be written to the database. */
  const unrecorded = new Map<string, SentMark>();

  /**
   * Writes that a message went (and drops its one-time link token, which has no business staying in the database).
   * If the database fails, the mark is kept in memory and written before this process claims anything else; the row
   * keeps its claim meanwhile, so no process sends it again while the lease lasts (an outage longer than the lease may
   * let another process send a copy, under the same Message-ID).
   */
  async function recordSent(mark: SentMark): Promise<void> {
    for (let tries = 1; ; tries += 1) {
      try {
        await sequelize.query(
          `UPDATE outbox SET sent_at = ?, attempts = ?, claimed_by = NULL, claimed_until = NULL, last_error = NULL, payload = JSON_REMOVE(payload, '$.token')
           WHERE id = ? AND sent_at IS NULL`,
          { replacements: [mark.at, mark.attempts, mark.id] },
        );
        unrecorded.delete(String(mark.id));
        return;
      } catch (err) {
        if (tries >= MARK_SENT_TRIES) {
          unrecorded.set(String(mark.id), mark);
          logger.error({ err, outboxId: mark.id }, 'mail sent but not yet recorded; will record it before the next batch');
          return;
        }
        await new Promise((resolve) => setTimeout(resolve, 200 * tries));
      }
    }
  }

  /** Writes the marks left over from a database failure; false if some are still unwritten. */
  async function flushUnrecorded(): Promise<boolean> {
    for (const mark of [...unrecorded.values()]) await recordSent(mark);
    return unrecorded.size === 0;
  }

  async function runOnce() {
    // Nothing new is sent while a sent message is still unrecorded: the database is not answering.
    if (!(await flushUnrecorded())) return { sent: 0, failed: 0 };
    const claimId = `${name}/${crypto.randomBytes(6).toString('hex')}`;
    const rows = await claim(claimId);
    let sent = 0;
    let failed = 0;
    for (const row of rows) {
      const outcome = await deliver(row, claimId);
      if (outcome === 'sent') sent += 1;
      else if (outcome !== 'lost-claim') failed += 1;
      if (outcome === 'unreachable') {
        // Hand the rest back untouched; the next poll tries again with one message, not a whole batch of timeouts.
        await sequelize.query('UPDATE outbox SET claimed_by = NULL, claimed_until = NULL WHERE claimed_by = ? AND sent_at IS NULL', { replacements: [claimId] });
        break;
      }
    }
    return { sent, failed };
  }

  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;
  let stopped = true;
  const tick = () => {
    running = runOnce()
      .catch((err) => logger.error({ err }, 'outbox worker batch failed'))
      .finally(() => {
        running = null;
        if (!stopped) timer = setTimeout(tick, opts.mail.pollMs);
      });
  };
  return {
    runOnce,
    start() {
      if (!stopped) return;
      stopped = false;
      timer = setTimeout(tick, 0);
    },
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running;
    },
  };
}
