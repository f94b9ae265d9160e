import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia, TimeSpan } from 'lucia';

import type { Db } from '@/db/client';
import { sessions, users } from '@/db/schema';
import type { Role } from '@/shared/auth';

/** Name of the session cookie (httpOnly, SameSite=Lax, Secure over HTTPS). */
export const SESSION_COOKIE = 'ligandry_session';

/** Sessions last 30 days and are extended when used in their second half (lucia's rule). */
const SESSION_DAYS = 30;

/** The lucia instance for one database; `secure` marks the cookie Secure (served over HTTPS). */
export function createLucia(db: Db, options: { secure: boolean }) {
  const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);
  return new Lucia(adapter, {
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
