import { startServer } from '@/server/index';
import { runUntilStopped, say } from '@/scripts/lib/app-launch';

// One app server on an already migrated database (DATABASE_URL, the server's own account); `npm run cluster` runs two.
void runUntilStopped(async (config, stops) => {
  if (!process.env.DATABASE_URL) throw new Error('set DATABASE_URL to the server account of a migrated database');
  const running = await startServer(config, process.env.DATABASE_URL);
  stops.push(running.close);
  say(`app server listening at ${config.publicUrl}`);
});
