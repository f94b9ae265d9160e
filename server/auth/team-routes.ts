import { and, asc, desc, eq, gt, isNull, lt } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { type Request, Router } from 'express';
import { z } from 'zod';

import { auditLog, invitations, sessions, users, type UserRow } from '@/db/schema';
import { allow, requireUser } from '@/server/auth/access';
import { type AuthContext, INVITATION_DAYS, trySend } from '@/server/auth/context';
import { hashToken, newId, newToken } from '@/server/auth/tokens';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { invitationMail } from '@/server/mail/messages';
import { type AuditPage, type Invitation, inviteSchema, type Person, type Role, updatePersonSchema } from '@/shared/auth';

const idParam = z.string().uuid('is not a valid id');
const auditQuery = z.object({
  limit: z.coerce.number({ error: 'must be a whole number' }).int('must be a whole number').min(1, 'must be at least 1').max(200, 'must be at most 200').default(50),
  before: z.coerce.number({ error: 'must be an entry id' }).int('must be an entry id').positive('must be an entry id').optional(),
});

function toPerson(row: UserRow): Person {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    roles: row.roles as Role[],
    active: row.active,
    createdAt: row.createdAt.toISOString(),
    lastSignInAt: row.lastSignInAt ? row.lastSignInAt.toISOString() : null,
  };
}

function parseId(req: Request, what: string): string {
  const parsed = idParam.safeParse(req.params.id);
  if (!parsed.success) throw new HttpError(404, 'not_found', `No ${what} with id ${String(req.params.id)}.`);
  return parsed.data;
}

