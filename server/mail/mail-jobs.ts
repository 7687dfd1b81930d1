import cron from 'node-cron';
import type { Sequelize } from 'sequelize';
import type { ServerConfig } from '@/server/config';
import { clock } from '@/server/lib/clock';
import { logger } from '@/server/lib/logger';
import { runDigests } from '@/server/mail/digest';
import { createOutboxWorker } from '@/server/mail/outbox-worker';

/** Every five minutes: runDigests itself decides, per site time zone, whether it is digest time there. */
export const DIGEST_CRON = '*/5 * * * *';

/** Starts the outbox worker and the digest schedule inside a running server; returns a function that stops both. */
export function startMailJobs(sequelize: Sequelize, config: ServerConfig): () => Promise<void> {
  const worker = createOutboxWorker({ sequelize, mail: config.mail, publicUrl: config.publicUrl });
  worker.start();
  const task = cron.schedule(
    DIGEST_CRON,
    async () => {
      try {
        const r = await runDigests(clock.now(), { sequelize });
        if (r.sent || r.empty) logger.info(r, 'morning digests run');
      } catch (err) {
        logger.error({ err }, 'morning digests failed');
      }
    },
    { noOverlap: true, name: 'isoledger-digest' },
  );
  return async () => {
    await task.stop();
    await worker.stop();
  };
}
