import { type Health } from '@/shared/health';

/** A healthy server reply, as the API would send it. */
export const healthyReply: Health = { status: 'ok', db: 'up', version: '9.9.9-test' };

/** Minimal stand-in for a fetch Response carrying a JSON body. */
export function jsonResponse(status: number, body: unknown): Response {
  return {
    ok: status >= 200 && status < 300,
    status,
    json: async () => body,
  } as unknown as Response;
}

/** Replaces global.fetch with a jest mock and returns it. */
export function mockFetch(): jest.Mock {
  const fn = jest.fn();
  global.fetch = fn as unknown as typeof fetch;
  return fn;
}
