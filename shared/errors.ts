import { z } from 'zod';

// Error codes the API returns in `{error: {code, message, details?}}`; clients switch on these.
export const ERROR_CODES = [
  'bad_request',
  'validation_failed',
  'invalid_json',
  'payload_too_large',
  'unauthenticated',
  'forbidden',
  'bad_origin',
  'not_found',
  'gone',
  'conflict',
  // A flagged run released before the safety desk signed it off.
  'sign_off_required',
  'rate_limited',
  'db_unavailable',
  'internal',
] as const;

export type ErrorCode = (typeof ERROR_CODES)[number];

/** The one error body every API route answers with on a non-2xx. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});

export type ErrorBody = z.infer<typeof errorBodySchema>;
