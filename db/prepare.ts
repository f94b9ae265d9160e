import path from 'node:path';

import { createDb } from '@/db/client';
import { ensureDatabase } from '@/db/ensure-database';
import { runMigrations } from '@/db/migrate';
import { seedDemo, type SeedResult } from '@/db/seed';
import { type LibrarySeedResult, seedLibrary } from '@/db/seed/library';

// Where `npm start` keeps attachments unless UPLOADS_DIR says otherwise (server/env.ts has the same default).
const DEFAULT_UPLOADS_DIR = path.resolve(__dirname, '..', '.data', 'uploads');

/** What preparing did: whether the database was created, and the seed's outcome. */
export type PrepareResult = { created: boolean; name: string; library: LibrarySeedResult; seed: SeedResult | null };

/** One line per thing preparing did, for the console of npm start and npm run db:prepare. */
export function describePrepare({ created, name, library, seed }: PrepareResult): string {
  const made = created ? `Created database ${name}.\n` : '';
  const lib = library.applied ? `Loaded the starting constants library (v${library.version}: ${library.species} species, ${library.constants} constants added).\n` : '';
  if (seed === null) return made + lib;
  if (seed.production) return `${made}${lib}NODE_ENV=production: demo data and demo accounts are never seeded.\n`;
  return made + lib + (seed.applied ? `Seeded demo data (v${seed.version}).\n` : 'Demo data already present.\n');
}

/** Local set-up in one pass: create the database if missing, apply migrations, load the starting library, seed the demo shop. */
export async function prepareDemoDatabase(url: string, uploadsDir: string): Promise<PrepareResult> {
  const { created, name } = await ensureDatabase(url);
  return prepareDatabase(url, { demo: true, uploadsDir, created, name });
}

/** Applies migrations and loads the starting constants library (every start); with `demo`, seeds the demo shop too. */
export async function prepareDatabase(url: string, options: { demo: boolean; uploadsDir?: string; created?: boolean; name?: string }): Promise<PrepareResult> {
  await runMigrations(url);
  const handle = createDb(url, { max: 1 });
  try {
    const library = await seedLibrary(handle.db);
    const seed = options.demo ? await seedDemo(handle.db, options.uploadsDir ?? DEFAULT_UPLOADS_DIR) : null;
    return { created: options.created ?? false, name: options.name ?? new URL(url).pathname.slice(1), library, seed };
  } finally {
    await handle.close();
  }
}
