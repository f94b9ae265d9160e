import { eq, sql } from 'drizzle-orm';

import { createDb, type DbHandle } from '@/db/client';
import { auditLog } from '@/db/schema';
import { DEMO_SEED_VERSION, seedDemo } from '@/db/seed';
import { demoUploadsDir } from '@/__tests__/support/test-server';

// Demo attachments land here rather than in the checkout.
const DEMO_UPLOADS = demoUploadsDir();

// Drizzle wraps the database error; the trigger's message is on its cause.
async function reason(query: PromiseLike<unknown>): Promise<string> {
  try {
    await query;
    return 'no error';
  } catch (err) {
    const e = err as Error & { cause?: Error };
    return `${e.message} ${e.cause?.message ?? ''}`;
  }
}

describe('audit_log and the demo seed', () => {
  let handle: DbHandle;
  beforeAll(() => {
    handle = createDb(process.env.DATABASE_URL as string, { max: 2 });
  });
  afterAll(async () => {
    await handle.close();
  });

  it('stores who, what, when and a JSON payload', async () => {
    const [row] = await handle.db
      .insert(auditLog)
      .values({ actor: 'user:test', action: 'test.recorded', subject: 'bath:1', payload: { litres: 1200 } })
      .returning();
    expect(row).toBeDefined();
    expect(row!.at).toBeInstanceOf(Date);
    expect(Math.abs(row!.at.getTime() - Date.now())).toBeLessThan(60_000);
    expect(row!.payload).toEqual({ litres: 1200 });
  });

  it('refuses updates, deletes and truncation: the log is append-only', async () => {
    const [row] = await handle.db.insert(auditLog).values({ actor: 'user:test', action: 'test.kept' }).returning();
    await expect(reason(handle.db.update(auditLog).set({ action: 'x' }).where(eq(auditLog.id, row!.id)))).resolves.toMatch(
      /append-only: UPDATE/,
    );
    await expect(reason(handle.db.delete(auditLog).where(eq(auditLog.id, row!.id)))).resolves.toMatch(/append-only: DELETE/);
    await expect(reason(handle.db.execute(sql`truncate audit_log`))).resolves.toMatch(/append-only: TRUNCATE/);
    const [kept] = await handle.db.select().from(auditLog).where(eq(auditLog.id, row!.id));
    expect(kept?.action).toBe('test.kept');
  });

  it('seeds once per seed version, also when two seeds race', async () => {
    const results = await Promise.all([seedDemo(handle.db, DEMO_UPLOADS), seedDemo(handle.db, DEMO_UPLOADS)]);
    const again = await seedDemo(handle.db, DEMO_UPLOADS);
    // At most one of them applies it (another test file may have seeded this database first).
    expect(results.filter((r) => r.applied).length).toBeLessThanOrEqual(1);
    expect(again.applied).toBe(false);
    const rows = await handle.db.select().from(auditLog).where(eq(auditLog.action, 'demo.seeded'));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.payload).toMatchObject({ version: String(DEMO_SEED_VERSION) });
  });
});
