import { ROLE_LABELS, type Role } from '@/shared/auth';

import type { MailMessage } from './mailer';

export const SIGNATURE = '\n\n-- \nLigandry\nThis message was sent automatically; replies are not read.';

/** A moment as people read it in mail and messages: 2026-12-09 01:30 UTC. */
export function dateText(d: Date): string {
  return d.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
}

export function invitationMail(input: { to: string; inviter: string; roles: Role[]; link: string; expiresAt: Date }): MailMessage {
  const roles = input.roles.map((r) => ROLE_LABELS[r].label).join(', ');
  return {
    to: input.to,
    subject: `${input.inviter} invited you to Ligandry`,
    text:
      `${input.inviter} has invited you to the team on Ligandry as: ${roles}.\n\n` +
      `Choose your name and password here (the link works once, until ${dateText(input.expiresAt)}):\n\n${input.link}\n\n` +
      'If you did not expect this invitation you can ignore this message.' +
      SIGNATURE,
  };
}

export function resetMail(input: { to: string; name: string; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: 'Set a new Ligandry password',
    text:
      `Hello ${input.name},\n\nsomeone (we hope you) asked to set a new password for ${input.to} on Ligandry.\n\n` +
      `Set it here (the link works once, until ${dateText(input.expiresAt)}):\n\n${input.link}\n\n` +
      'If you did not ask for this, ignore this message: your password stays as it is.' +
      SIGNATURE,
  };
}
