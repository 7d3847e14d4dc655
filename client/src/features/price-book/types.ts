import type { PriceBook } from '@pondwright/shared/pricing';

/** A version has taken effect (current), is waiting for its date (scheduled), or was replaced. */
export type PriceBookVersionStatus = 'current' | 'scheduled' | 'superseded';

/** One stored version of the company's price book; a change to the book makes a new one. */
export type PriceBookVersionSummary = {
  id: string;
  versionNumber: number;
  /** YYYY-MM-DD: estimates priced from this day on use this version. */
  effectiveDate: string;
  status?: PriceBookVersionStatus;
  authorName: string;
  note: string | null;
  createdAt: string;
  changeCount: number;
};

export type PriceBookVersion = Omit<PriceBookVersionSummary, 'changeCount'> & {
  book: PriceBook;
};

/** A bad CSV row as the import reports it; nothing is imported while any row is bad. */
export type CsvRowError = { field: string; message: string; line?: number; column?: string };
