/** Every API path the client reads, built in one place so SWR cache keys never drift apart. */
export const keys = {
  health: '/api/health',
  me: '/api/me',
  mePassword: '/api/me/password',
  signOutEverywhere: '/api/me/sign-out-everywhere',
  signIn: '/api/auth/sign-in',
  signOut: '/api/auth/sign-out',
  authOptions: '/api/auth/options',
  passwordResets: '/api/auth/password-resets',
  passwordReset: (token: string) => `/api/auth/password-resets/${encodeURIComponent(token)}`,
  invitationToken: (token: string) => `/api/auth/invitations/${encodeURIComponent(token)}`,
  people: '/api/team/people',
  person: (id: string) => `/api/team/people/${encodeURIComponent(id)}`,
  invitations: '/api/team/invitations',
  invitation: (id: string) => `/api/team/invitations/${encodeURIComponent(id)}`,
  invitationResend: (id: string) => `/api/team/invitations/${encodeURIComponent(id)}/resend`,
  /** One page of the audit log, newest first; `before` is the previous page's `nextBefore`. */
  audit: (limit: number, before?: number | null) =>
    before == null ? `/api/team/audit?limit=${limit}` : `/api/team/audit?limit=${limit}&before=${before}`,
  outbox: '/api/dev/outbox',
} as const;
