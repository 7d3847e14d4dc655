import type Decimal from 'decimal.js';
import type { PriceCategory } from './price-book-schema';
import type { LineKind, PricedLine } from './priced-estimate-schema';
import {
  formatMoney,
  formatPercent,
  formatUnitCost,
  MONEY_ROUNDING,
  percentToFraction,
  PricingDecimal,
  roundMoney,
  roundUnitCost,
  toDecimal,
} from './money';

/** A line before it is priced: what, how many and at what unit cost. */
export type LineDraft = {
  id: string;
  category: PriceCategory;
  description: string;
  code: string | null;
  /** Already rounded as the line's source states (see `roundQuantity`). */
  quantity: Decimal;
  unit: string;
  unitCost: Decimal;
  taxable: boolean;
  source: string;
  kind: LineKind;
  optionId: string | null;
};

/**
 * A takeoff figure rounded half up to `decimals` places for pricing, e.g. tons to 0.01, hours to 0.1.
 * Figures the engine already rounds (it rounds each once as it leaves) come through unchanged.
 */
export function roundQuantity(value: number | Decimal, decimals: number): Decimal {
  return new PricingDecimal(value).toDecimalPlaces(decimals, MONEY_ROUNDING);
}

/**
 * Prices one line: extended cost = quantity × unit cost (the unit cost first rounded half up to 4
 * decimals, as shown), rounded half up to cents; price = extended cost × (1 + markup %), rounded half
 * up to cents. Rounding happens here and only here, so each line checks with a pencil and every total
 * is the plain sum of its lines.
 *
 * @param markupPct the category's markup % from the price book's policy, e.g. "35".
 */
export function priceLine(draft: LineDraft, markupPct: string): PricedLine {
  const unitCost = roundUnitCost(draft.unitCost);
  const extended = roundMoney(draft.quantity.times(unitCost));
  const price = roundMoney(extended.times(percentToFraction(markupPct).plus(1)));
  return {
    id: draft.id,
    category: draft.category,
    description: draft.description,
    code: draft.code,
    quantity: draft.quantity.isZero() ? '0' : draft.quantity.toFixed(),
    unit: draft.unit,
    unitCost: formatUnitCost(unitCost),
    extendedCost: formatMoney(extended),
    markupPct: formatPercent(toDecimal(markupPct)),
    price: formatMoney(price),
    taxable: draft.taxable,
    kind: draft.kind,
    source: draft.source,
    optionId: draft.optionId,
  };
}
