import type { RequestHandler, Response } from 'express';
import type { Cookie, Session } from 'lucia';

import type { AuthLucia } from '@/server/auth/lucia';
import type { Role, User } from '@/shared/auth';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      /** The signed-in person, or null. */
      user?: User | null;
      session?: Session | null;
    }
  }
}

/**
 * Sends a session cookie, marked Secure when this request came over HTTPS (directly, or through
 * a proxy on loopback that says so) even if the app was not told it is served over HTTPS.
 */
function sendCookie(res: Response, cookie: Cookie): void {
  if (res.req.secure) cookie.attributes.secure = true;
  res.append('Set-Cookie', cookie.serialize());
}

/** Reads the session cookie, validates it, and puts the person on res.locals (null when none). */
export function sessionMiddleware(lucia: AuthLucia): RequestHandler {
  return async (req, res, next) => {
    res.locals.user = null;
    res.locals.session = null;
    const id = lucia.readSessionCookie(req.get('cookie') ?? '');
    if (!id) return next();
    const { session, user } = await lucia.validateSession(id);
    if (!session) {
      sendCookie(res, lucia.createBlankSessionCookie());
      return next();
    }
    if (!user.active) {
      // Deactivation ends sessions; this catches one that raced with it.
      await lucia.invalidateSession(session.id);
      sendCookie(res, lucia.createBlankSessionCookie());
      return next();
    }
    if (session.fresh) sendCookie(res, lucia.createSessionCookie(session.id));
    res.locals.session = session;
    res.locals.user = { id: user.id, email: user.email, name: user.name, roles: user.roles as Role[] };
    next();
  };
}

/** Starts a new session for the person (ending the one this browser had: no session fixation). */
export async function startSession(lucia: AuthLucia, res: Response, userId: string): Promise<void> {
  const previous = res.locals.session;
  if (previous) await lucia.invalidateSession(previous.id);
  const session = await lucia.createSession(userId, {});
  sendCookie(res, lucia.createSessionCookie(session.id));
  res.locals.session = session;
}

/** Ends this browser's session and clears its cookie. */
export async function endSession(lucia: AuthLucia, res: Response): Promise<void> {
  const session = res.locals.session;
  if (session) await lucia.invalidateSession(session.id);
  sendCookie(res, lucia.createBlankSessionCookie());
  res.locals.session = null;
  res.locals.user = null;
}
