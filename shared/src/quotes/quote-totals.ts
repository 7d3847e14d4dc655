import {
  formatMoney,
  percentToFraction,
  PricingDecimal,
  roundMoney,
  toDecimal,
} from '../pricing/money';
import type { QuoteOption } from './quote-schemas';

export type QuoteSelectionTotals = {
  /** The options counted, in the quote's order (unknown ids are ignored). */
  optionIds: string[];
  optionsPrice: string;
  optionsTax: string;
  total: string;
  deposit: string;
  balance: string;
};

/**
 * The quote's total with the homeowner's choices, as the page shows it live and the server records it
 * on acceptance:
 * - total = base total (tax included) + Σ over chosen options of (option price + option tax);
 * - deposit = deposit % × total, rounded half up to cents (as `estimateTotals` rounds the base deposit);
 * - balance = total − deposit, due on completion.
 * Options are independent choices: an alternate is priced by the estimator as what it adds to the base.
 */
export function quoteSelectionTotals(args: {
  baseTotal: string;
  depositPct: string;
  options: ReadonlyArray<Pick<QuoteOption, 'id' | 'price' | 'tax'>>;
  chosenIds: ReadonlyArray<string>;
}): QuoteSelectionTotals {
  const chosen = args.options.filter((option) => args.chosenIds.includes(option.id));
  const optionsPrice = chosen.reduce(
    (sum, o) => sum.plus(toDecimal(o.price)),
    new PricingDecimal(0),
  );
  const optionsTax = chosen.reduce((sum, o) => sum.plus(toDecimal(o.tax)), new PricingDecimal(0));
  const total = toDecimal(args.baseTotal).plus(optionsPrice).plus(optionsTax);
  const deposit = roundMoney(total.times(percentToFraction(args.depositPct)));
  return {
    optionIds: chosen.map((option) => option.id),
    optionsPrice: formatMoney(optionsPrice),
    optionsTax: formatMoney(optionsTax),
    total: formatMoney(total),
    deposit: formatMoney(deposit),
    balance: formatMoney(total.minus(deposit)),
  };
}
