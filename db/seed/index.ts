import { and, eq, sql } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { auditLog } from '@/db/schema';
import fs from 'node:fs/promises';

import { seedBaths } from '@/db/seed/baths';
import { seedLibrary } from '@/db/seed/library';
import { seedRuns } from '@/db/seed/runs';
import { seedTeam } from '@/db/seed/team';

/**
 * Version of the demo data set. Raise it when a feature adds demo records; each version is
 * applied once per database, so `npm start` can run the seed on every start.
 */
export const DEMO_SEED_VERSION = 5;

// Arbitrary constant for pg_advisory_xact_lock, so two starts at once do not both seed.
const SEED_LOCK_KEY = 4_711_001;

/** Result of a seed call: whether it wrote anything. */
export type SeedResult = { applied: boolean; version: number; production?: boolean };

/**
 * Seeds the demo shop once per seed version, in one transaction: the demo team (one account per
 * role), the demo baths with their analyses and a lab report (v3), demo runs on them (v4; v5 adds a what-if that waits on the safety desk), then a record of the seed in the audit log. Feature seeds (constants, baths, runs) join
 * this transaction as they are built. Never with NODE_ENV=production: demo accounts share a
 * published password.
 */
export async function seedDemo(db: Db, uploadsDir: string): Promise<SeedResult> {
  if (process.env.NODE_ENV === 'production') return { applied: false, version: DEMO_SEED_VERSION, production: true };
  const written: string[] = [];
  // Demo runs are built from the constants library: load it first (a no-op when it is there).
  await seedLibrary(db);
  try {
    return await seedDemoOnce(db, uploadsDir, written);
  } catch (err) {
    // The transaction rolled back: take away the demo files it wrote.
    await Promise.all(written.map((f) => fs.rm(f, { force: true })));
    throw err;
  }
}

async function seedDemoOnce(db: Db, uploadsDir: string, written: string[]): Promise<SeedResult> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${SEED_LOCK_KEY})`);
    const done = await tx
      .select({ id: auditLog.id })
      .from(auditLog)
      .where(
        and(eq(auditLog.action, 'demo.seeded'), sql`${auditLog.payload}->>'version' = ${String(DEMO_SEED_VERSION)}`),
      )
      .limit(1);
    if (done.length > 0) return { applied: false, version: DEMO_SEED_VERSION };
    const team = await seedTeam(tx);
    const demoBaths = await seedBaths(tx, uploadsDir);
    written.push(...demoBaths.files);
    const demoRuns = await seedRuns(tx);
    await tx.insert(auditLog).values({
      actor: 'system:seed',
      action: 'demo.seeded',
      subject: 'shop:demo',
      payload: { version: String(DEMO_SEED_VERSION), shop: 'Harbourside Finishing (invented demo shop)', accountsAdded: team, bathsAdded: demoBaths.baths, runsAdded: demoRuns },
    });
    return { applied: true, version: DEMO_SEED_VERSION };
  });
}
