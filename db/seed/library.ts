// The reviewed starting library: species and constants transcribed from the named handbooks
// (db/seed/library-data.ts). Loaded by every start, production included (it is reference data,
// not demo data), once per library seed version. Never overwrites: a reaction already in the
// library (in any status) is left as it is, so later seed versions only add what is missing.
import { and, eq, sql } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { auditLog, species } from '@/db/schema';
import { molarMass, analyseFormula } from '@/lib/units';
import { checkReaction } from '@/lib/library/reaction';
import { insertVersion, readLibrary } from '@/server/library/store';

import { SEED_CONSTANTS, SEED_SPECIES } from './library-data';

/** Raise when library-data.ts gains species or constants. */
export const LIBRARY_SEED_VERSION = 1;

// Arbitrary key for pg_advisory_xact_lock, so two starts at once do not both seed.
const LIBRARY_LOCK_KEY = 4_711_003;

const SEED_REVIEW_NOTE = 'Starting library: transcribed from the source named; values marked "from memory" must be checked against the printed table.';

export type LibrarySeedResult = { applied: boolean; version: number; species: number; constants: number };

/** Adds the starting library's species and constants that are missing, in one transaction. */
export async function seedLibrary(db: Db): Promise<LibrarySeedResult> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${LIBRARY_LOCK_KEY})`);
    const done = await tx
      .select({ id: auditLog.id })
      .from(auditLog)
      .where(and(eq(auditLog.action, 'library.seeded'), sql`${auditLog.payload}->>'version' = ${String(LIBRARY_SEED_VERSION)}`))
      .limit(1);
    if (done.length > 0) return { applied: false, version: LIBRARY_SEED_VERSION, species: 0, constants: 0 };

    let speciesAdded = 0;
    for (const s of SEED_SPECIES) {
      const added = await tx
        .insert(species)
        .values({
          formula: s.formula,
          name: s.name,
          charge: analyseFormula(s.formula).charge,
          molarMass: molarMass(s.formula).toFixed(5),
          role: s.role,
          aliases: s.aliases ?? [],
        })
        .onConflictDoNothing()
        .returning({ id: species.id });
      speciesAdded += added.length;
    }
    const snap = await readLibrary(tx);
    const keys = new Set(snap.rows.map((r) => r.reactionKey));
    let constantsAdded = 0;
    for (const c of SEED_CONSTANTS) {
      const checked = checkReaction(c.kind, c.reaction);
      if (keys.has(checked.key)) continue;
      await insertVersion(tx, {
        kind: c.kind,
        checked,
        logValue: c.logValue,
        uncertainty: c.uncertainty ?? null,
        temperatureC: c.temperatureC,
        ionicStrength: c.ionicStrength,
        medium: c.medium,
        enthalpyKjMol: c.enthalpyKjMol ?? null,
        source: c.source,
        note: c.note ?? '',
        status: 'approved',
        proposedBy: null,
        reviewNote: SEED_REVIEW_NOTE,
        reviewedAt: new Date(),
      });
      keys.add(checked.key);
      constantsAdded++;
    }
    await tx.insert(auditLog).values({
      actor: 'system:seed',
      action: 'library.seeded',
      subject: 'library',
      payload: { version: String(LIBRARY_SEED_VERSION), speciesAdded, constantsAdded },
    });
    return { applied: true, version: LIBRARY_SEED_VERSION, species: speciesAdded, constants: constantsAdded };
  });
}
