import * as bcrypt from 'bcryptjs';

/** bcrypt cost 12: about a quarter of a second per hash on a small server (OWASP Password Storage Cheat Sheet). */
export const BCRYPT_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password.
const UNKNOWN_USER_HASH = bcrypt.hashSync('no user has this password', BCRYPT_COST);

export function verifyPassword(password: string, hash: string | undefined): Promise<boolean> {
  return bcrypt.compare(password, hash ?? UNKNOWN_USER_HASH);
}
