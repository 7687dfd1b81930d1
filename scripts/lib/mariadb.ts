import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import mariadb from 'mariadb';

export interface PrivateMariaDb {
  port: number;
  dataDir: string;
  /** Root URL on loopback (no password: the server listens on 127.0.0.1 only and its socket lives in dataDir). */
  rootUrl: string;
  stop(): Promise<void>;
}

function findBinary(name: string): string {
  for (const dir of ['/usr/sbin', '/usr/bin', '/usr/local/bin', '/usr/local/sbin']) {
    const candidate = path.join(dir, name);
    if (fs.existsSync(candidate)) return candidate;
  }
  throw new Error(`${name} not found: install it with  sudo apt-get install -y mariadb-server`);
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

function portInUse(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host: '127.0.0.1' });
    socket.once('connect', () => { socket.destroy(); resolve(true); });
    socket.once('error', () => resolve(false));
  });
}

/**
 * Starts a private mariadbd on 127.0.0.1:port with its data, socket and pid file inside dataDir.
 * Initialises dataDir with mariadb-install-db the first time. Never touches the system's server.
 */
export async function startPrivateMariaDb(opts: { dataDir: string; port: number; log?: (line: string) => void }): Promise<PrivateMariaDb> {
  const dataDir = path.resolve(opts.dataDir);
  const log = opts.log ?? (() => {});
  fs.mkdirSync(dataDir, { recursive: true });
  const isRoot = process.getuid?.() === 0;
  if (!fs.existsSync(path.join(dataDir, 'mysql'))) {
    log(`initialising a private MariaDB data folder in ${dataDir}`);
    const args = ['--no-defaults', `--datadir=${dataDir}`, '--auth-root-authentication-method=normal', '--skip-test-db'];
    if (isRoot) args.push('--user=root');
    const result = spawnSync(findBinary('mariadb-install-db'), args, { encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
  }
  await stopLeftoverServer(dataDir, log);
  if (await portInUse(opts.port)) {
    throw new Error(`port ${opts.port} on 127.0.0.1 is already in use; set DB_PORT to a free port`);
  }
  const args = [
    '--no-defaults',
    `--datadir=${dataDir}`,
    `--port=${opts.port}`,
    '--bind-address=127.0.0.1',
    `--socket=${path.join(dataDir, 'mariadbd.sock')}`,
    `--pid-file=${path.join(dataDir, 'mariadbd.pid')}`,
    `--log-error=${path.join(dataDir, 'mariadbd.err')}`,
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--default-time-zone=+00:00',
    '--innodb-buffer-pool-size=128M',
    '--innodb-flush-log-at-trx-commit=2',
  ];
  if (isRoot) args.push('--user=root');
  // Its own process group, so a Ctrl-C in the terminal reaches only our process, which then stops it in order.
  const child: ChildProcess = spawn(findBinary('mariadbd'), args, { stdio: 'ignore', detached: true });
  let exited = false;
  child.once('exit', () => { exited = true; });
  const rootUrl = `mariadb://root@127.0.0.1:${opts.port}/`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (exited) {
      const errLog = fs.existsSync(path.join(dataDir, 'mariadbd.err')) ? fs.readFileSync(path.join(dataDir, 'mariadbd.err'), 'utf8').slice(-2000) : '';
      throw new Error(`mariadbd exited during start-up:\n${errLog}`);
    }
    try {
      const conn = await mariadb.createConnection({ host: '127.0.0.1', port: opts.port, user: 'root', connectTimeout: 1000 });
      await conn.end();
      break;
    } catch {
      if (Date.now() > deadline) throw new Error('mariadbd did not accept connections within 60 s');
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  return {
    port: opts.port,
    dataDir,
    rootUrl,
    stop: () =>
      new Promise<void>((resolve) => {
        if (exited) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
        const timer = setTimeout(() => { if (!exited) child.kill('SIGKILL'); }, 30_000);
        child.once('exit', () => clearTimeout(timer));
      }),
  };
}

/** A server left running on this data folder (say, after a crash of the process that started it) is stopped first. */
async function stopLeftoverServer(dataDir: string, log: (line: string) => void) {
  const pidFile = path.join(dataDir, 'mariadbd.pid');
  if (!fs.existsSync(pidFile)) return;
  const pid = Number(fs.readFileSync(pidFile, 'utf8').trim());
  const alive = (p: number) => { try { process.kill(p, 0); return true; } catch { return false; } };
  if (!pid || !alive(pid)) return;
  const cmdline = fs.existsSync(`/proc/${pid}/cmdline`) ? fs.readFileSync(`/proc/${pid}/cmdline`, 'utf8') : '';
  if (!cmdline.includes('mariadbd') || !cmdline.includes(dataDir)) return;
  log(`stopping a MariaDB left running on ${dataDir} (pid ${pid})`);
  process.kill(pid, 'SIGTERM');
  for (let i = 0; i < 300 && alive(pid); i++) await new Promise((r) => setTimeout(r, 100));
}

/** Runs statements as root on the private server. */
export async function asRoot(port: number, statements: string[]) {
  const conn = await mariadb.createConnection({ host: '127.0.0.1', port, user: 'root', multipleStatements: false });
  try {
    for (const sql of statements) await conn.query(sql);
  } finally {
    await conn.end();
  }
}
