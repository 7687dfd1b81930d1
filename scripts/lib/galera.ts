import fs from 'node:fs';
import path from 'node:path';
import type { Connection } from 'mariadb';
import { startPrivateMariaDb, type PrivateMariaDb } from '@/scripts/lib/mariadb';

/** One node's loopback ports: SQL, group communication, incremental state transfer (IST) and full state transfer (SST). */
export interface GaleraNodePorts {
  sql: number;
  group: number;
  ist: number;
  sst: number;
}

export interface GaleraCluster {
  nodes: PrivateMariaDb[];
  /** Stops the nodes last-started first, so the bootstrap node stops last and is safe to bootstrap from next time. */
  stop(): Promise<void>;
}

export const GALERA_PROVIDER = '/usr/lib/galera/libgalera_smm.so';

/** Consecutive ports from sqlBase and groupBase for each node: SQL n, then group n, IST n+1 and SST n+2 (step 3). */
export function clusterPorts(sqlBase: number, groupBase: number, count = 3): GaleraNodePorts[] {
  return Array.from({ length: count }, (_, i) => ({ sql: sqlBase + i, group: groupBase + 3 * i, ist: groupBase + 3 * i + 1, sst: groupBase + 3 * i + 2 }));
}

/** The wsrep settings of one node (MariaDB KB, "Configuring MariaDB Galera Cluster": mandatory options). */
export function galeraArgs(all: GaleraNodePorts[], index: number, clusterName: string): string[] {
  const me = all[index];
  const provider = [
    `gmcast.listen_addr=tcp://127.0.0.1:${me.group}`,
    `ist.recv_addr=127.0.0.1:${me.ist}`,
    'gcache.size=64M',
    // A node that dies on loopback is noticed in a couple of seconds rather than the default five to fifteen.
    'evs.keepalive_period=PT0.5S',
    'evs.suspect_timeout=PT2S',
    'evs.inactive_timeout=PT4S',
    'evs.inactive_check_period=PT0.5S',
  ].join(';');
  return [
    '--wsrep-on=ON',
    `--wsrep-provider=${GALERA_PROVIDER}`,
    `--wsrep-cluster-name=${clusterName}`,
    `--wsrep-cluster-address=gcomm://${all.map((n) => `127.0.0.1:${n.group}`).join(',')}`,
    `--wsrep-node-address=127.0.0.1:${me.group}`,
    `--wsrep-node-name=node${index + 1}`,
    `--wsrep-provider-options=${provider}`,
    '--wsrep-sst-method=rsync',
    `--wsrep-sst-receive-address=127.0.0.1:${me.sst}`,
    '--default-storage-engine=InnoDB',
    // Reads wait until this node has applied every earlier commit of the cluster: a tag raised through one app
    // server is on the board of the next request, whichever server answers it.
    '--wsrep-sync-wait=1',
    // Each commit is on the other nodes before it is acknowledged; rsync SST of a node's binary logs fails in this
    // MariaDB release, so loopback nodes keep none (a production cluster keeps them on a separate volume).
    '--skip-log-bin',
    // Galera needs interleaved auto-increment locks; each node then hands out its own residue of ids.
    '--innodb-autoinc-lock-mode=2',
  ];
}

/** A node serves clients once it is Synced with the cluster. */
export async function isSynced(conn: Connection): Promise<boolean> {
  const rows = (await conn.query("SHOW GLOBAL STATUS LIKE 'wsrep_local_state_comment'")) as { Value: string }[];
  return rows[0]?.Value === 'Synced';
}

/**
 * The bootstrap node must be one that stopped cleanly last (grastate.dat says safe_to_bootstrap: 1). When none
 * did (every node crashed), the first node is marked safe, as an operator would after checking the seqnos.
 */
function chooseBootstrapNode(dirs: string[], log: (line: string) => void): number {
  const states = dirs.map((dir) => {
    const file = path.join(dir, 'grastate.dat');
    return fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : null;
  });
  if (states.every((s) => s === null)) return 0;
  const safe = states.findIndex((s) => s !== null && /safe_to_bootstrap:\s*1/.test(s));
  if (safe >= 0) return safe;
  const first = states.findIndex((s) => s !== null);
  log(`no node stopped cleanly; bootstrapping node${first + 1}`);
  fs.writeFileSync(path.join(dirs[first], 'grastate.dat'), states[first]!.replace(/safe_to_bootstrap:\s*0/, 'safe_to_bootstrap: 1'));
  return first;
}

/**
 * Starts a Galera cluster on loopback through the private-MariaDB launcher: each node is a private mariadbd with its
 * data under dataDir/nodeN, restarted by the launcher if it dies (it then rejoins and catches up by IST or SST).
 */
export async function startGaleraCluster(opts: { dataDir: string; ports: GaleraNodePorts[]; log?: (line: string) => void; name?: string }): Promise<GaleraCluster> {
  const log = opts.log ?? (() => {});
  const dirs = opts.ports.map((_, i) => path.join(path.resolve(opts.dataDir), `node${i + 1}`));
  // Started by root, the nodes run as `mysql`, which must be able to reach their folders: the cluster folder and
  // DATA_DIR above it are opened for traversal; any folder further up must already be.
  fs.mkdirSync(opts.dataDir, { recursive: true });
  if (process.getuid?.() === 0) {
    const own = [path.resolve(opts.dataDir), path.dirname(path.resolve(opts.dataDir))];
    for (const dir of own) fs.chmodSync(dir, fs.statSync(dir).mode | 0o011);
    for (let dir = path.dirname(own[1]); dir !== path.dirname(dir); dir = path.dirname(dir)) {
      if ((fs.statSync(dir).mode & 0o001) === 0) throw new Error(`${dir} is closed to other users, so the Galera nodes (running as mysql) cannot reach ${opts.dataDir}: choose a DATA_DIR elsewhere`);
    }
  }
  const first = chooseBootstrapNode(dirs, log);
  const order = [first, ...dirs.map((_, i) => i).filter((i) => i !== first)];
  const nodes: PrivateMariaDb[] = [];
  const started: PrivateMariaDb[] = [];
  const stop = async () => {
    for (const node of [...started].reverse()) await node.stop();
  };
  try {
    for (const i of order) {
      log(`starting Galera node${i + 1} on 127.0.0.1:${opts.ports[i].sql}${i === first ? ' (bootstrapping the cluster)' : ''}`);
      const node = await startPrivateMariaDb({
        dataDir: dirs[i],
        port: opts.ports[i].sql,
        log,
        extraArgs: galeraArgs(opts.ports, i, opts.name ?? 'isoledger'),
        firstStartArgs: i === first ? ['--wsrep-new-cluster'] : [],
        isReady: isSynced,
        runAs: 'mysql',
      });
      started.push(node);
      nodes[i] = node;
    }
  } catch (err) {
    await stop();
    throw err;
  }
  return { nodes, stop };
}
