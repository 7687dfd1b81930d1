import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { lockDownRoot, mariadbdArgs } from '@/scripts/lib/mariadb-options';

/** What the launcher knows about its mariadbd; /api/health reports it. */
export interface LauncherStatus {
  up: boolean;
  restarts: number;
  lastExit: { at: string; code: number | null; signal: string | null } | null;
}

export interface PrivateMariaDb {
  port: number;
  dataDir: string;
  /** The unix socket inside dataDir; the only way in for the administrator (root uses socket authentication). */
  socketPath: string;
  /** The process id of the running mariadbd (changes when the launcher restarts it). */
  pid(): number | undefined;
  status(): LauncherStatus;
  stop(): Promise<void>;
}

export interface StartOptions {
  dataDir: string;
  port: number;
  log?: (line: string) => void;
  /** More server options (a Galera node's wsrep settings). */
  extraArgs?: string[];
  /** Options for the very first start only (a Galera cluster's bootstrap). */
  firstStartArgs?: string[];
  /** Extra readiness check once connections are accepted (a Galera node waits until it is synced). */
  isReady?: (conn: mariadb.Connection) => Promise<boolean>;
  /** Restart mariadbd with backoff when it dies (default true). */
  restart?: boolean;
  /**
   * The operating-system account mariadbd runs as when started by root (default root). A Galera node runs as
   * `mysql`, because the rsync state transfer's daemon, started by root, would write as `nobody`.
   */
  runAs?: string;
}

export function findBinary(name: string): string {
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

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** The administrator's connection: over the socket, as the operating-system user (unix_socket authentication). */
export function adminConnection(socketPath: string, database?: string) {
  const user = process.getuid?.() === 0 ? 'root' : os.userInfo().username;
  return mariadb.createConnection({ socketPath, user, database, connectTimeout: 2000 });
}

/**
 * Starts a private mariadbd on 127.0.0.1:port with its data, socket and pid file inside dataDir, and restarts it
 * with backoff if it dies. Initialises dataDir with mariadb-install-db the first time. Never touches the system's server.
 */
export async function startPrivateMariaDb(opts: StartOptions): Promise<PrivateMariaDb> {
  const dataDir = path.resolve(opts.dataDir);
  const socketPath = path.join(dataDir, 'mariadbd.sock');
  const log = opts.log ?? (() => {});
  fs.mkdirSync(dataDir, { recursive: true });
  const isRoot = process.getuid?.() === 0;
  const runAs = opts.runAs ?? 'root';
  if (isRoot && runAs !== 'root') spawnSync('chown', ['-R', `${runAs}:`, dataDir]);
  if (!fs.existsSync(path.join(dataDir, 'mysql'))) {
    log(`initialising a private MariaDB data folder in ${dataDir}`);
    // Socket authentication for root (and the operating-system user): no password-less login over TCP.
    const args = ['--no-defaults', `--datadir=${dataDir}`, '--auth-root-authentication-method=socket', '--skip-test-db'];
    if (isRoot) args.push(`--user=${runAs}`);
    const result = spawnSync(findBinary('mariadb-install-db'), args, { encoding: 'utf8' });
    if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
  }
  await stopLeftoverServer(dataDir, log);
  if (await portInUse(opts.port)) {
    throw new Error(`port ${opts.port} on 127.0.0.1 is already in use; set DB_PORT to a free port`);
  }
  const args = [...mariadbdArgs(dataDir, opts.port), ...(opts.extraArgs ?? [])];
  if (isRoot) args.push(`--user=${runAs}`);

  const status: LauncherStatus = { up: false, restarts: 0, lastExit: null };
  let child: ChildProcess | undefined;
  let stopping = false;
  let exited = true;
  let startedAt = 0;
  let backoffMs = 1000;
  let restartTimer: ReturnType<typeof setTimeout> | undefined;

  const launch = (extra: string[]) => {
    // Its own process group, so a Ctrl-C in the terminal reaches only our process, which then stops it in order.
    child = spawn(findBinary('mariadbd'), [...args, ...extra], { stdio: 'ignore', detached: true });
    exited = false;
    startedAt = Date.now();
    child.once('exit', (code, signal) => {
      exited = true;
      status.up = false;
      status.lastExit = { at: new Date().toISOString(), code, signal };
      if (stopping || opts.restart === false || !ready) return;
      // Backoff doubles up to 30 s and starts again from 1 s after a minute of healthy running.
      if (Date.now() - startedAt > 60_000) backoffMs = 1000;
      log(`mariadbd on port ${opts.port} exited (${signal ?? `code ${code}`}); restarting in ${backoffMs / 1000} s`);
      restartTimer = setTimeout(() => {
        status.restarts += 1;
        launch([]);
        void waitReady(socketPath, opts, () => exited).then(
          () => { status.up = true; log(`mariadbd on port ${opts.port} is back (restart ${status.restarts})`); },
          (err) => log(`mariadbd on port ${opts.port} did not come back: ${(err as Error).message}`),
        );
      }, backoffMs);
      backoffMs = Math.min(backoffMs * 2, 30_000);
    });
  };

  let ready = false;
  launch(opts.firstStartArgs ?? []);
  try {
    await waitReady(socketPath, opts, () => exited);
  } catch (err) {
    const errLog = path.join(dataDir, 'mariadbd.err');
    throw new Error(`${(err as Error).message}\n${fs.existsSync(errLog) ? fs.readFileSync(errLog, 'utf8').slice(-2000) : ''}`);
  }
  ready = true;
  status.up = true;
  await lockDownRoot(await adminConnection(socketPath));

  return {
    port: opts.port,
    dataDir,
    socketPath,
    pid: () => (exited ? undefined : child?.pid),
    status: () => ({ ...status }),
    stop: async () => {
      stopping = true;
      clearTimeout(restartTimer);
      if (exited || !child) return;
      const current = child;
      await new Promise<void>((resolve) => {
        const timer = setTimeout(() => current.kill('SIGKILL'), 30_000);
        current.once('exit', () => { clearTimeout(timer); resolve(); });
        current.kill('SIGTERM');
      });
    },
  };
}

async function waitReady(socketPath: string, opts: StartOptions, hasExited: () => boolean) {
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (hasExited()) throw new Error('mariadbd exited during start-up');
    try {
      const conn = await adminConnection(socketPath);
      try {
        if (!opts.isReady || (await opts.isReady(conn))) return;
      } finally {
        await conn.end();
      }
    } catch {
      // not accepting connections yet
    }
    if (Date.now() > deadline) throw new Error('mariadbd did not become ready within 120 s');
    await sleep(200);
  }
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
  for (let i = 0; i < 300 && alive(pid); i++) await sleep(100);
}

/** Runs statements as the administrator on the private server. */
export async function asRoot(db: Pick<PrivateMariaDb, 'socketPath'>, statements: string[]) {
  const conn = await adminConnection(db.socketPath);
  try {
    for (const sql of statements) await conn.query(sql);
  } finally {
    await conn.end();
  }
}
