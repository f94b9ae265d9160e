import type { Request } from 'express';
import type pino from 'pino';

import type { Db } from '@/db/client';
import type { AuthLucia } from '@/server/auth/lucia';
import { SlidingWindow } from '@/server/auth/rate-limit';
import type { Mailer } from '@/server/mail/mailer';

/** Sign-in limits: failed attempts per account and per IP address within a window. */
export type SignInLimits = { perAccount: number; perIp: number; windowMinutes: number };

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { perAccount: 5, perIp: 20, windowMinutes: 15 };

/** What the auth, team and outbox routes share. */
export type AuthContext = {
  db: Db;
  lucia: AuthLucia;
  /** null: no mail can be sent (production without SMTP_URL). */
  mailer: Mailer | null;
  /** True when mail goes to the local fake SMTP server (the outbox screen exists). */
  outbox: boolean;
  logger: pino.Logger;
  /** Base URL for links in mail, e.g. https://ligandry.example.com. */
  publicUrl: (req: Request) => string;
  signInByAccount: SlidingWindow;
  signInByIp: SlidingWindow;
  resetByAccount: SlidingWindow;
  resetByIp: SlidingWindow;
};

/** Invitations last 7 days; password-reset links 1 hour. */
export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;

export function limiters(limits: SignInLimits) {
  const windowMs = limits.windowMinutes * 60_000;
  return {
    signInByAccount: new SlidingWindow(limits.perAccount, windowMs),
    signInByIp: new SlidingWindow(limits.perIp, windowMs),
    // Reset mails: 3 per address and 30 per IP an hour, so nobody can flood a mailbox.
    resetByAccount: new SlidingWindow(3, 3_600_000),
    resetByIp: new SlidingWindow(30, 3_600_000),
  };
}

/** Sends a mail; logs and returns false when it could not (the action itself stands). */
export async function trySend(ctx: AuthContext, message: Parameters<Mailer['send']>[0], what: string): Promise<boolean> {
  if (!ctx.mailer) {
    ctx.logger.warn({ what }, 'mail not sent: no SMTP_URL configured');
    return false;
  }
  try {
    await ctx.mailer.send(message);
    return true;
  } catch (err) {
    ctx.logger.error({ err, what }, 'mail could not be sent');
    return false;
  }
}
