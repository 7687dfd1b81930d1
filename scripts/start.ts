import path from 'node:path';
import { assertStartable, readConfig } from '@/server/config';
import { createSequelize, migrate } from '@/server/db';
import { startServer } from '@/server/index';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/server/seed/demo';
import { demoSeedDecision, demoWarning } from '@/server/seed/demo-guard';
import { readOrCreateSecret, startLocalDatabase } from '@/scripts/lib/local-db';
import { buildWebIfChanged } from '@/scripts/lib/web-build';
import { startLocalMailServer } from '@/scripts/lib/maildev';

const say = (line: string) => console.log(`[isoledger] ${line}`);

async function main() {
  const config = readConfig();
  config.jwtSecret ||= readOrCreateSecret(path.join(config.dataDir, 'jwt-secret'), 48);
  // A weak secret stops the start before the database or anything else is started.
  assertStartable(config);
  const stops: (() => Promise<void>)[] = [];
  let stopping = false;
  const shutdown = async (code: number) => {
    if (stopping) return;
    stopping = true;
    say('stopping…');
    for (const stop of stops.reverse()) await stop().catch((err) => console.error(err));
    process.exit(code);
  };
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));

  try {
    let databaseUrl = process.env.DATABASE_URL;
    if (!databaseUrl) {
      const port = Number(process.env.DB_PORT ?? 3307);
      say(`starting the private MariaDB on 127.0.0.1:${port} (data in ${path.join(config.dataDir, 'mariadb')})`);
      const local = await startLocalDatabase(config.dataDir, port, say);
      stops.push(() => local.db.stop());
      databaseUrl = local.databaseUrl;
    }
    const sequelize = createSequelize(databaseUrl);
    await migrate(sequelize);
    const demo = demoSeedDecision(process.env, config.publicUrl);
    if (demo.seed) {
      say(`${(await seedDemo(sequelize, { bcryptCost: config.bcryptCost })) ? 'demo organisation seeded' : 'demo organisation already present'} (${demo.reason})`);
      say(demoWarning());
    } else {
      say(`demo organisation not seeded: ${demo.reason}`);
    }
    await sequelize.close();

    await buildWebIfChanged(say);
    // A local fake mail server catches every e-mail in development, unless SMTP_HOST points somewhere else.
    if (['127.0.0.1', 'localhost'].includes(config.mail.host)) {
      try {
        const mail = await startLocalMailServer({ smtpPort: config.mail.port, webPort: config.mail.maildevWebPort });
        stops.push(mail.stop);
        say(`fake mail server on 127.0.0.1:${mail.smtpPort}; read the mail at http://127.0.0.1:${mail.webPort}/index.html`);
      } catch (err) {
        say(`could not start the fake mail server (${(err as Error).message}); carrying on without it, mail waits in the outbox`);
      }
    }
    const running = await startServer(config, databaseUrl);
    stops.push(running.close);

    say(`Isoledger is running at ${config.publicUrl}`);
    if (demo.seed) {
      say(`demo sign-ins (password "${DEMO_PASSWORD}"):`);
      for (const u of DEMO_USERS) say(`  ${u.role.padEnd(10)} ${u.email}`);
    }
    say('press Ctrl-C to stop the server and the database');
  } catch (err) {
    console.error(err);
    await shutdown(1);
  }
}

void main();
