import path from 'node:path';
import type { Connection } from 'mariadb';

/**
 * The private server's options. Durability first: InnoDB flushes its log at every commit and the binary log is
 * synced at every commit, so an acknowledged tag survives a power cut and point-in-time recovery is possible.
 */
export function mariadbdArgs(dataDir: string, port: number): string[] {
  return [
    '--no-defaults',
    `--datadir=${dataDir}`,
    `--port=${port}`,
    '--bind-address=127.0.0.1',
    `--socket=${path.join(dataDir, 'mariadbd.sock')}`,
    `--pid-file=${path.join(dataDir, 'mariadbd.pid')}`,
    `--log-error=${path.join(dataDir, 'mariadbd.err')}`,
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--default-time-zone=+00:00',
    '--innodb-buffer-pool-size=128M',
    '--innodb-flush-log-at-trx-commit=1',
    `--log-bin=${path.join(dataDir, 'binlog')}`,
    '--sync-binlog=1',
    '--binlog-format=ROW',
    '--expire-logs-days=7',
    `--server-id=${port}`,
    // The migration owner creates triggers while the binary log is on; it holds no SUPER privilege.
    '--log-bin-trust-function-creators=1',
  ];
}

/**
 * Root (and the operating-system user) log in through the unix socket only. Data folders made before socket
 * authentication had password-less root accounts on TCP; those are removed here, every start.
 */
export async function lockDownRoot(conn: Connection) {
  try {
    const hosts = (await conn.query("SELECT Host AS host FROM mysql.user WHERE User = 'root' AND Host <> 'localhost'")) as { host: string }[];
    for (const { host } of hosts) await conn.query('DROP USER IF EXISTS ?@?', ['root', host]);
    await conn.query("ALTER USER 'root'@'localhost' IDENTIFIED VIA unix_socket");
    await conn.query("DROP USER IF EXISTS ''@'localhost', ''@'127.0.0.1'");
  } finally {
    await conn.end();
  }
}
