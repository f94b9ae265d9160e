import { z } from 'zod';

// Sign-in, the team and its roles: the request and response shapes shared by the client and the
// server. Routes (all under /api):
//   POST   /auth/sign-in                      {email, password}        -> User, sets the session cookie
//   POST   /auth/sign-out                                             -> 204, clears the cookie
//   GET    /me                                                        -> User, or 401
//   PATCH  /me                                {name}                  -> User
//   POST   /me/password                       {currentPassword, newPassword} -> User (other sessions ended)
//   POST   /me/sign-out-everywhere                                    -> 204 (every session ended)
//   POST   /auth/password-resets              {email}                 -> 202 ResetRequested (same answer for any e-mail)
//   GET    /auth/password-resets/:token                               -> TokenInfo, or 410 when used or expired
//   POST   /auth/password-resets/:token       {password}              -> User, signed in
//   GET    /auth/invitations/:token                                   -> InvitationInfo, or 410
//   POST   /auth/invitations/:token           {name, password}        -> User, signed in
//   GET    /auth/options                                              -> AuthOptions (public)
//   GET    /team/people                       (admin)                 -> Person[]
//   PATCH  /team/people/:id                   (admin) {roles?, active?} -> Person
//   GET    /team/invitations                  (admin)                 -> Invitation[] (pending)
//   POST   /team/invitations                  (admin) {email, roles}  -> 201 Invitation (mail sent)
//   POST   /team/invitations/:id/resend       (admin)                 -> Invitation (new link, old one void)
//   DELETE /team/invitations/:id              (admin)                 -> 204 (withdrawn)
//   GET    /team/audit?limit=&before=         (admin)                 -> AuditPage
//   GET    /dev/outbox                        (admin, no SMTP_URL)    -> OutboxMessage[] (newest first)

/** The roles of DESIGN.md; a person may hold several. */
export const ROLES = ['chemist', 'technician', 'reviewer', 'safety', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** What each role is for, for screens that let an admin choose. */
export const ROLE_LABELS: Record<Role, { label: string; does: string }> = {
  chemist: { label: 'Chemist', does: 'Baths, analyses, every calculator, saved runs; proposes constants' },
  technician: { label: 'Technician', does: 'Baths and runs of their own site; no constants proposals' },
  reviewer: { label: 'Reviewer', does: 'Reviews proposed constants: approves, rejects, retires' },
  safety: { label: 'Safety officer', does: 'The safety desk: signs off flagged work or sends it back' },
  admin: { label: 'Admin', does: 'Invites people, sets roles, sees the audit log' },
};

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;
export const NAME_MAX = 100;

export const roleSchema = z.enum(ROLES, { error: `must be one of ${ROLES.join(', ')}` });

export const emailSchema = z
  .string({ error: 'enter an e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, 'is too long for an e-mail address')
  .pipe(z.email({ error: 'is not an e-mail address (for example name@example.com)' }));

export const passwordSchema = z
  .string({ error: 'enter a password' })
  .min(PASSWORD_MIN, `must be at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `must be at most ${PASSWORD_MAX} characters`);

export const nameSchema = z
  .string({ error: 'enter a name' })
  .trim()
  .min(1, 'enter a name')
  .max(NAME_MAX, `must be at most ${NAME_MAX} characters`);

/** A one-time token from a mailed link (base64url). */
export const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'is not a valid link token');

export const signInSchema = z.object({
  email: emailSchema,
  // No length rule at sign-in: a wrong password gets the same answer whatever its length.
  password: z.string({ error: 'enter your password' }).min(1, 'enter your password').max(PASSWORD_MAX, 'is too long'),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
});
export type User = z.infer<typeof userSchema>;

export const updateMeSchema = z.object({ name: nameSchema });

export const changePasswordSchema = z
  .object({
    currentPassword: z.string({ error: 'enter your current password' }).min(1, 'enter your current password').max(PASSWORD_MAX),
    newPassword: passwordSchema,
  })
  .refine((v) => v.currentPassword !== v.newPassword, { path: ['newPassword'], message: 'must differ from the current password' });

export const resetRequestSchema = z.object({ email: emailSchema });
export const resetRequestedSchema = z.object({ message: z.string() });

export const newPasswordSchema = z.object({ password: passwordSchema });

export const acceptInvitationSchema = z.object({ name: nameSchema, password: passwordSchema });

export const tokenInfoSchema = z.object({ email: z.string(), expiresAt: z.string() });
export type TokenInfo = z.infer<typeof tokenInfoSchema>;

export const invitationInfoSchema = z.object({
  email: z.string(),
  roles: z.array(roleSchema),
  invitedBy: z.string(),
  expiresAt: z.string(),
});
export type InvitationInfo = z.infer<typeof invitationInfoSchema>;

export const authOptionsSchema = z.object({
  /** True when mail goes to the local fake SMTP server and admins can read it on the outbox screen. */
  outbox: z.boolean(),
});
export type AuthOptions = z.infer<typeof authOptionsSchema>;

const rolesListSchema = z
  .array(roleSchema, { error: 'give a list of roles' })
  .min(1, 'give at least one role')
  .refine((list) => new Set(list).size === list.length, 'lists a role twice');

export const personSchema = userSchema.extend({
  active: z.boolean(),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type Person = z.infer<typeof personSchema>;

export const updatePersonSchema = z
  .object({ roles: rolesListSchema.optional(), active: z.boolean({ error: 'must be true or false' }).optional() })
  .refine((v) => v.roles !== undefined || v.active !== undefined, 'give roles or active');
export type UpdatePersonInput = z.infer<typeof updatePersonSchema>;

export const inviteSchema = z.object({ email: emailSchema, roles: rolesListSchema });
export type InviteInput = z.infer<typeof inviteSchema>;

export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  roles: z.array(roleSchema),
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
  /** On create and resend: whether the mail server accepted the message. */
  mailed: z.boolean().optional(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const auditEntrySchema = z.object({
  id: z.number(),
  at: z.string(),
  actor: z.string(),
  /** The actor's name when the actor is a person. */
  actorName: z.string().nullable(),
  action: z.string(),
  subject: z.string().nullable(),
  payload: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
export const auditPageSchema = z.object({ entries: z.array(auditEntrySchema), nextBefore: z.number().nullable() });
export type AuditPage = z.infer<typeof auditPageSchema>;

export const outboxMessageSchema = z.object({
  id: z.number(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const peopleSchema = z.array(personSchema);
export const invitationsSchema = z.array(invitationSchema);
export const outboxSchema = z.array(outboxMessageSchema);

/** Whether a user holds any of the roles. */
export function hasRole(user: Pick<User, 'roles'> | null | undefined, ...roles: Role[]): boolean {
  return !!user && roles.some((r) => user.roles.includes(r));
}
