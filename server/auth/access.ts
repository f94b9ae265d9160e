import type { Express, NextFunction, Request, RequestHandler, Response, Router } from 'express';

import { HttpError } from '@/server/http-error';
import { type Role, ROLES, type User } from '@/shared/auth';

// Every API route states who may call it, as the first handler of the route:
//   router.get('/things', allow('chemist', 'technician'), handler)
//   router.post('/auth/sign-in', open, handler)        anyone, signed in or not
//   router.get('/me', signedIn, handler)                 any signed-in person, whatever their roles
// A route without such a declaration is refused when the app is built (assertEveryRouteDeclared),
// and the role-matrix test lists every route, so nothing is reachable by default.

/** Who may call a route. */
export type Access = { kind: 'open' } | { kind: 'signed-in' } | { kind: 'roles'; roles: readonly Role[] };

const ACCESS = Symbol('ligandry.access');

type Declared = RequestHandler & { [ACCESS]: Access };

function declare(access: Access, handler: RequestHandler): Declared {
  return Object.assign(handler, { [ACCESS]: access });
}

/** The signed-in person of this request, or null (set by the session middleware). */
export function currentUser(res: Response): User | null {
  return res.locals.user ?? null;
}

/** The signed-in person; throws 401 when there is none (for handlers behind signedIn or allow). */
export function requireUser(res: Response): User {
  const user = currentUser(res);
  if (!user) throw new HttpError(401, 'unauthenticated', 'Sign in to continue.');
  return user;
}

/** Open to anyone (sign-in, the mailed links, health). */
export const open: RequestHandler = declare({ kind: 'open' }, (_req, _res, next) => next());

/** Any signed-in person. */
export const signedIn: RequestHandler = declare({ kind: 'signed-in' }, (_req: Request, res: Response, next: NextFunction) => {
  requireUser(res);
  next();
});

/** Signed-in people holding at least one of the roles. */
export function allow(...roles: Role[]): RequestHandler {
  if (roles.length === 0) throw new Error('allow() needs at least one role; use signedIn or open otherwise');
  for (const r of roles) if (!ROLES.includes(r)) throw new Error(`allow(): unknown role ${String(r)}`);
  return declare({ kind: 'roles', roles }, (_req, res, next) => {
    const user = requireUser(res);
    if (!roles.some((r) => user.roles.includes(r))) {
      throw new HttpError(403, 'forbidden', `This needs the ${roles.join(' or ')} role.`);
    }
    next();
  });
}

/** The access declared by a handler, if it is one of the above. */
export function accessOf(handler: unknown): Access | null {
  return typeof handler === 'function' && ACCESS in handler ? (handler as Declared)[ACCESS] : null;
}

/** One registered route: method, full path, and what it declared (null: nothing). */
export type RouteEntry = { method: string; path: string; access: Access | null };

type LayerLike = {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] };
  handle: { stack?: LayerLike[] };
  rawPath?: unknown;
  slash?: boolean;
};

function walk(stack: LayerLike[], prefix: string, out: RouteEntry[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const first = layer.route.stack[0]?.handle;
      for (const method of Object.keys(layer.route.methods)) {
        if (method === '_all') continue;
        out.push({ method: method.toUpperCase(), path: prefix + layer.route.path, access: accessOf(first) });
      }
    } else if (Array.isArray(layer.handle.stack)) {
      const mount = typeof layer.rawPath === 'string' && !layer.slash ? layer.rawPath : '';
      walk(layer.handle.stack, prefix + mount, out);
    }
  }
}

/** Every route registered on the app (or a router), with its full path and declared access. */
export function listRoutes(app: Express | Router): RouteEntry[] {
  const root = 'router' in app && (app as Express).router ? (app as Express).router : app;
  const out: RouteEntry[] = [];
  walk((root as unknown as { stack: LayerLike[] }).stack, '', out);
  return out;
}

/** Throws when a route under /api has no access declaration: deny by default, at start-up. */
export function assertEveryRouteDeclared(app: Express): void {
  const missing = listRoutes(app).filter((r) => r.path.startsWith('/api') && r.access === null);
  if (missing.length > 0) {
    throw new Error(`Routes without an access declaration (open, signedIn or allow(...)): ${missing.map((r) => `${r.method} ${r.path}`).join(', ')}`);
  }
}
