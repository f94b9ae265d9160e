// The demo shop's baths: seeded once, with months of analyses, a couple of results outside their
// targets, a bath that is due for analysis, and one lab report that downloads as a PDF.
import { createDb, type DbHandle } from '@/db/client';
import { seedDemo } from '@/db/seed';
import { DEMO_BATH_PLANS } from '@/db/seed/baths';
import { DEMO_PASSWORD } from '@/db/seed/team';
import { demoUploadsDir, startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { signIn } from '@/__tests__/support/users';

type Summary = { id: string; name: string; process: string; analysisCount: number; lastAnalysisAgeDays: number | null; outOfRange: { quantity: string; side: string }[] };

describe('the demo baths', () => {
  let handle: DbHandle;
  let t: TestServer;
  let list: Summary[];
  const uploads = demoUploadsDir();

  beforeAll(async () => {
    handle = createDb(process.env.DATABASE_URL as string, { max: 2 });
    t = await startTestServer({ uploadsDir: uploads });
    await seedDemo(handle.db, uploads);
    await seedDemo(handle.db, uploads);
  });
  afterAll(async () => {
    await t.close();
    await handle.close();
  });

  it('are there once each, with their analyses', async () => {
    const agent = t.agent();
    await signIn(agent, 'technician@ligandry.test', DEMO_PASSWORD);
    list = (await agent.get('/api/baths')).body as Summary[];
    for (const plan of DEMO_BATH_PLANS) {
      const found = list.filter((b) => b.name === plan.bath.name);
      expect([plan.bath.name, found.length]).toEqual([plan.bath.name, 1]);
      expect(found[0]?.analysisCount).toBe(plan.weeks);
    }
    expect(new Set(list.map((b) => b.process)).size).toBeGreaterThanOrEqual(4);
  });

  it('show the states a shop would look for: a loaded fixer, a bath due for analysis, a past low reading', async () => {
    const fixer = list.find((b) => b.name === 'Fixer tank A, radiography');
    expect(fixer?.outOfRange).toEqual([expect.objectContaining({ quantity: 'metal', side: 'above' })]);
    const minilab = list.find((b) => b.name === 'Fixer tank B, minilab');
    expect(minilab?.lastAnalysisAgeDays).toBeGreaterThanOrEqual(20);
    const agent = t.agent();
    await signIn(agent, 'chemist@ligandry.test', DEMO_PASSWORD);
    const silver = list.find((b) => b.name === 'Bright silver, line 2') as Summary;
    const log = (await agent.get(`/api/baths/${silver.id}/analyses`)).body as { outOfRange: { quantity: string; side: string }[] }[];
    expect(log.filter((a) => a.outOfRange.some((o) => o.quantity === 'freeLigand' && o.side === 'below'))).toHaveLength(1);
    const files = (await agent.get(`/api/baths/${silver.id}/attachments`)).body as { id: string; contentType: string }[];
    expect(files).toHaveLength(1);
    const pdf = await agent.get(`/api/baths/${silver.id}/attachments/${files[0]?.id}`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (d: Buffer) => chunks.push(d));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    expect((pdf.body as Buffer).subarray(0, 8).toString('latin1')).toBe('%PDF-1.4');
  });

  it('carry the demo runs a chemist and a technician saved from their latest analyses', async () => {
    const agent = t.agent();
    await signIn(agent, 'chemist@ligandry.test', DEMO_PASSWORD);
    const silver = list.find((b) => b.name === 'Bright silver, line 2') as Summary;
    const onSilver = (await agent.get('/api/runs').query({ bath: silver.id })).body as { calculator: string; status: string; verdict: string }[];
    expect(onSilver.map((r) => r.calculator).sort()).toEqual(['curves', 'headroom', 'speciation']);
    expect(onSilver.every((r) => r.status === 'converged' && r.verdict.length > 10)).toBe(true);
    const fixer = list.find((b) => b.name === 'Fixer tank A, radiography') as Summary;
    const onFixer = (await agent.get('/api/runs').query({ bath: fixer.id })).body as { calculator: string; verdict: string }[];
    expect(onFixer.map((r) => r.calculator)).toEqual(['fixer_loading']);
    expect(onFixer[0]?.verdict).toMatch(/loading/);
  });
});
