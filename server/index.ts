import type { Server } from 'node:http';
import { createApp } from '@/server/app';
import { assertStartable, type ServerConfig } from '@/server/config';
import { assertMigrated, createSequelize, prepareDatabase } from '@/server/db';
import { backgroundSettled } from '@/server/lib/background';
import { logger } from '@/server/lib/logger';
import { startMailJobs } from '@/server/mail/mail-jobs';
import type { LauncherStatus } from '@/server/services/health.service';

export interface StartOptions {
  /** The migration owner's URL: when given, migrations run and the server's grants are renewed before listening. */
  ownerUrl?: string;
  /** The private mariadbd's launcher, reported by /api/health. */
  launcher?: () => LauncherStatus;
}

/** Connects as the server's own account, checks (or runs) migrations and listens on 127.0.0.1 (or HOST). */
export async function startServer(config: ServerConfig, databaseUrl: string, opts: StartOptions = {}): Promise<{ server: Server; close: () => Promise<void> }> {
  assertStartable(config);
  if (opts.ownerUrl) await prepareDatabase(opts.ownerUrl, databaseUrl);
  const sequelize = createSequelize(databaseUrl);
  await sequelize.authenticate();
  await assertMigrated(sequelize);
  const app = createApp({ sequelize, config, launcher: opts.launcher });
  const host = process.env.HOST ?? '127.0.0.1';
  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(config.port, host, () => resolve(s));
    s.once('error', reject);
  });
  logger.info({ port: config.port, host }, 'server listening');
  // The outbox worker and the morning digest run in every server process; the database keeps them from doubling up.
  const stopMailJobs = startMailJobs(sequelize, config);
  return {
    server,
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections?.();
      await backgroundSettled();
      await stopMailJobs();
      await sequelize.close();
    },
  };
}
