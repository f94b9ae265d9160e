// Makes the database ready for the server: creates it if missing, applies migrations, seeds demo data.
import { createDb } from '@/db/client';
import { ensureDatabase } from '@/db/ensure-database';
import { runMigrations } from '@/db/migrate';
import { seedDemo } from '@/db/seed';

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set (scripts/start.sh sets it from scripts/pg.sh url).');
  const { created, name } = await ensureDatabase(url);
  if (created) process.stdout.write(`Created database ${name}.\n`);
  await runMigrations(url);
  const handle = createDb(url, { max: 1 });
  try {
    const seeded = await seedDemo(handle.db);
    process.stdout.write(seeded.applied ? `Seeded demo data (v${seeded.version}).\n` : 'Demo data already present.\n');
  } finally {
    await handle.close();
  }
}

main().catch((err) => {
  process.stderr.write(`Database preparation failed: ${err instanceof Error ? err.message : String(err)}\n`);
  process.stderr.write('PostgreSQL log: .data/pg-log/postgres.log\n');
  process.exit(1);
});
