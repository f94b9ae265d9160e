// People for server tests: inserted straight into the database (hashing once per password).
import { randomUUID } from 'node:crypto';

import { desc, sql } from 'drizzle-orm';
import type request from 'supertest';

import type { Db } from '@/db/client';
import { outboxMessages, users } from '@/db/schema';
import { hashPassword } from '@/server/auth/passwords';
import type { Role } from '@/shared/auth';

export { linkPath } from './mail-links';

export const TEST_PASSWORD = 'correct horse battery';

const hashes = new Map<string, Promise<string>>();

/** A unique e-mail address for one test. */
export function uniqueEmail(label: string): string {
  return `${label}.${randomUUID().slice(0, 8)}@example.test`;
}

/** Inserts an active person with the roles; returns the row. */
export async function createUser(db: Db, options: { roles: Role[]; email?: string; name?: string; password?: string; active?: boolean }) {
  const password = options.password ?? TEST_PASSWORD;
  if (!hashes.has(password)) hashes.set(password, hashPassword(password));
  const [row] = await db
    .insert(users)
    .values({
      id: randomUUID(),
      email: options.email ?? uniqueEmail(options.roles.join('-') || 'nobody'),
      name: options.name ?? `Test ${options.roles.join(' ') || 'person'}`,
      passwordHash: await (hashes.get(password) as Promise<string>),
      roles: options.roles,
      active: options.active ?? true,
    })
    .returning();
  if (!row) throw new Error('no row');
  return { ...row, password };
}

type Agent = ReturnType<typeof request.agent>;

/** Signs the agent in (keeps the cookie) and checks it worked. */
export async function signIn(agent: Agent, email: string, password = TEST_PASSWORD): Promise<void> {
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
}

/** Waits for the newest message to `to` (subject matching), polling the outbox table. */
export async function waitForMail(db: Db, to: string, subject: RegExp, timeoutMs = 10_000): Promise<{ subject: string; text: string; id: number }> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const rows = await db
      .select()
      .from(outboxMessages)
      .where(sql`${to} = any(${outboxMessages.envelopeTo})`)
      .orderBy(desc(outboxMessages.id))
      .limit(5);
    const hit = rows.find((r) => subject.test(r.subject));
    if (hit) return hit;
    if (Date.now() > until) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** How many messages were sent to an address. */
export async function mailCount(db: Db, to: string): Promise<number> {
  const rows = await db.select({ id: outboxMessages.id }).from(outboxMessages).where(sql`${to} = any(${outboxMessages.envelopeTo})`);
  return rows.length;
}
