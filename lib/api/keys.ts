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
  species: '/api/species',
  /** The library list (and its CSV export) for a filter; parameters left out when empty. */
  constants: (query: Record<string, string | undefined> = {}) => withQuery('/api/constants', query),
  constantsCsv: (query: Record<string, string | undefined> = {}) => withQuery('/api/constants/export.csv', query),
  constant: (id: number) => `/api/constants/${id}`,
  constantRevisions: (id: number) => `/api/constants/${id}/revisions`,
  constantReview: (id: number) => `/api/constants/${id}/review`,
  constantRetire: (id: number) => `/api/constants/${id}/retire`,
  constantsImport: '/api/constants/import',
  proposals: '/api/constants',
  buildSystem: '/api/systems/build',
  runs: '/api/runs',
  /** The runs list for a filter (bath, calculator, author, from, to); parameters left out when empty. */
  runsQuery: (query: Record<string, string | undefined> = {}) => withQuery('/api/runs', query),
  run: (id: string) => `/api/runs/${encodeURIComponent(id)}`,
  baths: (query: Record<string, string | undefined> = {}) => withQuery('/api/baths', query),
  bathsCreate: '/api/baths',
  bath: (id: string) => `/api/baths/${encodeURIComponent(id)}`,
  bathArchive: (id: string) => `/api/baths/${encodeURIComponent(id)}/archive`,
  bathRestore: (id: string) => `/api/baths/${encodeURIComponent(id)}/restore`,
  analyses: (bathId: string) => `/api/baths/${encodeURIComponent(bathId)}/analyses`,
  analysesImport: (bathId: string) => `/api/baths/${encodeURIComponent(bathId)}/analyses/import`,
  attachments: (bathId: string) => `/api/baths/${encodeURIComponent(bathId)}/attachments`,
  thresholds: '/api/safety/thresholds',
  thresholdsHistory: '/api/safety/thresholds/history',
  reviews: (status: string) => `/api/safety/reviews?status=${encodeURIComponent(status)}`,
  review: (id: string) => `/api/safety/reviews/${encodeURIComponent(id)}`,
  reviewAction: (id: string, action: 'sign-off' | 'send-back' | 'resubmit') => `/api/safety/reviews/${encodeURIComponent(id)}/${action}`,
  runRelease: (id: string) => `/api/runs/${encodeURIComponent(id)}/release`,
  attachment: (bathId: string, id: string) => `/api/baths/${encodeURIComponent(bathId)}/attachments/${encodeURIComponent(id)}`,
} as const;

/** A path with the non-empty query parameters in a stable order (so SWR keys match). */
function withQuery(path: string, query: Record<string, string | undefined>): string {
  const parts = Object.keys(query)
    .sort()
    .filter((k) => query[k] !== undefined && query[k] !== '')
    .map((k) => `${encodeURIComponent(k)}=${encodeURIComponent(query[k] as string)}`);
  return parts.length === 0 ? path : `${path}?${parts.join('&')}`;
}
