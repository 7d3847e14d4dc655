import type { QuoteView } from '@pondwright/shared';

/** The change order a link carries, with its own answer (the quote itself was accepted before). */
export type QuoteChangeOrder = NonNullable<QuoteView['changeOrder']>;

/** A change that takes off more than it adds: the homeowner's price goes down. */
export function isCredit(change: QuoteChangeOrder): boolean {
  // Only the sign is read; the figure itself comes from the server.
  return Number(change.total) < 0;
}

/** A credit's amount as the homeowner reads it, "1174.58" for a total of "-1174.58". */
export function creditAmount(change: QuoteChangeOrder): string {
  return change.total.replace(/^-/, '');
}
