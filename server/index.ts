import type { Server } from 'node:http';
import { createApp } from '@/server/app';
import { assertStartable, type ServerConfig } from '@/server/config';
import { createSequelize, migrate } from '@/server/db';
import { backgroundSettled } from '@/server/lib/background';
import { logger } from '@/server/lib/logger';
import { startMailJobs } from '@/server/mail/mail-jobs';

/** Connects, migrates and listens on 127.0.0.1 (or HOST). Returns a function that closes everything. */
export async function startServer(config: ServerConfig, databaseUrl: string): Promise<{ server: Server; close: () => Promise<void> }> {
  assertStartable(config);
  const sequelize = createSequelize(databaseUrl);
  await sequelize.authenticate();
  await migrate(sequelize);
  const app = createApp({ sequelize, config });
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
