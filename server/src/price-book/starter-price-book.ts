import { demoPriceBook } from '@pondwright/shared/pricing';
import type { EntityManager } from 'typeorm';
import { PriceBookVersion } from './entities/price-book-version.entity';
import { savePriceBookVersion } from './save-price-book-version';

export const STARTER_PRICE_BOOK_NOTE =
  'Starter price book with invented prices — replace them with your own';

/**
 * Gives a company without a price book the starter book as version 1, authored by its owner, so an
 * estimator can price from the first day. Leaves a company that has any version alone.
 */
export async function addStarterPriceBook(
  manager: EntityManager,
  companyId: string,
  ownerId: string,
): Promise<PriceBookVersion | null> {
  if (await manager.existsBy(PriceBookVersion, { companyId })) return null;
  return savePriceBookVersion(manager, {
    companyId,
    authorId: ownerId,
    book: demoPriceBook(),
    note: STARTER_PRICE_BOOK_NOTE,
  });
}
