import mariadb from 'mariadb';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * The safety record and its audit trail: the server's account may only read and append to these tables.
 * A new table of history (events, proofs, acknowledgements, reviews, visit records) is added here, and
 * `grantServerPrivileges` gives it these rights after the next migration.
 */
export const APPEND_ONLY_TABLES = [
  'audit_events', 'tag_events', 'tag_points', 'tag_proofs', 'procedure_reviews', 'readings', 'retired_labels', 'digest_runs', 'visit_decisions',
];

/** Tables the server reads but never writes. */
export const READ_ONLY_TABLES = ['schema_migrations'];

/** Every other table: ordinary rows the server keeps. No DDL, no TRIGGER, no LOCK TABLES, anywhere. */
const READ_WRITE = ['SELECT', 'INSERT', 'UPDATE', 'DELETE'];

export function privilegesFor(table: string): string[] {
  if (READ_ONLY_TABLES.includes(table)) return ['SELECT'];
  if (APPEND_ONLY_TABLES.includes(table)) return ['SELECT', 'INSERT'];
  return READ_WRITE;
}

/**
 * `'user'@'host'` of the account a URL logs in as. It connects without choosing the database, which the account
 * may not yet be allowed to use.
 */
export async function accountOf(databaseUrl: string): Promise<string> {
  const url = new URL(databaseUrl);
  const conn = await mariadb.createConnection({
    host: url.hostname, port: Number(url.port || 3306), user: decodeURIComponent(url.username), password: decodeURIComponent(url.password), connectTimeout: 3000,
    ...(url.searchParams.get('socketPath') ? { socketPath: url.searchParams.get('socketPath')! } : {}),
  });
  try {
    const [row] = (await conn.query('SELECT CURRENT_USER() AS account')) as { account: string }[];
    const at = row.account.lastIndexOf('@');
    return `'${row.account.slice(0, at)}'@'${row.account.slice(at + 1)}'`;
  } finally {
    await conn.end();
  }
}

/**
 * Run by the migration owner after every migration: gives the server's account exactly its privileges on each
 * table of the schema, table by table (it holds nothing on the database as a whole), and takes back any it should
 * no longer have.
 */
export async function grantServerPrivileges(owner: Sequelize, serverAccount: string) {
  const tables = await owner.query<{ name: string }>(
    "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE'",
    { type: QueryTypes.SELECT },
  );
  const quote = (name: string) => `\`${name.replace(/`/g, '``')}\``;
  for (const { name } of tables) {
    const allowed = privilegesFor(name);
    await owner.query(`GRANT ${allowed.join(', ')} ON ${quote(name)} TO ${serverAccount}`);
    const taken = READ_WRITE.filter((p) => !allowed.includes(p));
    if (taken.length) await owner.query(`REVOKE ${taken.join(', ')} ON ${quote(name)} FROM ${serverAccount}`);
  }
}
