import { priceBookSchema, type PriceBook } from '@pondwright/shared/pricing';
import type { EntityManager } from 'typeorm';
import { todayIsoDate } from './effective-date';
import { PriceBookVersion } from './entities/price-book-version.entity';

export type NewPriceBookVersion = {
  companyId: string;
  authorId: string;
  book: PriceBook;
  effectiveDate?: string;
  note?: string;
};

/**
 * Appends the next version of a company's price book inside the caller's transaction. The book is checked
 * against the shared schema before every insert, and a per-company advisory lock makes `max + 1` safe, so
 * numbers never repeat or skip even when two owners save at once. Sign-up, the demo seed and the price-book
 * service all save through here.
 */
export async function savePriceBookVersion(
  manager: EntityManager,
  version: NewPriceBookVersion,
): Promise<PriceBookVersion> {
  const book = priceBookSchema.parse(version.book);
  await manager.query('SELECT pg_advisory_xact_lock(hashtextextended($1, 0))', [
    `price-book-version:${version.companyId}`,
  ]);
  const [{ next }] = (await manager.query(
    'SELECT coalesce(max(version_number), 0) + 1 AS next FROM price_book_versions WHERE company_id = $1',
    [version.companyId],
  )) as [{ next: number }];
  return manager.save(
    manager.create(PriceBookVersion, {
      companyId: version.companyId,
      authorId: version.authorId,
      versionNumber: Number(next),
      effectiveDate: version.effectiveDate ?? todayIsoDate(),
      note: version.note ?? '',
      content: book,
    }),
  );
}
