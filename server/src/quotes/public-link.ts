import type { EntityManager } from 'typeorm';
import { hashToken } from '../auth/secure-token';
import { AppError } from '../common/errors/app-error';
import { Company } from '../companies/entities/company.entity';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { QuoteLink } from './entities/quote-link.entity';
import { expireLapsedQuotes } from './quote-expiry';

/** Who is on the other end of a public request, for the acceptance record. */
export type RequestMeta = { ip: string; userAgent: string };

/** A token as `newSecureToken` makes them: 32 random bytes in base64url. */
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/**
 * The link for a token, of any kind (quote, change order, final invoice): 404 when unknown; 410 when
 * revoked or expired, except that a link the homeowner accepted through keeps working past its expiry
 * (for the deposit, the PDF and the record). The token is looked up by its SHA-256, so the database
 * never holds a usable link.
 */
export async function usableLink(manager: EntityManager, token: string): Promise<QuoteLink> {
  const link = TOKEN_PATTERN.test(token)
    ? await manager.findOneBy(QuoteLink, { tokenHash: hashToken(token) })
    : null;
  if (!link) {
    throw new AppError(
      'QUOTE_NOT_FOUND',
      'We could not find this quote. Check that the whole link was copied from the e-mail.',
    );
  }
  // The company is named only in the refusals: a usable link (every poll of the page) skips the read.
  const companyName = async () =>
    (await manager.findOneByOrFail(Company, { id: link.companyId })).name;
  if (link.revokedAt) {
    throw new AppError(
      'QUOTE_LINK_REVOKED',
      `This link was withdrawn by ${await companyName()}, usually because the quote was updated. Ask them for the current one.`,
    );
  }
  if (link.expiresAt.getTime() <= Date.now()) {
    const acceptedHere = await manager.existsBy(QuoteAcceptance, { linkId: link.id });
    if (!acceptedHere) {
      await expireLapsedQuotes(manager, link.estimateId);
      throw new AppError(
        'QUOTE_LINK_EXPIRED',
        `This quote expired on ${link.expiresAt.toISOString().slice(0, 10)}. Ask ${await companyName()} for an updated one.`,
      );
    }
  }
  return link;
}

/**
 * The HTTP status the quote page itself is served with: 200 for a usable link, else the API's 404 or
 * 410, so a dead link is a dead page to browsers and crawlers too (the page still explains it).
 */
export async function linkPageStatus(
  manager: EntityManager,
  token: string,
): Promise<200 | 404 | 410> {
  try {
    await usableLink(manager, token);
    return 200;
  } catch (error) {
    if (error instanceof AppError && (error.status === 404 || error.status === 410)) {
      return error.status;
    }
    throw error;
  }
}
