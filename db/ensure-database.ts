import postgres from 'postgres';

// The database named in `url`, checked so it can be quoted into CREATE/DROP DATABASE.
function databaseName(url: string): string {
  const name = decodeURIComponent(new URL(url).pathname.replace(/^\//, ''));
  if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(name)) {
    throw new Error(`Database name "${name}" must be letters, digits and underscores.`);
  }
  return name;
}

// Runs `work` on a one-connection client to the server's maintenance database.
async function withMaintenance<T>(url: string, work: (sql: postgres.Sql) => Promise<T>): Promise<T> {
  const maintenance = new URL(url);
  maintenance.pathname = '/postgres';
  const sql = postgres(maintenance.toString(), { max: 1, onnotice: () => {} });
  try {
    return await work(sql);
  } finally {
    await sql.end({ timeout: 5 });
  }
}

/** Creates the database named in `url` when it does not exist, connecting through the maintenance database. */
export async function ensureDatabase(url: string): Promise<{ created: boolean; name: string }> {
  const name = databaseName(url);
  return withMaintenance(url, async (sql) => {
    const rows = await sql`select 1 from pg_database where datname = ${name}`;
    if (rows.length > 0) return { created: false, name };
    await sql.unsafe(`create database "${name}"`);
    return { created: true, name };
  });
}

/** Drops a database even while clients are still connected (test teardown). */
export async function dropDatabase(url: string): Promise<void> {
  const name = databaseName(url);
  await withMaintenance(url, (sql) => sql.unsafe(`drop database if exists "${name}" with (force)`));
}
