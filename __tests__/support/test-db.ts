// A fresh database per test run on the project's own PostgreSQL, migrated; dropped afterwards.
// NOTE: relative imports: jest loads global setup files without the @/ module mapping.
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import path from 'node:path';

import { dropDatabase, ensureDatabase } from '../../db/ensure-database';
import { runMigrations } from '../../db/migrate';

const ROOT = path.resolve(__dirname, '../..');

/** URL of the maintenance database; starts the project's PostgreSQL when `npm test` did not. */
export function adminUrl(): string {
  if (process.env.LIGANDRY_TEST_ADMIN_URL) return process.env.LIGANDRY_TEST_ADMIN_URL;
  execFileSync('bash', [path.join(ROOT, 'scripts/pg.sh'), 'start'], { stdio: 'inherit' });
  const url = execFileSync('bash', [path.join(ROOT, 'scripts/pg.sh'), 'url', 'postgres']).toString().trim();
  process.env.LIGANDRY_TEST_ADMIN_URL = url;
  return url;
}

/** A URL for a database named `<prefix>_<time>_<random>` that does not exist yet. */
export function testDatabaseUrl(prefix: string): string {
  const url = new URL(adminUrl());
  url.pathname = `/${prefix}_${Date.now().toString(36)}_${randomBytes(3).toString('hex')}`;
  return url.toString();
}

/** Creates and migrates a fresh test database; returns its URL. */
export async function createTestDatabase(prefix: string): Promise<string> {
  const url = testDatabaseUrl(prefix);
  await ensureDatabase(url);
  await runMigrations(url);
  return url;
}

/** Drops a database made by createTestDatabase, even with clients still connected. */
export async function dropTestDatabase(url: string | undefined): Promise<void> {
  if (url) await dropDatabase(url);
}
