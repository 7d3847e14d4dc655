import { createHash, randomBytes } from 'node:crypto';

/** A 256-bit random token for links and cookies; only its hash is ever stored. */
export function newSecureToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
