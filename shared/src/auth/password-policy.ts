import { z } from 'zod';

/**
 * Password length limits.
 * NIST SP 800-63B §5.1.1.2: at least 8 characters, allow at least 64, no composition rules.
 * OWASP ASVS 4.0 V2.1.1–V2.1.2: at least 12 recommended, 8 the floor; at least 64 allowed, up to 128.
 * 128 is our ceiling so a bcrypt hash is never asked to digest megabytes (bcrypt itself reads 72 bytes).
 */
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;

/** Length rule only; the server also refuses passwords found in a list of commonly used ones. */
export const passwordSchema = z
  .string({ error: 'Enter a password' })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters`);
