import type { z } from 'zod';

/**
 * A response body checked against its shared schema before it leaves. A mismatch is a server bug,
 * so it becomes a 500 (logged), never a 400 that would blame the caller.
 */
export function output<S extends z.ZodType>(schema: S, value: z.input<S>): z.output<S> {
  const checked = schema.safeParse(value);
  if (!checked.success) {
    const first = checked.error.issues[0];
    throw new Error(`response does not match its schema at ${first?.path.join('.') || '(root)'}: ${first?.message ?? 'invalid'}`);
  }
  return checked.data;
}
