import { z } from 'zod';

import { HttpError } from '@/server/http-error';
import { toErrorResponse } from '@/server/middleware/error-handler';

describe('toErrorResponse', () => {
  it('keeps an HttpError status, code, message and details', () => {
    const r = toErrorResponse(new HttpError(409, 'conflict', 'Bath name already used.', { field: 'name' }));
    expect(r).toEqual({ status: 409, body: { error: { code: 'conflict', message: 'Bath name already used.', details: { field: 'name' } } } });
  });

  it('turns a ZodError into 400 validation_failed naming the field', () => {
    const parsed = z.object({ volumeL: z.number().positive() }).safeParse({ volumeL: -3 });
    if (parsed.success) throw new Error('expected failure');
    const r = toErrorResponse(parsed.error);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('validation_failed');
    expect(r.body.error.message).toMatch(/^volumeL: /);
    expect(r.body.error.details).toEqual([expect.objectContaining({ path: 'volumeL' })]);
  });

  it('reports an unreachable database as 503 db_unavailable', () => {
    const err = Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' });
    expect(toErrorResponse(err)).toMatchObject({ status: 503, body: { error: { code: 'db_unavailable' } } });
    // Drizzle wraps the driver's error in its own; the code is on the cause.
    const wrapped = Object.assign(new Error('Failed query: select ...'), { cause: err });
    expect(toErrorResponse(wrapped)).toMatchObject({ status: 503, body: { error: { code: 'db_unavailable' } } });
  });

  it('hides unknown failures behind a 500 without internals', () => {
    const r = toErrorResponse(new Error('secret stack detail'));
    expect(r.status).toBe(500);
    expect(JSON.stringify(r.body)).not.toContain('secret');
  });
});
