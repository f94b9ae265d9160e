import { Argon2id } from 'oslo/password';

import type { Db } from '@/db/client';
import { users } from '@/db/schema';

/** The demo password of every demo account (demo only: listed in the README, never in production). */
export const DEMO_PASSWORD = 'ligandry-demo';

/** One account per role at the invented Harbourside Finishing shop. */
export const DEMO_TEAM = [
  { id: '00000000-0000-4000-8000-000000000001', email: 'chemist@ligandry.test', name: 'Mara Lindqvist', roles: ['chemist'] },
  { id: '00000000-0000-4000-8000-000000000002', email: 'technician@ligandry.test', name: 'Tomasz Okafor', roles: ['technician'] },
  { id: '00000000-0000-4000-8000-000000000003', email: 'reviewer@ligandry.test', name: 'Priya Halvorsen', roles: ['reviewer'] },
  { id: '00000000-0000-4000-8000-000000000004', email: 'safety@ligandry.test', name: 'Dale Whitcombe', roles: ['safety'] },
  { id: '00000000-0000-4000-8000-000000000005', email: 'admin@ligandry.test', name: 'Ines Moreau', roles: ['admin'] },
] as const;

/** Inserts the demo accounts that are missing (by e-mail); returns how many were added. */
export async function seedTeam(tx: Pick<Db, 'insert'>): Promise<number> {
  // One hash for all five: they share the demo password, and each hash takes ~100 ms.
  const hash = await new Argon2id().hash(DEMO_PASSWORD);
  const added = await tx
    .insert(users)
    .values(DEMO_TEAM.map((u) => ({ ...u, roles: [...u.roles], passwordHash: hash })))
    .onConflictDoNothing()
    .returning({ id: users.id });
  return added.length;
}
