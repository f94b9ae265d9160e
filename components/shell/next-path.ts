/** Where the app goes after sign-in when no destination was kept. */
export const HOME_PATH = '/baths';

const PUBLIC_PREFIXES = ['/sign-in', '/forgot-password', '/new-password', '/welcome'];

/** A safe in-app destination from a `next` parameter: a local path outside the public screens, else home. */
export function safeNext(next: unknown): string {
  const value = Array.isArray(next) ? next[0] : next;
  if (typeof value !== 'string' || !value.startsWith('/') || value.startsWith('//') || value.includes('\\')) {
    return HOME_PATH;
  }
  if (value === '/' || PUBLIC_PREFIXES.some((p) => value === p || value.startsWith(`${p}/`) || value.startsWith(`${p}?`))) {
    return HOME_PATH;
  }
  return value;
}

