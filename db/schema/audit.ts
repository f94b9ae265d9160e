import { bigserial, index, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Append-only record of who did what and when; later features write sign-ins, reviews and sign-offs here. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    // Who acted: a user id once sign-in exists, or a system actor such as "system:seed".
    actor: text('actor').notNull(),
    // What happened, as a dotted verb: "demo.seeded", "auth.sign_in", "constant.approved".
    action: text('action').notNull(),
    // What it happened to, as "kind:id" where there is one.
    subject: text('subject'),
    payload: jsonb('payload').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index('audit_log_at_idx').on(t.at), index('audit_log_action_idx').on(t.action)],
);

export type AuditEntry = typeof auditLog.$inferSelect;
export type NewAuditEntry = typeof auditLog.$inferInsert;
