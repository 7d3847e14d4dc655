import type { QuoteView } from '@pondwright/shared';

/**
 * What the link was sent for: the quote itself, a change order on the job made from it, or the job's
 * final invoice. The last two come after the quote was accepted, so `view.state` says nothing about
 * them: a change order has its own `state`, an invoice its own `status`.
 */
export type LinkKind = 'quote' | 'change' | 'invoice';

export function linkKind(view: QuoteView): LinkKind {
  if (view.invoice) return 'invoice';
  if (view.changeOrder) return 'change';
  return 'quote';
}
