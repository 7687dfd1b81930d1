import { prepareDatabase } from '@/server/db';

// npm run migrate: runs the migrations as DATABASE_OWNER_URL and grants DATABASE_URL's account its privileges.
async function main() {
  const serverUrl = process.env.DATABASE_URL;
  if (!serverUrl) throw new Error('set DATABASE_URL (the server account) and DATABASE_OWNER_URL (the migration owner); see scripts/sql/accounts.sql');
  await prepareDatabase(process.env.DATABASE_OWNER_URL || serverUrl, serverUrl);
  console.log('[isoledger] migrations applied and the server account granted its privileges');
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
