import { desc } from 'drizzle-orm';
import { Router } from 'express';

import { outboxMessages } from '@/db/schema';
import { allow } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { HttpError } from '@/server/http-error';
import type { OutboxMessage } from '@/shared/auth';

/** Messages the local fake SMTP server kept (newest first; development only, admins). */
export function outboxRouter(ctx: AuthContext): Router {
  const router = Router();
  router.get('/dev/outbox', allow('admin'), async (_req, res) => {
    if (!ctx.outbox) throw new HttpError(404, 'not_found', 'There is no outbox: mail goes to the SMTP server set in SMTP_URL.');
    const rows = await ctx.db.select().from(outboxMessages).orderBy(desc(outboxMessages.id)).limit(200);
    const body: OutboxMessage[] = rows.map((r) => ({
      id: r.id,
      receivedAt: r.receivedAt.toISOString(),
      from: r.envelopeFrom,
      to: r.envelopeTo,
      subject: r.subject,
      text: r.text,
    }));
    res.set('Cache-Control', 'no-store').json(body);
  });
  return router;
}
