import path from 'node:path';
import { prepareDatabase } from '@/server/db';
import { startServer } from '@/server/index';
import type { LauncherStatus } from '@/server/services/health.service';
import { runUntilStopped, say, sayDemoSignIns, seedDemoIfAllowed, startMailIfLocal } from '@/scripts/lib/app-launch';
import { startLocalDatabase } from '@/scripts/lib/local-db';
import { buildWebIfChanged } from '@/scripts/lib/web-build';

void runUntilStopped(async (config, stops) => {
  // DATABASE_URL is the server's own account; DATABASE_OWNER_URL the account migrations run as (scripts/sql/accounts.sql).
  let databaseUrl = process.env.DATABASE_URL;
  let ownerUrl = process.env.DATABASE_OWNER_URL || databaseUrl;
  let launcher: (() => LauncherStatus) | undefined;
  if (!databaseUrl) {
    const port = Number(process.env.DB_PORT ?? 3307);
    say(`starting the private MariaDB on 127.0.0.1:${port} (data in ${path.join(config.dataDir, 'mariadb')})`);
    const local = await startLocalDatabase(config.dataDir, port, say);
    stops.push(() => local.db.stop());
    databaseUrl = local.serverUrl;
    ownerUrl = local.ownerUrl;
    launcher = local.db.status;
  }
  await prepareDatabase(ownerUrl!, databaseUrl);
  const demo = await seedDemoIfAllowed(config, databaseUrl);

  await buildWebIfChanged(say);
  await startMailIfLocal(config, stops);
  const running = await startServer(config, databaseUrl, { launcher });
  stops.push(running.close);

  say(`Isoledger is running at ${config.publicUrl}`);
  if (demo) sayDemoSignIns();
  say('press Ctrl-C to stop the server and the database');
});
