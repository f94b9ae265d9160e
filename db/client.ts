import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';

import * as schema from './schema';

/** A Drizzle database bound to the product schema. */
export type Db = ReturnType<typeof drizzle<typeof schema>>;

/** A connection pool and its Drizzle wrapper; `close` ends the pool (call on shutdown). */
export type DbHandle = { db: Db; sql: postgres.Sql; close: () => Promise<void> };

/** Options for the pool: `max` connections (default 10), `connectTimeoutS` seconds per attempt. */
export type DbOptions = { max?: number; connectTimeoutS?: number };

/** Opens a postgres-js pool on `url`; connections are made lazily, on first query. */
export function createDb(url: string, options: DbOptions = {}): DbHandle {
  const sql = postgres(url, {
    max: options.max ?? 10,
    connect_timeout: options.connectTimeoutS ?? 5,
    idle_timeout: 30,
    onnotice: () => {},
  });
  const db = drizzle(sql, { schema });
  return { db, sql, close: () => sql.end({ timeout: 5 }) };
}
