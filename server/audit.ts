import type { Db } from '@/db/client';
import { auditLog } from '@/db/schema';

/** A database or a transaction: audit entries join the transaction of the change they record. */
type Writer = Pick<Db, 'insert'>;

/** What happened, to what, by whom (a user id, or "anonymous" / "system:..."). */
export type AuditInput = { actor: string; action: string; subject?: string | null; payload?: Record<string, unknown> };

/** Appends one entry to the audit log. */
export async function writeAudit(db: Writer, entry: AuditInput): Promise<void> {
  await db.insert(auditLog).values({ actor: entry.actor, action: entry.action, subject: entry.subject ?? null, payload: entry.payload ?? {} });
}
