import { and, eq, isNull } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';

import { invitations, passwordResets, sessions, users, type UserRow } from '@/db/schema';
import { open, requireUser, signedIn } from '@/server/auth/access';
import { type AuthContext, RESET_MINUTES, trySend } from '@/server/auth/context';
import { hashPassword, verifyPassword } from '@/server/auth/passwords';
import { minutesText } from '@/server/auth/rate-limit';
import { endSession, startSession } from '@/server/auth/session';
import { hashToken, newId, newToken } from '@/server/auth/tokens';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { dateText, resetMail } from '@/server/mail/messages';
import {
  acceptInvitationSchema,
  changePasswordSchema,
  type InvitationInfo,
  newPasswordSchema,
  resetRequestSchema,
  type Role,
  signInSchema,
  tokenSchema,
  type TokenInfo,
  updateMeSchema,
  type User,
} from '@/shared/auth';

/** The same answer for a wrong password, an unknown e-mail and a deactivated account. */
const WRONG_CREDENTIALS = 'E-mail or password is wrong.';
const RESET_REQUESTED =
  'If an account exists for that address, a link to set a new password is on its way. It works once, within 1 hour.';

export function toUser(row: Pick<UserRow, 'id' | 'email' | 'name' | 'roles'>): User {
  return { id: row.id, email: row.email, name: row.name, roles: row.roles as Role[] };
}

function tokenParam(req: Request, what: 'invitation' | 'password link'): string {
  const parsed = tokenSchema.safeParse(req.params.token);
  if (!parsed.success) throw new HttpError(404, 'not_found', `This ${what} is not valid. Check that the whole link was copied from the mail.`);
  return parsed.data;
}

/** Why a stored invitation can no longer be used, or null if it can. */
function invitationProblem(row: { acceptedAt: Date | null; revokedAt: Date | null; expiresAt: Date }, now = new Date()): string | null {
  if (row.acceptedAt) return 'This invitation has already been used. Sign in, or ask an admin for a new invitation.';
  if (row.revokedAt) return 'This invitation was withdrawn or replaced by a newer one. Use the latest mail, or ask an admin for a new invitation.';
  if (row.expiresAt <= now) return `This invitation expired on ${dateText(row.expiresAt)}. Ask an admin to send a new one.`;
  return null;
}

function resetProblem(row: { usedAt: Date | null; expiresAt: Date }, now = new Date()): string | null {
  if (row.usedAt) return 'This link has already been used or was replaced by a newer one. Ask for a new link.';
  if (row.expiresAt <= now) return `This link expired at ${dateText(row.expiresAt)}. Ask for a new link.`;
  return null;
}

