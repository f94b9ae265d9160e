import { and, eq, sql } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { auditLog } from '@/db/schema';
import { seedTeam } from '@/db/seed/team';

/**
 * Version of the demo data set. Raise it when a feature adds demo records; each version is
 * applied once per database, so `npm start` can run the seed on every start.
 */
export const DEMO_SEED_VERSION = 2;

// Arbitrary constant for pg_advisory_xact_lock, so two starts at once do not both seed.
const SEED_LOCK_KEY = 4_711_001;

/** Result of a seed call: whether it wrote anything. */
export type SeedResult = { applied: boolean; version: number; production?: boolean };

/**
 * Seeds the demo shop once per seed version, in one transaction: the demo team (one account per
 * role), then a record of the seed in the audit log. Feature seeds (constants, baths, runs) join
 * this transaction as they are built. Never with NODE_ENV=production: demo accounts share a
 * published password.
 */
export async function seedDemo(db: Db): Promise<SeedResult> {
  if (process.env.NODE_ENV === 'production') return { applied: false, version: DEMO_SEED_VERSION, production: true };
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
    await tx.insert(auditLog).values({
      actor: 'system:seed',
      action: 'demo.seeded',
      subject: 'shop:demo',
      payload: { version: String(DEMO_SEED_VERSION), shop: 'Harbourside Finishing (invented demo shop)', accountsAdded: team },
    });
    return { applied: true, version: DEMO_SEED_VERSION };
  });
}
