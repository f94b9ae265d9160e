import type { ErrorCode } from '@/shared/errors';

/** An error a handler throws to answer with a given status and `{error: {code, message, details?}}`. */
export class HttpError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string,
    public readonly details?: unknown,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}