/** Team administration (admins): people and their roles, invitations, the audit log. */
export function teamRouter(ctx: AuthContext): Router {
  const { db } = ctx;
  const router = Router();
  const admin = allow('admin');

  router.get('/team/people', admin, async (_req, res) => {
    const rows = await db.select().from(users).orderBy(asc(users.name), asc(users.email));
    res.json(rows.map(toPerson));
  });

  router.patch('/team/people/:id', admin, async (req, res) => {
    const me = requireUser(res);
    const id = parseId(req, 'person');
    const input = updatePersonSchema.parse(req.body ?? {});
    if (id === me.id && input.active === false) {
      throw new HttpError(409, 'conflict', 'You cannot deactivate your own account. Ask another admin.');
    }
    if (id === me.id && input.roles && !input.roles.includes('admin')) {
      throw new HttpError(409, 'conflict', 'You cannot remove your own admin role. Ask another admin.');
    }
    const updated = await db.transaction(async (tx) => {
      const [before] = await tx.select().from(users).where(eq(users.id, id)).for('update').limit(1);
      if (!before) throw new HttpError(404, 'not_found', `No person with id ${id}.`);
      const changes: Partial<UserRow> = { updatedAt: new Date() };
      if (input.roles) changes.roles = [...input.roles].sort();
      if (input.active !== undefined) changes.active = input.active;
      const [after] = await tx.update(users).set(changes).where(eq(users.id, id)).returning();
      if (!after) throw new Error('update returned no row');
      const subject = `user:${id}`;
      const rolesBefore = [...before.roles].sort();
      if (input.roles && rolesBefore.join() !== after.roles.join()) {
        await writeAudit(tx, { actor: me.id, action: 'team.roles_changed', subject, payload: { email: after.email, from: rolesBefore, to: after.roles } });
      }
      if (input.active !== undefined && input.active !== before.active) {
        await writeAudit(tx, { actor: me.id, action: input.active ? 'team.reactivated' : 'team.deactivated', subject, payload: { email: after.email } });
        // Deactivation ends every session of the person at once.
        if (!input.active) await tx.delete(sessions).where(eq(sessions.userId, id));
      }
      return after;
    });
    res.json(toPerson(updated));
  });

  const inviter = alias(users, 'inviter');
  const pendingInvitations = () =>
    db
      .select({
        id: invitations.id,
        email: invitations.email,
        roles: invitations.roles,
        invitedBy: inviter.name,
        createdAt: invitations.createdAt,
        expiresAt: invitations.expiresAt,
      })
      .from(invitations)
      .innerJoin(inviter, eq(inviter.id, invitations.invitedBy));

  const toInvitation = (row: { id: string; email: string; roles: string[]; invitedBy: string; createdAt: Date; expiresAt: Date }, mailed?: boolean): Invitation => ({
    id: row.id,
    email: row.email,
    roles: row.roles as Role[],
    invitedBy: row.invitedBy,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    ...(mailed === undefined ? {} : { mailed }),
  });

  router.get('/team/invitations', admin, async (_req, res) => {
    const rows = await pendingInvitations()
      .where(and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
      .orderBy(desc(invitations.createdAt));
    res.json(rows.map((r) => toInvitation(r)));
  });

  async function mailInvitation(req: Request, row: { email: string; roles: string[]; expiresAt: Date }, token: string, inviterName: string): Promise<boolean> {
    const link = `${ctx.publicUrl(req)}/welcome/${token}`;
    return trySend(ctx, invitationMail({ to: row.email, inviter: inviterName, roles: row.roles as Role[], link, expiresAt: row.expiresAt }), 'invitation');
  }

  router.post('/team/invitations', admin, async (req, res) => {
    const me = requireUser(res);
    const input = inviteSchema.parse(req.body ?? {});
    const token = newToken();
    const row = await db.transaction(async (tx) => {
      const [existing] = await tx.select({ active: users.active }).from(users).where(eq(users.email, input.email)).limit(1);
      if (existing) {
        const state = existing.active ? 'has an account' : 'has a deactivated account (reactivate it under People)';
        throw new HttpError(409, 'conflict', `${input.email} already ${state}.`);
      }
      const now = new Date();
      // A newer invitation to the same address replaces any still pending.
      await tx
        .update(invitations)
        .set({ revokedAt: now })
        .where(and(eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
      const [inserted] = await tx
        .insert(invitations)
        .values({
          id: newId(),
          email: input.email,
          roles: [...input.roles].sort(),
          tokenHash: hashToken(token),
          invitedBy: me.id,
          expiresAt: new Date(now.getTime() + INVITATION_DAYS * 86_400_000),
        })
        .returning();
      if (!inserted) throw new Error('insert returned no row');
      await writeAudit(tx, { actor: me.id, action: 'team.invited', subject: `invitation:${inserted.id}`, payload: { email: input.email, roles: inserted.roles } });
      return inserted;
    });
    const mailed = await mailInvitation(req, row, token, me.name);
    res.status(201).json(toInvitation({ ...row, invitedBy: me.name }, mailed));
  });

  router.post('/team/invitations/:id/resend', admin, async (req, res) => {
    const me = requireUser(res);
    const id = parseId(req, 'invitation');
    const token = newToken();
    const row = await db.transaction(async (tx) => {
      const [inv] = await tx.select().from(invitations).where(eq(invitations.id, id)).for('update').limit(1);
      if (!inv) throw new HttpError(404, 'not_found', `No invitation with id ${id}.`);
      if (inv.acceptedAt) throw new HttpError(409, 'conflict', `${inv.email} has already accepted this invitation.`);
      if (inv.revokedAt) throw new HttpError(409, 'conflict', 'This invitation was withdrawn or replaced; send a new one.');
      // A new link and a new week; the old link stops working (its hash is gone).
      const [updated] = await tx
        .update(invitations)
        .set({ tokenHash: hashToken(token), expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000) })
        .where(eq(invitations.id, id))
        .returning();
      if (!updated) throw new Error('update returned no row');
      await writeAudit(tx, { actor: me.id, action: 'team.invitation_resent', subject: `invitation:${id}`, payload: { email: inv.email } });
      return updated;
    });
    const [withInviter] = await pendingInvitations().where(eq(invitations.id, id)).limit(1);
    const mailed = await mailInvitation(req, row, token, me.name);
    res.json(toInvitation(withInviter ?? { ...row, invitedBy: me.name }, mailed));
  });

  router.delete('/team/invitations/:id', admin, async (req, res) => {
    const me = requireUser(res);
    const id = parseId(req, 'invitation');
    await db.transaction(async (tx) => {
      const [inv] = await tx.select().from(invitations).where(eq(invitations.id, id)).for('update').limit(1);
      if (!inv) throw new HttpError(404, 'not_found', `No invitation with id ${id}.`);
      if (inv.acceptedAt) throw new HttpError(409, 'conflict', `${inv.email} has already accepted this invitation; deactivate the account instead.`);
      if (inv.revokedAt) return;
      await tx.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, id));
      await writeAudit(tx, { actor: me.id, action: 'team.invitation_withdrawn', subject: `invitation:${id}`, payload: { email: inv.email } });
    });
    res.status(204).end();
  });

  const actor = alias(users, 'actor');
  router.get('/team/audit', admin, async (req, res) => {
    const q = auditQuery.parse(req.query);
    const rows = await db
      .select({
        id: auditLog.id,
        at: auditLog.at,
        actor: auditLog.actor,
        actorName: actor.name,
        action: auditLog.action,
        subject: auditLog.subject,
        payload: auditLog.payload,
      })
      .from(auditLog)
      .leftJoin(actor, eq(actor.id, auditLog.actor))
      .where(q.before ? lt(auditLog.id, q.before) : undefined)
      .orderBy(desc(auditLog.id))
      .limit(q.limit + 1);
    const page = rows.slice(0, q.limit);
    const body: AuditPage = {
      entries: page.map((r) => ({ ...r, at: r.at.toISOString(), actorName: r.actorName ?? null })),
      nextBefore: rows.length > q.limit ? (page[page.length - 1]?.id ?? null) : null,
    };
    res.json(body);
  });

  return router;
}
