import path from 'node:path';
import type { Server } from 'node:http';
import { clusterPorts, startGaleraCluster, type GaleraCluster, type GaleraNodePorts } from '@/scripts/lib/galera';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';
import { readConfig, type ServerConfig } from '@/server/config';
import { prepareDatabase } from '@/server/db';
import { startServer } from '@/server/index';

export interface LocalCluster {
  galera: GaleraCluster;
  ports: GaleraNodePorts[];
  /** The server account's URL on each node. */
  nodeUrls: string[];
  ownerUrl: string;
  servers: { url: string; server: Server; close: () => Promise<void> }[];
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
    for (const s of [...servers].reverse()) await s.close();
    await galera.stop();
  };
  try {
    const { ownerUrl, serverUrl } = await provisionDatabase(galera.nodes[0], localAccounts(opts.config.dataDir));
    // Migrations once: their DDL and the grants replicate to every node (total order isolation).
    await prepareDatabase(ownerUrl, serverUrl);
    await opts.beforeServers?.(serverUrl);
    const nodeUrls = ports.map((p) => onNode(serverUrl, p.sql));
    for (let i = 0; i < (opts.appServers ?? 2); i++) {
      const port = opts.config.port + i;
      const config = readConfig({ ...process.env, PORT: String(port), PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}` }, {
        jwtSecret: opts.config.jwtSecret, dataDir: opts.config.dataDir, webDir: opts.config.webDir, bcryptCost: opts.config.bcryptCost, mail: opts.config.mail,
        loginRateLimit: opts.config.loginRateLimit,
      });
      const running = await startServer(config, nodeUrls[i % nodeUrls.length], { launcher: galera.nodes[i % nodeUrls.length].status });
      servers.push({ url: `http://127.0.0.1:${(running.server.address() as { port: number }).port}`, ...running });
      log(`app server ${i + 1} on http://127.0.0.1:${port}, using Galera node${(i % nodeUrls.length) + 1} (127.0.0.1:${ports[i % nodeUrls.length].sql})`);
    }
    return { galera, ports, nodeUrls, ownerUrl, servers, stop };
  } catch (err) {
    await stop();
    throw err;
  }
}
