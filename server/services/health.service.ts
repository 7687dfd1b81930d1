import { QueryTypes, type Sequelize } from 'sequelize';
import { outboxCounts } from '@/server/mail/outbox';

/** What the launcher of a private mariadbd knows about it (scripts/lib/mariadb.ts). */
export interface LauncherStatus {
  up: boolean;
  restarts: number;
  lastExit: { at: string; code: number | null; signal: string | null } | null;
}

interface Health {
  ok: boolean;
  db: 'up' | 'down';
  /** Present when this server started its own mariadbd. */
  launcher?: LauncherStatus;
  /** Present on a Galera cluster: how many nodes this node sees, and its own state (Synced when serving). */
  cluster?: { size: number; state: string };
  /** E-mails waiting in the outbox, and e-mails given up (refused for good; admins see them on the team screen). */
  mail?: { waiting: number; givenUp: number };
}

const CHECK_MS = 3000;

async function withinCheckTime<T>(work: Promise<T>): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    return await Promise.race([work, new Promise<never>((_, reject) => { timer = setTimeout(() => reject(new Error('database check timed out')), CHECK_MS); })]);
  } finally {
    clearTimeout(timer);
  }
}

export async function checkHealth(sequelize: Sequelize, launcher?: () => LauncherStatus): Promise<Health> {
  const extra = launcher ? { launcher: launcher() } : {};
  try {
    const rows = await withinCheckTime(
      sequelize.query<{ name: string; value: string }>(
        "SELECT VARIABLE_NAME AS name, VARIABLE_VALUE AS value FROM information_schema.GLOBAL_STATUS WHERE VARIABLE_NAME IN ('WSREP_CLUSTER_SIZE', 'WSREP_LOCAL_STATE_COMMENT', 'WSREP_READY')",
        { type: QueryTypes.SELECT },
      ),
    );
    const status = Object.fromEntries(rows.map((r) => [r.name.toLowerCase(), r.value]));
    const mail = await withinCheckTime(outboxCounts(sequelize));
    // A server without Galera reports a cluster size of 0 (or nothing at all).
    if (!(Number(status.wsrep_cluster_size) > 0)) return { ok: true, db: 'up', ...extra, mail };
    const cluster = { size: Number(status.wsrep_cluster_size), state: status.wsrep_local_state_comment ?? 'unknown' };
    return { ok: status.wsrep_ready === 'ON' && cluster.state === 'Synced', db: 'up', ...extra, cluster, mail };
  } catch {
    return { ok: false, db: 'down', ...extra };
  }
}
