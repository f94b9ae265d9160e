import { type AuditEntry } from '@/shared/auth';

/** Plain words for the audit action codes the server writes; unknown codes are shown as they are. */
export const ACTION_WORDS: Record<string, string> = {
  'auth.sign_in': 'Signed in',
  'auth.sign_in_failed': 'Failed to sign in',
  'auth.signed_out_everywhere': 'Signed out on every device',
  'auth.password_reset_requested': 'Asked for a password reset link',
  'auth.password_reset': 'Set a new password through a reset link',
  'auth.password_changed': 'Changed their password',
  'auth.invitation_accepted': 'Accepted an invitation and joined',
  'team.invited': 'Invited someone',
  'team.invitation_resent': 'Sent an invitation again',
  'team.invitation_withdrawn': 'Withdrew an invitation',
  'team.roles_changed': 'Changed roles',
  'team.deactivated': 'Deactivated someone',
  'team.reactivated': 'Reactivated someone',
};

/** What happened, in words. */
export function actionWords(action: string): string {
  return ACTION_WORDS[action] ?? action;
}

/** Who did it: the person's name when the actor is a person, else the actor as recorded. */
export function actorWords(entry: AuditEntry): string {
  return entry.actorName ?? entry.actor;
}

/** What it was done to: the e-mail the entry names when there is one (more readable than "user:<id>"), else the subject as recorded. */
export function subjectWords(entry: AuditEntry): string | null {
  const email = entry.payload.email;
  return typeof email === 'string' && email ? email : entry.subject;
}

function valueWords(value: unknown): string | null {
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value) && value.every((v) => typeof v === 'string' || typeof v === 'number')) return value.join(', ');
  return null;
}

/** The payload's simple values as "key: value" pairs (the e-mail, shown as the subject, left out), for a line of detail. */
export function payloadWords(payload: AuditEntry['payload']): string {
  return Object.entries(payload)
    .filter(([key]) => key !== 'email')
    .map(([key, value]) => {
      const words = valueWords(value);
      return words === null ? null : `${key}: ${words}`;
    })
    .filter((part): part is string => part !== null)
    .join(' · ');
}
