/** Every API path the client reads, built in one place so SWR cache keys never drift apart. */
export const keys = {
  health: '/api/health',
} as const;
