// The numbers the server's in-memory views are checked against, read in one round trip: the
// library's revision (migration 0012 counts it up with every change to what the system builder
// reads) and the hazard thresholds in force. A calculation needs both; reading them together
// saves it a query. `database` names the database (and port), so that two databases served
// from one process (the tests do this) never share a cached view.
import { sql } from 'drizzle-orm';

import type { Tx } from '@/server/library/store';

export interface Revisions {
  database: string;
  /** library_revision.revision; null only if its row is missing (then nothing is cached). */
  library: number | null;
  /** The newest hazard thresholds row, its values as stored (parsed by the safety store). */
  thresholds: { version: number; values: unknown } | null;
}

type RevisionsRow = { database: string; library: string | number | null; version: number | null; values: unknown };

/** Reads the library revision and the newest thresholds version with one query. */
export async function readRevisions(tx: Tx): Promise<Revisions> {
  const result = await tx.execute(sql`select current_database() || '|' || coalesce(inet_server_port(), 0) as database,
      (select revision from library_revision where id = 1) as library, t.version, t.values
    from (select 1) as one
    left join lateral (select version, values from hazard_thresholds order by version desc limit 1) as t on true`);
  const rows = (Array.isArray(result) ? result : (result as { rows: unknown[] }).rows) as RevisionsRow[];
  const row = rows[0];
  if (!row) throw new Error('the revisions query returned no row');
  return {
    database: row.database,
    library: row.library === null ? null : Number(row.library),
    thresholds: row.version === null ? null : { version: Number(row.version), values: typeof row.values === 'string' ? JSON.parse(row.values) : row.values },
  };
}
