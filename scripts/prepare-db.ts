// npm run db:prepare: creates the database at DATABASE_URL if missing, applies migrations, seeds demo data.
import path from 'node:path';

import { describePrepare, prepareDemoDatabase } from '@/db/prepare';

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set (bash scripts/pg.sh url prints one).');
  process.stdout.write(describePrepare(await prepareDemoDatabase(url, process.env.UPLOADS_DIR ?? path.resolve(__dirname, '..', '.data', 'uploads'))));
}

main().catch((err) => {
  process.stderr.write(`Database preparation failed: ${err instanceof Error ? err.message : String(err)}\n`);
  process.stderr.write('PostgreSQL log: .data/pg-log/postgres.log\n');
  process.exit(1);
});
