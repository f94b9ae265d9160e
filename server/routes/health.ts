import { Router } from 'express';

import type { DbHandle } from '@/db/client';
import { open } from '@/server/auth/access';
import type { Health } from '@/shared/health';

/** How long the health check waits for the database before calling it down, in milliseconds. */
export const HEALTH_DB_TIMEOUT_MS = 2000;

async function databaseAnswers(handle: DbHandle): Promise<boolean> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), HEALTH_DB_TIMEOUT_MS);
  });
  const probe = handle.sql`select 1 as ok`.then(
    () => true,
    () => false,
  );
  try {
    return await Promise.race([probe, timeout]);
  } finally {
    clearTimeout(timer);
  }
}

/** GET /api/health: open to everyone (load balancers, the app's status dot); 503 when the database is down. */
export function healthRouter(handle: DbHandle, version: string): Router {
  const router = Router();
  router.get('/health', open, async (_req, res) => {
    const up = await databaseAnswers(handle);
    const payload: Health = { status: up ? 'ok' : 'degraded', db: up ? 'up' : 'down', version };
    res.set('Cache-Control', 'no-store').status(up ? 200 : 503).json(payload);
  });
  return router;
}
