// The board and the label lookup over HTTP, and the board's own SQL sent raw through the mariadb driver.
import mariadb from 'mariadb';
import type { Sequelize } from 'sequelize';
import { getBoard } from '@/server/services/board.service';
import { boardQuery } from '@/shared/schemas/queries';
import type { AuthUser } from '@/server/middleware/auth';

export const percentile = (ms: number[], q: number) => {
  const s = [...ms].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
};

export interface Timing {
  p50: number;
  p95: number;
}

const timing = (ms: number[]): Timing => ({ p50: percentile(ms, 0.5), p95: percentile(ms, 0.95) });

/** Times `run` `times` times after a few warm-up runs. */
export async function timeIt(times: number, run: () => Promise<unknown>): Promise<Timing> {
  for (let i = 0; i < 5; i += 1) await run();
  const ms: number[] = [];
  for (let i = 0; i < times; i += 1) {
    const t0 = performance.now();
    await run();
    ms.push(performance.now() - t0);
  }
  return timing(ms);
}

/** The SQL statements the board service sends for the default view, as Sequelize logs them (values inlined). */
export async function captureBoardSql(sequelize: Sequelize, actor: AuthUser): Promise<string[]> {
  const statements: string[] = [];
  // Sequelize's typings leave out `options`, which every instance has.
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  options.logging = (sql: string) => { statements.push(sql.replace(/^Executing \([^)]*\): /, '').replace(/ - parameters:\[\]$/, '')); };
  try {
    await getBoard(sequelize, actor, boardQuery.validateSync({}), { page: 1, pageSize: 50, offset: 0 });
  } finally {
    options.logging = before;
  }
  return statements;
}

/**
 * Times two runs taking turns (a, b, a, b, …) after a few warm-up rounds, so both see the same load on the machine
 * and their ratio compares like with like.
 */
export async function timeInTurns(times: number, a: () => Promise<unknown>, b: () => Promise<unknown>): Promise<[Timing, Timing]> {
  for (let i = 0; i < 5; i += 1) { await a(); await b(); }
  const ms: [number[], number[]] = [[], []];
  for (let i = 0; i < times; i += 1) {
    for (const [k, run] of [a, b].entries()) {
      const t0 = performance.now();
      await run();
      ms[k].push(performance.now() - t0);
    }
  }
  return [timing(ms[0]), timing(ms[1])];
}

/**
 * The captured statements sent at once over a pool of plain mariadb connections, as the service's Promise.all
 * sends them, through the same account. Returns the run and the pool's closer.
 */
export function rawBoard(url: string, statements: string[]) {
  const u = new URL(url);
  const pool = mariadb.createPool({
    host: u.hostname, port: Number(u.port), user: decodeURIComponent(u.username), password: decodeURIComponent(u.password),
    database: u.pathname.slice(1), connectionLimit: Math.max(2, statements.length),
  });
  return { run: () => Promise.all(statements.map((sql) => pool.query(sql))), close: () => pool.end() };
}

/** A GET with the token, asking for compression as Chromium does (brotli first), read to the end; throws on anything but 200. */
export function getter(base: string, token: string) {
  return async (path: string) => {
    const res = await fetch(`${base}/api${path}`, { headers: { authorization: `Bearer ${token}`, 'accept-encoding': 'gzip, deflate, br, zstd' } });
    if (res.status !== 200) throw new Error(`${path}: ${res.status}`);
    await res.arrayBuffer();
  };
}
