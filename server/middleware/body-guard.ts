import type { RequestHandler } from 'express';

import { HttpError } from '@/server/http-error';

// Request bodies the rest of the server cannot take, refused with a 400 naming the field before
// any handler sees them: PostgreSQL text and jsonb refuse the NUL character and lone UTF-16
// surrogates (one would fail the insert, the other would be stored changed), and JSON.stringify
// (jsonb columns, the audit log) overflows the stack on bodies thousands of levels deep.

/** Deepest nesting a body may have; the deepest real body (a batch of problems for /solve) has 5 levels. */
export const MAX_BODY_DEPTH = 32;

/** One problem of a body: where (dot-separated, as validation details name fields) and what. */
export type BodyProblem = { path: string; message: string };

function textProblem(text: string): string | null {
  if (text.includes('\u0000')) return 'must not contain the NUL character (U+0000)';
  if (!text.isWellFormed()) return 'is not valid Unicode text (it holds a lone surrogate)';
  return null;
}

/** A key as a path segment, its control characters escaped so the message stays printable. */
function segment(key: string): string {
  return JSON.stringify(key.toWellFormed()).slice(1, -1);
}

/** The first string (value or key) the database cannot store, or nesting deeper than MAX_BODY_DEPTH. */
export function bodyProblem(body: unknown): BodyProblem | null {
  // Iterative, so a body nested ten thousand levels deep cannot overflow the stack here either.
  const stack: { value: unknown; path: string[] }[] = [{ value: body, path: [] }];
  while (stack.length > 0) {
    const { value, path } = stack.pop() as { value: unknown; path: string[] };
    if (typeof value === 'string') {
      const message = textProblem(value);
      if (message) return { path: path.join('.'), message };
      continue;
    }
    if (value === null || typeof value !== 'object') continue;
    if (path.length >= MAX_BODY_DEPTH) return { path: path[0] ?? '', message: `is nested more than ${MAX_BODY_DEPTH} levels deep` };
    for (const [key, child] of Object.entries(value)) {
      const keyMessage = textProblem(key);
      if (keyMessage) return { path: [...path, segment(key)].join('.'), message: `has a key that ${keyMessage}` };
      stack.push({ value: child, path: [...path, key] });
    }
  }
  return null;
}

/** Throws the 400 validation_failed for a body (JSON, or an upload's text fields) with a problem. */
export function assertStorableBody(body: unknown): void {
  const problem = bodyProblem(body);
  if (!problem) return;
  throw new HttpError(400, 'validation_failed', `${problem.path || 'body'}: ${problem.message}`, [problem]);
}

/** After the JSON parser: refuses bodies with text PostgreSQL cannot store, or nested too deep. */
export const bodyGuard: RequestHandler = (req, _res, next) => {
  assertStorableBody(req.body);
  next();
};
