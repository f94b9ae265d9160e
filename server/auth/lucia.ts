import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { type DatabaseSession, type DatabaseUser, Lucia, TimeSpan } from 'lucia';

import type { Db } from '@/db/client';
import { sessions, users } from '@/db/schema';
import type { Role } from '@/shared/auth';

/** Name of the session cookie (httpOnly, SameSite=Lax, Secure over HTTPS). */
export const SESSION_COOKIE = 'ligandry_session';

/** Sessions last 30 days and are extended when used in their second half (lucia's rule). */
const SESSION_DAYS = 30;

// Drizzle sets the driver to hand timestamps back as text (it parses them itself), so expires_at is text.
type SessionUserRow = { id: string; user_id: string; expires_at: string | Date; email: string; name: string; roles: string[]; active: boolean };

/**
 * lucia's Drizzle adapter, with the one look-up every signed-in request makes written as plain
 * SQL on the driver: the same join, without building the query through Drizzle each time (the
 * builder was one of the larger costs of a request under `npm run load`). Only the user
 * attributes getUserAttributes reads are selected; the rarer calls stay with the Drizzle adapter.
 */
class SessionAdapter extends DrizzlePostgreSQLAdapter {
  constructor(private readonly client: Db['$client'], db: Db) {
    super(db, sessions, users);
  }

  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const rows = await this.client<SessionUserRow[]>`
      select s.id, s.user_id, s.expires_at, u.email, u.name, u.roles, u.active
      from sessions s join users u on u.id = s.user_id where s.id = ${sessionId}`;
    const row = rows.length === 1 ? rows[0] : undefined;
    if (!row) return [null, null];
    return [
      { id: row.id, userId: row.user_id, expiresAt: new Date(row.expires_at), attributes: {} },
      { id: row.user_id, attributes: { email: row.email, name: row.name, roles: row.roles, active: row.active } },
    ];
  }
}

/** The lucia instance for one database; `secure` marks the cookie Secure (served over HTTPS). */
export function createLucia(db: Db, options: { secure: boolean }) {
  return new Lucia(new SessionAdapter(db.$client, db), {
    sessionExpiresIn: new TimeSpan(SESSION_DAYS, 'd'),
    sessionCookie: {
      name: SESSION_COOKIE,
      expires: true,
      attributes: { secure: options.secure, sameSite: 'lax', path: '/' },
    },
    getUserAttributes: (row) => ({
      email: row.email,
      name: row.name,
      roles: row.roles as Role[],
      active: row.active,
    }),
  });
}

export type AuthLucia = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: AuthLucia;
    DatabaseUserAttributes: { email: string; name: string; roles: string[]; active: boolean };
  }
}
