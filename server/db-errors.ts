import { ConnectionError, TimeoutError } from 'sequelize';

/** The driver's error behind a Sequelize error (or the error itself when it came straight from the driver). */
function driverError(err: unknown): { errno?: number; code?: string } {
  const e = err as { original?: unknown; parent?: unknown };
  return ((e?.original ?? e?.parent ?? err) as { errno?: number; code?: string }) ?? {};
}

// MariaDB error numbers: https://mariadb.com/kb/en/mariadb-error-code-reference/
const DEADLOCK = 1213; // also what Galera answers when a transaction fails certification at commit
const UNAVAILABLE_ERRNOS = new Set([
  1040, // too many connections
  1047, // WSREP has not yet prepared node for application use (a Galera node out of the cluster)
  1053, // server shutdown in progress
  1205, // lock wait timeout, also a Galera node's causality wait (wsrep_sync_wait) that the cluster could not answer in time
  1180, // error during COMMIT: on Galera, the node lost the primary component while the transaction replicated
  1927, // connection killed
  2002, 2003, 2006, 2013, // cannot connect, server gone away, lost connection
  45001, 45009, 45012, 45013, 45019, 45026, 45028, // mariadb driver: closed or broken socket, connect, socket and pool timeouts
]);
const UNAVAILABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOENT', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_GET_CONNECTION_TIMEOUT', 'ER_CONNECTION_TIMEOUT', 'ER_SOCKET_TIMEOUT', 'ER_CONNECTION_ALREADY_CLOSED', 'ER_CMD_CONNECTION_CLOSED']);

/** A deadlock, or on Galera a certification failure: the whole transaction may be run again. */
export function isRetryableConflict(err: unknown): boolean {
  return driverError(err).errno === DEADLOCK;
}

/** The database cannot be reached or is not serving right now: the client should try again shortly (503). */
export function isDatabaseUnavailable(err: unknown): boolean {
  if (err instanceof ConnectionError || err instanceof TimeoutError) return true;
  const { errno, code } = driverError(err);
  return (errno !== undefined && UNAVAILABLE_ERRNOS.has(errno)) || (code !== undefined && UNAVAILABLE_CODES.has(code)) || isRetryableConflict(err);
}
