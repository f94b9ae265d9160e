import { sql } from 'drizzle-orm';
import { bigserial, boolean, check, index, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';

// People, their sessions, invitations and password-reset links. Tokens mailed to people are kept
// only as SHA-256 hashes: the database alone never holds a working link. Nobody is ever deleted:
// runs and reviews stay attributed; an admin deactivates instead.

/** Role names allowed in the roles arrays (shared/auth.ts ROLES). */
const ROLE_CHECK = sql`'{chemist,technician,reviewer,safety,admin}'::text[]`;

export const users = pgTable(
  'users',
  {
    id: text('id').primaryKey(),
    // Stored lower-case and trimmed; unique.
    email: text('email').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash').notNull(),
    roles: text('roles').array().notNull().default(sql`'{}'::text[]`),
    active: boolean('active').notNull().default(true),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    lastSignInAt: timestamp('last_sign_in_at', { withTimezone: true }),
    passwordChangedAt: timestamp('password_changed_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('users_email_idx').on(t.email),
    check('users_roles_known', sql`${t.roles} <@ ${ROLE_CHECK}`),
    check('users_email_lower', sql`${t.email} = lower(${t.email})`),
  ],
);

export const sessions = pgTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id),
    expiresAt: timestamp('expires_at', { withTimezone: true, mode: 'date' }).notNull(),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
);

export const invitations = pgTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    email: text('email').notNull(),
    roles: text('roles').array().notNull(),
    tokenHash: text('token_hash').notNull(),
    invitedBy: text('invited_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedUserId: text('accepted_user_id').references(() => users.id),
    // Withdrawn by an admin, or replaced by a newer invitation or a resent link.
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [
    uniqueIndex('invitations_token_idx').on(t.tokenHash),
    index('invitations_email_idx').on(t.email),
    check('invitations_roles_known', sql`${t.roles} <@ ${ROLE_CHECK} and cardinality(${t.roles}) > 0`),
  ],
);

export const passwordResets = pgTable(
  'password_resets',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id),
    tokenHash: text('token_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    // Set when the link is used, or made void by a newer link or a password change.
    usedAt: timestamp('used_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('password_resets_token_idx').on(t.tokenHash), index('password_resets_user_idx').on(t.userId)],
);

/** Every message the local fake SMTP server received (development and tests only). */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
    envelopeFrom: text('envelope_from').notNull(),
    envelopeTo: text('envelope_to').array().notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    raw: text('raw').notNull(),
  },
  (t) => [index('outbox_received_idx').on(t.receivedAt)],
);

export type UserRow = typeof users.$inferSelect;
export type InvitationRow = typeof invitations.$inferSelect;
