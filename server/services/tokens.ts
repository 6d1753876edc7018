import { createHash, randomBytes } from 'node:crypto';

/** A fresh random token for a link, and the hash that is stored instead of it. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

/** Only hashes are stored, so a database leak does not leak working links. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
