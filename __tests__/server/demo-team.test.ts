import { inArray } from 'drizzle-orm';

import { createDb, type DbHandle } from '@/db/client';
import { users } from '@/db/schema';
import { seedDemo } from '@/db/seed';
import { DEMO_PASSWORD, DEMO_TEAM } from '@/db/seed/team';
import { demoUploadsDir, startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { signIn } from '@/__tests__/support/users';

// Demo attachments land here rather than in the checkout.
const DEMO_UPLOADS = demoUploadsDir();

describe('the demo team', () => {
  let handle: DbHandle;
  let t: TestServer;
  beforeAll(async () => {
    handle = createDb(process.env.DATABASE_URL as string, { max: 2 });
    t = await startTestServer();
  });
  afterAll(async () => {
    await t.close();
    await handle.close();
  });

  it('seeds one account per role, idempotently, each able to sign in with the demo password', async () => {
    await seedDemo(handle.db, DEMO_UPLOADS);
    await seedDemo(handle.db, DEMO_UPLOADS);
    const emails = DEMO_TEAM.map((u) => u.email);
    const rows = await handle.db.select().from(users).where(inArray(users.email, emails));
    expect(rows).toHaveLength(5);
    expect(rows.map((r) => r.roles[0]).sort()).toEqual(['admin', 'chemist', 'reviewer', 'safety', 'technician']);
    for (const email of ['chemist@ligandry.test', 'technician@ligandry.test', 'reviewer@ligandry.test', 'safety@ligandry.test', 'admin@ligandry.test']) {
      const agent = t.agent();
      await signIn(agent, email, DEMO_PASSWORD);
      expect((await agent.get('/api/me')).body.email).toBe(email);
    }
  });

  it('never seeds with NODE_ENV=production', async () => {
    const before = process.env.NODE_ENV;
    process.env.NODE_ENV = 'production';
    try {
      await expect(seedDemo(handle.db, DEMO_UPLOADS)).resolves.toMatchObject({ applied: false, production: true });
    } finally {
      process.env.NODE_ENV = before;
    }
  });
});
