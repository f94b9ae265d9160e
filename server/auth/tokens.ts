import { createHash, randomBytes, randomUUID } from 'node:crypto';

/** A one-time token for a mailed link: 32 random bytes, base64url (43 characters). */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the database keeps of a token: its SHA-256, hex. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** A new row id. */
export function newId(): string {
  return randomUUID();
}
