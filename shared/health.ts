import { z } from 'zod';

/** GET /api/health: whether the server and its database answer, and which build is running. */
export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['up', 'down']),
  version: z.string(),
});

export type Health = z.infer<typeof healthSchema>;
