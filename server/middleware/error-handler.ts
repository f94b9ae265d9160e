import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';

import { isConnectionError } from '@/db/client';
import { HttpError } from '@/server/http-error';
import type { ErrorBody, ErrorCode } from '@/shared/errors';

function body(code: ErrorCode, message: string, details?: unknown): ErrorBody {
  return details === undefined ? { error: { code, message } } : { error: { code, message, details } };
}

/** Maps any error to a status and the one error body; unknown errors become 500 without internals. */
export function toErrorResponse(err: unknown): { status: number; body: ErrorBody } {
  if (err instanceof HttpError) return { status: err.status, body: body(err.code, err.message, err.details) };
  if (err instanceof ZodError) {
    const details = err.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
    const first = details[0];
    const where = first && first.path ? `${first.path}: ` : '';
    return { status: 400, body: body('validation_failed', `${where}${first?.message ?? 'invalid input'}`, details) };
  }
  const e = err as { type?: string; status?: number; code?: string; limit?: number } | null;
  if (e?.type === 'entity.parse.failed') {
    return { status: 400, body: body('invalid_json', 'The request body is not valid JSON.') };
  }
  if (e?.type === 'entity.too.large') {
    const limit = e.limit ? ` (limit ${e.limit} bytes)` : '';
    return { status: 413, body: body('payload_too_large', `The request body is too large${limit}.`) };
  }
  // Drizzle wraps the driver's error (DrizzleQueryError): the connection code may be on its cause.
  if (isConnectionError(err)) {
    return {
      status: 503,
      body: body('db_unavailable', 'The database is not answering right now. Try again in a moment.'),
    };
  }
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return { status: e.status, body: body('bad_request', 'The request could not be read.') };
  }
  return { status: 500, body: body('internal', 'Something went wrong on the server. It has been logged.') };
}

/** Last middleware: logs server faults and answers `{error: {code, message, details?}}`, never a stack. */
export const errorHandler: ErrorRequestHandler = (err, req, res, next) => {
  if (res.headersSent) {
    next(err);
    return;
  }
  const { status, body: payload } = toErrorResponse(err);
  if (status >= 500) req.log?.error({ err }, 'request failed');
  res.status(status).json(payload);
};

/** Any /api path no router claimed: a JSON 404 rather than the web app's HTML. */
export const apiNotFound: RequestHandler = (req) => {
  throw new HttpError(404, 'not_found', `No API route ${req.method} ${req.originalUrl.split('?')[0]}.`);
};
