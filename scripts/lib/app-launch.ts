import path from 'node:path';
import { assertStartable, readConfig, type ServerConfig } from '@/server/config';
import { createSequelize } from '@/server/db';
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '@/server/seed/demo';
import { demoSeedDecision, demoWarning } from '@/server/seed/demo-guard';
import { readOrCreateSecret } from '@/scripts/lib/local-db';
import { startLocalMailServer } from '@/scripts/lib/maildev';

export const say = (line: string) => console.log(`[isoledger] ${line}`);

type Stop = () => Promise<void>;

/**
 * Shared by `npm start` and `npm run cluster`: reads the configuration (a JWT secret kept in the data folder), and
 * runs `body` with a list of stops that Ctrl-C (or a failure) runs in reverse order: servers first, database last.
 */
export async function runUntilStopped(body: (config: ServerConfig, stops: Stop[]) => Promise<void>) {
  const config = readConfig();
  config.jwtSecret ||= readOrCreateSecret(path.join(config.dataDir, 'jwt-secret'), 48);
  // A weak secret stops the start before the database or anything else is started.
  assertStartable(config);
  const stops: Stop[] = [];
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
    await body(config, stops);
  } catch (err) {
    console.error(err);
    await shutdown(1);
  }
}

/** Seeds the demo organisation when the demo guard allows it; says why either way. Returns whether it is there. */
export async function seedDemoIfAllowed(config: ServerConfig, databaseUrl: string): Promise<boolean> {
  const demo = demoSeedDecision(process.env, config.publicUrl);
  if (!demo.seed) {
    say(`demo organisation not seeded: ${demo.reason}`);
    return false;
  }
  const sequelize = createSequelize(databaseUrl);
  try {
    say(`${(await seedDemo(sequelize, { bcryptCost: config.bcryptCost })) ? 'demo organisation seeded' : 'demo organisation already present'} (${demo.reason})`);
    say(demoWarning());
  } finally {
    await sequelize.close();
  }
  return true;
}

export function sayDemoSignIns() {
  say(`demo sign-ins (password "${DEMO_PASSWORD}"):`);
  for (const u of DEMO_USERS) say(`  ${u.role.padEnd(10)} ${u.email}`);
}

/** A local fake mail server catches every e-mail in development, unless SMTP_HOST points somewhere else. */
export async function startMailIfLocal(config: ServerConfig, stops: Stop[]) {
  if (!['127.0.0.1', 'localhost'].includes(config.mail.host)) return;
  try {
    const mail = await startLocalMailServer({ smtpPort: config.mail.port, webPort: config.mail.maildevWebPort });
    stops.push(mail.stop);
    say(`fake mail server on 127.0.0.1:${mail.smtpPort}; read the mail at http://127.0.0.1:${mail.webPort}/index.html`);
  } catch (err) {
    say(`could not start the fake mail server (${(err as Error).message}); carrying on without it, mail waits in the outbox`);
  }
}
