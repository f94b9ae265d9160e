import { type Person, type User } from '@/shared/auth';
import { type Health } from '@/shared/health';
import { DEFAULT_THRESHOLDS } from '@/shared/safety';

/** A healthy server reply, as the API would send it. */
export const healthyReply: Health = { status: 'ok', db: 'up', version: '9.9.9-test' };

/** A signed-in chemist (no admin role). */
export const chemist: User = { id: 'u-chem', email: 'cora@shop.test', name: 'Cora Quill', roles: ['chemist'] };

/** A signed-in admin. */
export const admin: User = { id: 'u-admin', email: 'ada@shop.test', name: 'Ada Ferro', roles: ['admin', 'chemist'] };

/** A team member as GET /api/team/people lists them. */
export function person(user: User, extra: Partial<Person> = {}): Person {
  return { ...user, active: true, createdAt: '2026-01-05T09:00:00.000Z', lastSignInAt: null, ...extra };
}

/** Minimal stand-in for a fetch Response carrying a JSON body. */
export function jsonResponse(status: number, body: unknown): Response {
  return {
    ok: status >= 200 && status < 300,
    status,
    json: async () => body,
  } as unknown as Response;
}

/** The error body the API sends on a non-2xx. */
export function errorBody(code: string, message: string, details?: unknown) {
  return { error: { code, message, ...(details === undefined ? {} : { details }) } };
}

/** Replaces global.fetch with a jest mock and returns it. */
export function mockFetch(): jest.Mock {
  const fn = jest.fn();
  global.fetch = fn as unknown as typeof fetch;
  return fn;
}

/** One canned answer: a status and body, a request that never ends, or a network failure. */
export type Reply = { status: number; body?: unknown } | 'pending' | 'network';
/** Answers keyed by "METHOD /path" or, for GET, "/path" alone (query string included); a function sees the sent body. */
export type Routes = Record<string, Reply | ((body: unknown) => Reply)>;

/** Default answers: a healthy server, a signed-in chemist, no outbox. */
export const DEFAULT_ROUTES: Routes = {
  '/api/health': { status: 200, body: healthyReply },
  '/api/me': { status: 200, body: chemist },
  '/api/auth/options': { status: 200, body: { outbox: false } },
  // The library's opening view, empty.
  '/api/constants?dir=asc&sort=reaction&status=approved': { status: 200, body: [] },
  // The bath list's opening view (baths in service), empty.
  '/api/baths?status=active': { status: 200, body: [] },
  // The safety desk, empty, and the built-in thresholds.
  '/api/safety/reviews?status=all': { status: 200, body: [] },
  '/api/safety/reviews?status=pending': { status: 200, body: [] },
  '/api/safety/thresholds': { status: 200, body: { version: 1, values: DEFAULT_THRESHOLDS, note: 'Built-in defaults (common practice).', createdBy: null, createdAt: '2026-01-01T00:00:00.000Z' } },
};

/** Mocks fetch with answers per route; anything unlisted answers 404 not_found. Returns the mock to inspect calls. */
export function mockApi(routes: Routes = {}): jest.Mock {
  const table: Routes = { ...DEFAULT_ROUTES, ...routes };
  return mockFetch().mockImplementation(async (path: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const entry = table[`${method} ${path}`] ?? (method === 'GET' ? table[path] : undefined);
    const sent: unknown = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
    const reply = typeof entry === 'function' ? entry(sent) : entry;
    if (reply === undefined) return jsonResponse(404, errorBody('not_found', `No route ${method} ${path}`));
    if (reply === 'pending') return new Promise(() => undefined);
    if (reply === 'network') throw new TypeError('Failed to fetch');
    return jsonResponse(reply.status, reply.body);
  });
}

/** The JSON bodies sent to `method path`, in order. */
export function sentBodies(fetchMock: jest.Mock, method: string, path: string): unknown[] {
  return fetchMock.mock.calls
    .filter(([p, init]) => p === path && ((init as RequestInit | undefined)?.method ?? 'GET') === method)
    .map(([, init]) => {
      const body = (init as RequestInit).body;
      return typeof body === 'string' ? JSON.parse(body) : undefined;
    });
}
