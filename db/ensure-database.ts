import postgres from 'postgres';

/** Creates the database named in `url` when it does not exist, connecting through the maintenance database. */
export async function ensureDatabase(url: string): Promise<{ created: boolean; name: string }> {
  const target = new URL(url);
  const name = decodeURIComponent(target.pathname.replace(/^\//, ''));
  if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(name)) {
    throw new Error(`Database name "${name}" must be letters, digits and underscores.`);
  }
  const maintenance = new URL(url);
  maintenance.pathname = '/postgres';
  const sql = postgres(maintenance.toString(), { max: 1, onnotice: () => {} });
  try {
    const rows = await sql`select 1 from pg_database where datname = ${name}`;
    if (rows.length > 0) return { created: false, name };
    await sql.unsafe(`create database "${name}"`);
    return { created: true, name };
  } finally {
    await sql.end({ timeout: 5 });
  }
}

/** Drops a database even while clients are still connected (test teardown). */
export async function dropDatabase(url: string): Promise<void> {
  const target = new URL(url);
  const name = decodeURIComponent(target.pathname.replace(/^\//, ''));
  const maintenance = new URL(url);
  maintenance.pathname = '/postgres';
  const sql = postgres(maintenance.toString(), { max: 1, onnotice: () => {} });
  try {
    await sql.unsafe(`drop database if exists "${name}" with (force)`);
  } finally {
    await sql.end({ timeout: 5 });
  }
}
