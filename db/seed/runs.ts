// Demo runs on the demo baths: what a plating chemist and a recovery technician would have saved
// from the latest analyses (headroom, speciation and a curve on the bright silver bath; fixer
// loading on the radiography fixer). Built and solved through the same path as a saved run.
import { asc, eq } from 'drizzle-orm';

import type { Db } from '@/db/client';
import { analyses, baths, runs } from '@/db/schema';
import { prefillFromBath } from '@/lib/baths/prefill';
import { bathOf, toAnalysis } from '@/server/baths/store';
import { saveRun } from '@/server/library/runs-routes';
import { runInputSchema } from '@/shared/constants';

import { DEMO_TEAM } from './team';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

const CHEMIST = { id: DEMO_TEAM[0].id, name: DEMO_TEAM[0].name };
const TECHNICIAN = { id: DEMO_TEAM[1].id, name: DEMO_TEAM[1].name };

const DEMO_RUNS = [
  { bath: 'Bright silver, line 2', by: CHEMIST, title: 'Weekly headroom for silver cyanide', calculator: 'headroom', params: { solid: 'AgCN(s)' } },
  { bath: 'Bright silver, line 2', by: CHEMIST, title: 'Where the silver sits after the top-up', calculator: 'speciation', params: {} },
  {
    bath: 'Bright silver, line 2',
    by: CHEMIST,
    title: 'Free cyanide against silver',
    calculator: 'curves',
    params: { variable: { kind: 'total', component: 'Ag+' }, from: 0.05, to: 0.6, points: 60, series: [{ kind: 'free', component: 'CN-' }] },
  },
  { bath: 'Fixer tank A, radiography', by: TECHNICIAN, title: 'Fixer loading before recovery', calculator: 'fixer_loading', params: { solid: 'AgBr(s)' } },
  // A what-if below the shop's pH threshold: the hazard rules flag it and it waits on the safety desk.
  { bath: 'Silver strike, line 2', by: CHEMIST, title: 'Strike if the pH sags to 10.3', calculator: 'speciation', params: {}, pH: 10.3 },
] as const;

/** Saves the demo runs that are missing (by title); returns how many were added. */
export async function seedRuns(tx: Tx): Promise<number> {
  let added = 0;
  for (const demo of DEMO_RUNS) {
    const existing = await tx.select({ id: runs.id }).from(runs).where(eq(runs.title, demo.title));
    if (existing.length > 0) continue;
    const [row] = await tx.select().from(baths).where(eq(baths.name, demo.bath));
    if (!row) continue;
    const bath = await bathOf(tx, row);
    const rows = await tx.select().from(analyses).where(eq(analyses.bathId, row.id)).orderBy(asc(analyses.sampledAt));
    const { system } = prefillFromBath(bath, rows.map((a) => toAnalysis(a, bath, new Map())));
    if ('pH' in demo) system.pH = demo.pH;
    const input = runInputSchema.parse({ title: demo.title, calculator: demo.calculator, system, params: demo.params, bathId: row.id });
    await saveRun(tx, demo.by, input);
    added++;
  }
  return added;
}
