import { Argon2id } from 'oslo/password';

// Argon2id with oslo's defaults (19 MiB, 2 passes, 1 lane: the OWASP minimum); about 100 ms a hash.
const argon2id = new Argon2id();

/** A hash of nothing anyone can type, verified against when the e-mail is unknown so both answers take as long. */
let decoy: Promise<string> | null = null;

export function hashPassword(password: string): Promise<string> {
  return argon2id.hash(password);
}

/** Checks a password against a stored hash; with no hash, spends the same time and says no. */
export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (hash === null) {
    decoy ??= argon2id.hash(`decoy-${Math.random()}`);
    await argon2id.verify(await decoy, password);
    return false;
  }
  try {
    return await argon2id.verify(hash, password);
  } catch {
    return false;
  }
}