/** Sign-in, sign-out, the signed-in person, password resets and accepting invitations. */
export function authRouter(ctx: AuthContext): Router {
  const { db, lucia } = ctx;
  const router = Router();

  router.get('/auth/options', open, (_req, res) => {
    res.json({ outbox: ctx.outbox });
  });

  router.post('/auth/sign-in', open, async (req: Request, res: Response) => {
    const input = signInSchema.parse(req.body ?? {});
    const ip = req.ip ?? 'unknown';
    const wait = Math.max(ctx.signInByIp.blockedFor(ip), ctx.signInByAccount.blockedFor(input.email));
    if (wait > 0) {
      res.set('Retry-After', String(Math.ceil(wait / 1000)));
      throw new HttpError(429, 'rate_limited', `Too many sign-in attempts. Try again in ${minutesText(wait)}.`);
    }
    const [row] = await db.select().from(users).where(eq(users.email, input.email)).limit(1);
    const ok = await verifyPassword(row?.passwordHash ?? null, input.password);
    if (!row || !ok || !row.active) {
      ctx.signInByIp.hit(ip);
      ctx.signInByAccount.hit(input.email);
      const reason = !row ? 'unknown_email' : !ok ? 'wrong_password' : 'deactivated';
      await writeAudit(db, {
        actor: row?.id ?? 'anonymous',
        action: 'auth.sign_in_failed',
        subject: row ? `user:${row.id}` : null,
        payload: { email: input.email, ip, reason },
      });
      throw new HttpError(401, 'unauthenticated', WRONG_CREDENTIALS);
    }
    ctx.signInByAccount.clear(input.email);
    await db.transaction(async (tx) => {
      await tx.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, row.id));
      await writeAudit(tx, { actor: row.id, action: 'auth.sign_in', subject: `user:${row.id}`, payload: { email: row.email, ip } });
    });
    await startSession(lucia, res, row.id);
    res.json(toUser(row));
  });

  router.post('/auth/sign-out', open, async (_req, res) => {
    await endSession(lucia, res);
    res.status(204).end();
  });

  router.get('/me', signedIn, (_req, res) => {
    res.set('Cache-Control', 'no-store').json(requireUser(res));
  });

  router.patch('/me', signedIn, async (req, res) => {
    const me = requireUser(res);
    const input = updateMeSchema.parse(req.body ?? {});
    const [row] = await db.update(users).set({ name: input.name, updatedAt: new Date() }).where(eq(users.id, me.id)).returning();
    if (!row) throw new HttpError(404, 'not_found', 'Your account was not found.');
    res.json(toUser(row));
  });

  router.post('/me/password', signedIn, async (req, res) => {
    const me = requireUser(res);
    const input = changePasswordSchema.parse(req.body ?? {});
    const [row] = await db.select().from(users).where(eq(users.id, me.id)).limit(1);
    if (!row || !(await verifyPassword(row.passwordHash, input.currentPassword))) {
      const message = 'is not your current password';
      throw new HttpError(400, 'validation_failed', `currentPassword: ${message}`, [{ path: 'currentPassword', message }]);
    }
    const hash = await hashPassword(input.newPassword);
    const now = new Date();
    await db.transaction(async (tx) => {
      await tx.update(users).set({ passwordHash: hash, passwordChangedAt: now, updatedAt: now }).where(eq(users.id, me.id));
      await tx.delete(sessions).where(eq(sessions.userId, me.id));
      await tx.update(passwordResets).set({ usedAt: now }).where(and(eq(passwordResets.userId, me.id), isNull(passwordResets.usedAt)));
      await writeAudit(tx, { actor: me.id, action: 'auth.password_changed', subject: `user:${me.id}`, payload: { email: me.email } });
    });
    res.locals.session = null;
    await startSession(lucia, res, me.id);
    res.json(me);
  });

  router.post('/me/sign-out-everywhere', signedIn, async (_req, res) => {
    const me = requireUser(res);
    await lucia.invalidateUserSessions(me.id);
    res.locals.session = null;
    await writeAudit(db, { actor: me.id, action: 'auth.signed_out_everywhere', subject: `user:${me.id}`, payload: { email: me.email } });
    await endSession(lucia, res);
    res.status(204).end();
  });

  // Asking for a reset link: the same answer, at once, whether or not the address has an account;
  // the work (and the mail) happens after the answer has gone.
  router.post('/auth/password-resets', open, async (req, res) => {
    const { email } = resetRequestSchema.parse(req.body ?? {});
    const ip = req.ip ?? 'unknown';
    const base = ctx.publicUrl(req);
    res.status(202).json({ message: RESET_REQUESTED });
    try {
      const limited = ctx.resetByIp.blockedFor(ip) > 0 || ctx.resetByAccount.blockedFor(email) > 0;
      ctx.resetByIp.hit(ip);
      ctx.resetByAccount.hit(email);
      const [row] = await db.select().from(users).where(eq(users.email, email)).limit(1);
      if (!row || !row.active || limited) {
        await writeAudit(db, {
          actor: 'anonymous',
          action: 'auth.password_reset_requested',
          subject: row ? `user:${row.id}` : null,
          payload: { email, ip, sent: false, reason: !row ? 'unknown_email' : !row.active ? 'deactivated' : 'rate_limited' },
        });
        return;
      }
      const token = newToken();
      const now = new Date();
      const expiresAt = new Date(now.getTime() + RESET_MINUTES * 60_000);
      await db.transaction(async (tx) => {
        await tx.update(passwordResets).set({ usedAt: now }).where(and(eq(passwordResets.userId, row.id), isNull(passwordResets.usedAt)));
        await tx.insert(passwordResets).values({ id: newId(), userId: row.id, tokenHash: hashToken(token), expiresAt });
        await writeAudit(tx, { actor: 'anonymous', action: 'auth.password_reset_requested', subject: `user:${row.id}`, payload: { email, ip, sent: true } });
      });
      await trySend(ctx, resetMail({ to: row.email, name: row.name, link: `${base}/new-password/${token}`, expiresAt }), 'password reset');
    } catch (err) {
      ctx.logger.error({ err }, 'password reset request failed after the answer was sent');
    }
  });

  router.get('/auth/password-resets/:token', open, async (req, res) => {
    const token = tokenParam(req, 'password link');
    const [row] = await db
      .select({ usedAt: passwordResets.usedAt, expiresAt: passwordResets.expiresAt, email: users.email, active: users.active })
      .from(passwordResets)
      .innerJoin(users, eq(users.id, passwordResets.userId))
      .where(eq(passwordResets.tokenHash, hashToken(token)))
      .limit(1);
    if (!row) throw new HttpError(404, 'not_found', 'This password link is not valid. Check that the whole link was copied from the mail, or ask for a new one.');
    const problem = resetProblem(row) ?? (row.active ? null : 'This account has been deactivated. Ask an admin.');
    if (problem) throw new HttpError(410, 'gone', problem);
    const info: TokenInfo = { email: row.email, expiresAt: row.expiresAt.toISOString() };
    res.set('Cache-Control', 'no-store').json(info);
  });

  router.post('/auth/password-resets/:token', open, async (req, res) => {
    const token = tokenParam(req, 'password link');
    const { password } = newPasswordSchema.parse(req.body ?? {});
    const hash = await hashPassword(password);
    const user = await db.transaction(async (tx) => {
      const [link] = await tx.select().from(passwordResets).where(eq(passwordResets.tokenHash, hashToken(token))).for('update').limit(1);
      if (!link) throw new HttpError(404, 'not_found', 'This password link is not valid. Ask for a new one.');
      const problem = resetProblem(link);
      if (problem) throw new HttpError(410, 'gone', problem);
      const now = new Date();
      const [row] = await tx
        .update(users)
        .set({ passwordHash: hash, passwordChangedAt: now, updatedAt: now })
        .where(and(eq(users.id, link.userId), eq(users.active, true)))
        .returning();
      if (!row) throw new HttpError(410, 'gone', 'This account has been deactivated. Ask an admin.');
      await tx.update(passwordResets).set({ usedAt: now }).where(and(eq(passwordResets.userId, row.id), isNull(passwordResets.usedAt)));
      await tx.delete(sessions).where(eq(sessions.userId, row.id));
      await writeAudit(tx, { actor: row.id, action: 'auth.password_reset', subject: `user:${row.id}`, payload: { email: row.email } });
      return row;
    });
    res.locals.session = null;
    ctx.signInByAccount.clear(user.email);
    await startSession(lucia, res, user.id);
    res.json(toUser(user));
  });

  router.get('/auth/invitations/:token', open, async (req, res) => {
    const token = tokenParam(req, 'invitation');
    const [row] = await db
      .select({
        email: invitations.email,
        roles: invitations.roles,
        expiresAt: invitations.expiresAt,
        acceptedAt: invitations.acceptedAt,
        revokedAt: invitations.revokedAt,
        invitedBy: users.name,
      })
      .from(invitations)
      .innerJoin(users, eq(users.id, invitations.invitedBy))
      .where(eq(invitations.tokenHash, hashToken(token)))
      .limit(1);
    if (!row) throw new HttpError(404, 'not_found', 'This invitation link is not valid. Check that the whole link was copied from the mail, or ask an admin for a new one.');
    const problem = invitationProblem(row);
    if (problem) throw new HttpError(410, 'gone', problem);
    const info: InvitationInfo = { email: row.email, roles: row.roles as Role[], invitedBy: row.invitedBy, expiresAt: row.expiresAt.toISOString() };
    res.set('Cache-Control', 'no-store').json(info);
  });

  router.post('/auth/invitations/:token', open, async (req, res) => {
    const token = tokenParam(req, 'invitation');
    const input = acceptInvitationSchema.parse(req.body ?? {});
    const hash = await hashPassword(input.password);
    const user = await db.transaction(async (tx) => {
      const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).for('update').limit(1);
      if (!inv) throw new HttpError(404, 'not_found', 'This invitation link is not valid. Ask an admin for a new one.');
      const problem = invitationProblem(inv);
      if (problem) throw new HttpError(410, 'gone', problem);
      const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, inv.email)).limit(1);
      if (existing) throw new HttpError(409, 'conflict', `An account for ${inv.email} already exists. Sign in, or ask for a password link.`);
      const now = new Date();
      const [row] = await tx
        .insert(users)
        .values({ id: newId(), email: inv.email, name: input.name, passwordHash: hash, roles: inv.roles, lastSignInAt: now })
        .returning();
      if (!row) throw new Error('insert returned no row');
      await tx.update(invitations).set({ acceptedAt: now, acceptedUserId: row.id }).where(eq(invitations.id, inv.id));
      await writeAudit(tx, { actor: row.id, action: 'auth.invitation_accepted', subject: `user:${row.id}`, payload: { email: inv.email, invitation: inv.id, roles: inv.roles } });
      return row;
    });
    res.locals.session = null;
    await startSession(lucia, res, user.id);
    res.status(201).json(toUser(user));
  });

  return router;
}
