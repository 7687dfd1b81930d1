import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { clusterPorts, startGaleraCluster, type GaleraCluster, type GaleraNodePorts } from '@/scripts/lib/galera';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';
import type { ServerConfig } from '@/server/config';
import { prepareDatabase } from '@/server/db';

export interface AppServerProcess {
  url: string;
  stop(): Promise<void>;
}

export interface LocalCluster {
  galera: GaleraCluster;
  ports: GaleraNodePorts[];
  /** The server account's URL on each node. */
  nodeUrls: string[];
  ownerUrl: string;
  servers: AppServerProcess[];
  /** App servers first, then the nodes, the bootstrap node last. */
  stop(): Promise<void>;
}

/** The same URL on another node's port. */
export function onNode(url: string, port: number): string {
  const u = new URL(url);
  u.port = String(port);
  return u.toString();
}

/**
 * A three-node Galera cluster on loopback with its data under dataDir/galera, the database and its two accounts,
 * migrations run once, then `appServers` app servers from config.port upwards, app server i on node i.
 * `beforeServers` runs between the migrations and the servers (the demo seed).
 */
export async function startLocalCluster(opts: {
  config: ServerConfig;
  sqlBase: number;
  groupBase: number;
  appServers?: number;
  log?: (line: string) => void;
  beforeServers?: (serverUrl: string) => Promise<void>;
}): Promise<LocalCluster> {
  const log = opts.log ?? (() => {});
  const ports = clusterPorts(opts.sqlBase, opts.groupBase);
  const galera = await startGaleraCluster({ dataDir: path.join(opts.config.dataDir, 'galera'), ports, log });
  const servers: LocalCluster['servers'] = [];
  const stop = async () => {
    for (const s of [...servers].reverse()) await s.stop();
    await galera.stop();
  };
  try {
    const { ownerUrl, serverUrl } = await provisionDatabase(galera.nodes[0], localAccounts(opts.config.dataDir));
    // Migrations once: their DDL and the grants replicate to every node (total order isolation).
    await prepareDatabase(ownerUrl, serverUrl);
    await opts.beforeServers?.(serverUrl);
    const nodeUrls = ports.map((p) => onNode(serverUrl, p.sql));
    for (let i = 0; i < (opts.appServers ?? 2); i++) {
      const node = i % nodeUrls.length;
      servers.push(await startAppServer(opts.config, opts.config.port + i, nodeUrls[node], log));
      log(`app server ${i + 1} on http://127.0.0.1:${opts.config.port + i}, using Galera node${node + 1} (127.0.0.1:${ports[node].sql})`);
    }
    return { galera, ports, nodeUrls, ownerUrl, servers, stop };
  } catch (err) {
    await stop();
    throw err;
  }
}

/**
 * An app server in a process of its own (scripts/serve.ts), as on a machine of its own: the same JWT secret, data
 * folder and mail settings as `config`, its own port and database node. Resolves once /api/health answers.
 */
export async function startAppServer(config: ServerConfig, port: number, databaseUrl: string, log: (line: string) => void): Promise<AppServerProcess> {
  const url = `http://127.0.0.1:${port}`;
  const env = {
    ...process.env, PORT: String(port), PUBLIC_URL: process.env.PUBLIC_URL ?? url, DATABASE_URL: databaseUrl, DATA_DIR: config.dataDir,
    JWT_SECRET: config.jwtSecret, SMTP_HOST: config.mail.host, SMTP_PORT: String(config.mail.port), MAIL_POLL_MS: String(config.mail.pollMs),
  };
  const child: ChildProcess = spawn(path.resolve('node_modules/.bin/tsx'), ['scripts/serve.ts'], { env, stdio: ['ignore', 'inherit', 'inherit'] });
  let exited = false;
  child.once('exit', () => { exited = true; });
  const stop = () => new Promise<void>((resolve) => {
    if (exited) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
  });
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (exited) throw new Error(`the app server on port ${port} exited during start-up`);
    const up = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) }).then((r) => r.ok, () => false);
    if (up) return { url, stop };
    if (Date.now() > deadline) {
      await stop();
      throw new Error(`the app server on port ${port} did not answer within 90 s`);
    }
    await new Promise((r) => setTimeout(r, 1000));
  }
}
