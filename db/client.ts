import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';

import * as schema from './schema';

/** A Drizzle database bound to the product schema. */
export type Db = ReturnType<typeof drizzle<typeof schema>>;

/** A connection pool and its Drizzle wrapper; `close` ends the pool (call on shutdown). */
export type DbHandle = { db: Db; sql: postgres.Sql; close: () => Promise<void> };

/** Options for the pool: `max` connections (default 10), `connectTimeoutS` seconds per attempt. */
export type DbOptions = { max?: number; connectTimeoutS?: number };

/**
 * Error codes that mean the database cannot be reached right now: Node's socket errors, the
 * driver's own connection errors, and the server's shutdown and start-up refusals (SQLSTATE 57P0x).
 */
export const CONNECTION_ERROR_CODES: ReadonlySet<string> = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ECONNABORTED',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EAI_AGAIN',
  'ENOTFOUND',
  'ERR_STREAM_DESTROYED',
  'CONNECT_TIMEOUT',
  'CONNECTION_CLOSED',
  'CONNECTION_ENDED',
  'CONNECTION_DESTROYED',
  '57P01', // admin_shutdown
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now (starting up, shutting down, in recovery)
  '57P05', // idle_session_timeout
]);

/** True when `err` (or an error it wraps as `cause`, as Drizzle's DrizzleQueryError does) says the database is out of reach. */
export function isConnectionError(err: unknown): boolean {
  for (let e = err, depth = 0; e && typeof e === 'object' && depth < 5; e = (e as { cause?: unknown }).cause, depth += 1) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && CONNECTION_ERROR_CODES.has(code)) return true;
    // Node gives an AggregateError when every address of a host name refused the connection.
    const inner = (e as { errors?: unknown }).errors;
    if (Array.isArray(inner) && inner.length > 0 && inner.every(isConnectionError)) return true;
  }
  return false;
}

/** How long a transaction whose connection failed waits for the driver to notice the close, in milliseconds. */
const CLOSE_NOTICE_MS = 2000;

/**
 * NOTE: postgres-js 3.4.9 answers a failed transaction callback by sending ROLLBACK on the same
 * connection. When the connection has just closed, that write lands on a null socket inside a
 * setImmediate and throws an uncaught TypeError that ends the process, or leaves the connection
 * unable to send anything again (github.com/porsager/postgres issues 1154 and 1208). The server
 * already rolled the transaction back when the connection went, and `begin()` rejects with the
 * connection error on its own once the driver sees the close; so a callback that failed for lost
 * connection never hands its error back to the driver.
 */
function guardTransactions(sql: postgres.Sql): void {
  const begin = sql.begin.bind(sql) as (...args: unknown[]) => Promise<unknown>;
  const guarded = (...args: unknown[]) => {
    const fn = args.pop() as (tx: postgres.TransactionSql) => unknown;
    let settle: () => void = () => undefined;
    const settled = new Promise<void>((resolve) => {
      settle = resolve;
    });
    const outer = begin(...args, async (tx: postgres.TransactionSql) => {
      try {
        return await fn(tx);
      } catch (err) {
        if (!isConnectionError(err)) throw err;
        let timer: ReturnType<typeof setTimeout> | undefined;
        const closedSeen = await Promise.race([settled.then(() => true), new Promise<boolean>((resolve) => (timer = setTimeout(resolve, CLOSE_NOTICE_MS, false)))]);
        clearTimeout(timer);
        // The outer promise has its answer: leave this callback pending so the driver writes nothing more.
        if (closedSeen) return new Promise<never>(() => undefined);
        throw err;
      }
    });
    outer.then(settle, settle);
    return outer;
  };
  sql.begin = guarded as unknown as postgres.Sql['begin'];
}

/**
 * Seconds a closed connection waits before connecting again, after `retries` failed attempts in a
 * row. A query that needs the connection waits that long too, so it stays short: the driver's own
 * default grows to 20 s while the database is down, and requests hung for that long.
 */
export function reconnectDelayS(retries: number): number {
  return Math.min(0.05 * 2 ** retries, 0.5);
}

/** Opens a postgres-js pool on `url`; connections are made lazily, on first query. */
export function createDb(url: string, options: DbOptions = {}): DbHandle {
  const sql = postgres(url, {
    max: options.max ?? 10,
    connect_timeout: options.connectTimeoutS ?? 5,
    backoff: reconnectDelayS,
    idle_timeout: 30,
    onnotice: () => {},
  });
  guardTransactions(sql);
  const db = drizzle(sql, { schema });
  return { db, sql, close: () => sql.end({ timeout: 5 }) };
}
