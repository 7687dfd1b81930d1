import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { asRoot, startPrivateMariaDb, type PrivateMariaDb, type StartOptions } from '@/scripts/lib/mariadb';

/** Reads a secret kept in the data folder, creating it (owner-only) the first time. */
export function readOrCreateSecret(file: string, bytes = 32): string {
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim();
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const secret = crypto.randomBytes(bytes).toString('base64url');
  fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

export interface DatabaseAccounts {
  database: string;
  owner: { user: string; password: string };
  server: { user: string; password: string };
}

export interface ProvisionedDatabase {
  /** The migration owner: every right on the application's database, and the right to grant them. */
  ownerUrl: string;
  /** The running server's account: only the table privileges the owner grants after each migration. */
  serverUrl: string;
}

/** The documented script for DATABASE_URL deployments; the private servers run the same script. */
export const ACCOUNTS_SQL = path.resolve(__dirname, '../sql/accounts.sql');

/** scripts/sql/accounts.sql with this database's names, passwords and host in place of the documented ones. */
export function accountStatements({ database, owner, server }: DatabaseAccounts, host: string): string[] {
  const sql = fs.readFileSync(ACCOUNTS_SQL, 'utf8').replace(/^--.*$/gm, '');
  return sql
    .replaceAll("'isoledger_owner'@'10.0.0.%'", `'${owner.user}'@'${host}'`)
    .replaceAll("'isoledger'@'10.0.0.%'", `'${server.user}'@'${host}'`)
    .replaceAll("'OWNER-PASSWORD'", `'${owner.password}'`)
    .replaceAll("'SERVER-PASSWORD'", `'${server.password}'`)
    .replace(/\bisoledger(\.\*| CHARACTER SET)/g, `\`${database}\`$1`)
    .split(';')
    .map((statement) => statement.trim())
    .filter(Boolean);
}

/**
 * Creates the database and its two accounts with scripts/sql/accounts.sql. The server's account holds nothing on
 * the database as a whole: `prepareDatabase` grants it table by table after the migrations.
 */
export async function provisionDatabase(db: Pick<PrivateMariaDb, 'socketPath' | 'port'>, accounts: DatabaseAccounts): Promise<ProvisionedDatabase> {
  const host = '127.0.0.1';
  await asRoot(db, accountStatements(accounts, host));
  const url = (a: { user: string; password: string }) => `mariadb://${a.user}:${encodeURIComponent(a.password)}@${host}:${db.port}/${accounts.database}`;
  return { ownerUrl: url(accounts.owner), serverUrl: url(accounts.server) };
}

/**
 * Starts the private MariaDB under dataDir/mariadb and makes sure the application database and its two accounts
 * exist, with passwords kept in the data folder.
 */
export async function startLocalDatabase(
  dataDir: string,
  port: number,
  log: (line: string) => void,
  options: Partial<StartOptions> = {},
): Promise<{ db: PrivateMariaDb } & ProvisionedDatabase> {
  const db = await startPrivateMariaDb({ dataDir: path.join(dataDir, 'mariadb'), port, log, ...options });
  const urls = await provisionDatabase(db, localAccounts(dataDir));
  return { db, ...urls };
}

/** The account names and passwords `npm start` and `npm run cluster` use, passwords kept in the data folder. */
export function localAccounts(dataDir: string): DatabaseAccounts {
  return {
    database: 'isoledger',
    owner: { user: 'isoledger_owner', password: readOrCreateSecret(path.join(dataDir, 'db-owner-password'), 24) },
    server: { user: 'isoledger', password: readOrCreateSecret(path.join(dataDir, 'db-password'), 24) },
  };
}
