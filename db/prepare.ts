import { createDb } from '@/db/client';
import { ensureDatabase } from '@/db/ensure-database';
import { runMigrations } from '@/db/migrate';
import { seedDemo, type SeedResult } from '@/db/seed';

/** What preparing did: whether the database was created, and the seed's outcome. */
export type PrepareResult = { created: boolean; name: string; seed: SeedResult };

/** One line per thing preparing did, for the console of npm start and npm run db:prepare. */
export function describePrepare({ created, name, seed }: PrepareResult): string {
  const made = created ? `Created database ${name}.\n` : '';
  if (seed.production) return `${made}NODE_ENV=production: demo data and demo accounts are never seeded.\n`;
  return made + (seed.applied ? `Seeded demo data (v${seed.version}).\n` : 'Demo data already present.\n');
}

/** Local set-up in one pass: create the database if missing, apply migrations, seed the demo shop. */
export async function prepareDemoDatabase(url: string): Promise<PrepareResult> {
  const { created, name } = await ensureDatabase(url);
  await runMigrations(url);
  const handle = createDb(url, { max: 1 });
  try {
    return { created, name, seed: await seedDemo(handle.db) };
  } finally {
    await handle.close();
  }
}
