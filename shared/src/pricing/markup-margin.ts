import { z } from 'zod';
import { formatPercent, PricingDecimal, toDecimal } from './money';
import { markupPercentSchema } from './price-book-schema';

/**
 * A gross margin a company aims for, %: 0 up to (but never) 100 with at most 2 decimals. A 100 %
 * margin would need an infinite markup (a price with no cost in it), so the schema refuses it;
 * validate form fields with this before calling `marginToMarkupPct`.
 */
export const marginPercentSchema = z
  .string({ error: 'Enter a margin' })
  .trim()
  .regex(/^\d{1,2}(\.\d{1,2})?$/, 'Enter a margin such as 20 or 33.33 (below 100)');

/**
 * The gross margin a markup gives: margin = markup ÷ (1 + markup), as percentages of price and cost.
 * A 25 % markup is a 20 % margin; 50 % → 33.33 %; 100 % → 50 % (arithmetic; TRADE.md, "Markup is not
 * margin"). Computed exactly; the result is rounded once, half up, to 2 decimals for display
 * (`"33.33"`). Pricing itself only ever uses the markup, never this rounded margin.
 *
 * @param markupPct a markup %, e.g. "25" (`markupPercentSchema`: 0–1000, at most 2 decimals).
 * @throws RangeError when `markupPct` is not such a string.
 */
export function markupToMarginPct(markupPct: string): string {
  if (!markupPercentSchema.safeParse(markupPct).success) {
    throw new RangeError(`Not a markup percentage: "${markupPct}"`);
  }
  const markup = toDecimal(markupPct);
  return formatPercent(markup.times(100).dividedBy(markup.plus(100)));
}

/**
 * The markup that gives a gross margin: markup = margin ÷ (1 − margin), as percentages of cost and
 * price. 20 % margin → 25 % markup; 33.33 % → 49.99 %; 50 % → 100 % (arithmetic). Exact, then rounded
 * once, half up, to 2 decimals (`"49.99"`); a displayed margin rounded to 2 decimals therefore does not
 * always lead back to the round markup it came from (33.33 % is not exactly a third).
 *
 * @param marginPct a margin %, 0 ≤ margin < 100 with at most 2 decimals (`marginPercentSchema`).
 * @throws RangeError for a margin the schema refuses (100 % or more has no markup); check user input
 *         with `marginPercentSchema` first.
 */
export function marginToMarkupPct(marginPct: string): string {
  if (!marginPercentSchema.safeParse(marginPct).success) {
    throw new RangeError(`Not a margin below 100 %: "${marginPct}"`);
  }
  const margin = toDecimal(marginPct);
  return formatPercent(margin.times(100).dividedBy(new PricingDecimal(100).minus(margin)));
}
