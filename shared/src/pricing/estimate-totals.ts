import { allocate } from './allocate';
import {
  formatMoney,
  formatPercent,
  percentToFraction,
  PricingDecimal,
  roundMoney,
  sumDecimals,
  toDecimal,
} from './money';
import type { PriceBook } from './price-book-schema';
import type { PricedEstimate, PricedLine } from './priced-estimate-schema';

/**
 * The totals of a base estimate from its priced lines (all money already rounded to cents at the line):
 * - subtotal cost = Σ extended cost; subtotal price = Σ price;
 * - discount = discount % × subtotal price, rounded half up to cents;
 * - the discount is shared over the lines in proportion to their price, in whole cents that add up to
 *   the discount (largest remainder); taxable amount = Σ over taxable lines of (price − share);
 * - tax = sales tax % × taxable amount, rounded half up to cents;
 * - minimum job charge = minimum job price − (subtotal price − discount) when that is positive, else
 *   0 (the minimum applies to the price before tax; the charge is not taxed);
 * - total = subtotal price − discount + minimum job charge + tax;
 * - deposit = deposit % × total, rounded half up to cents;
 * - gross profit = (total − tax) − subtotal cost; gross margin % = gross profit ÷ (total − tax) × 100,
 *   rounded half up to 2 decimals (null when total − tax is 0);
 * - approval is needed when the margin is below the policy's floor or the discount % above its ceiling.
 *
 * @param discountPct 0–100 with at most 2 decimals; "0" for none.
 */
export function estimateTotals(args: {
  lines: ReadonlyArray<PricedLine>;
  book: PriceBook;
  discountPct: string;
}): Pick<PricedEstimate, 'totals' | 'adjustments' | 'approval'> {
  const { lines, book, discountPct } = args;
  const settings = book.settings;
  const costs = lines.map((line) => toDecimal(line.extendedCost));
  const prices = lines.map((line) => toDecimal(line.price));
  const subtotalCost = sumDecimals(costs);
  const subtotalPrice = sumDecimals(prices);
  const discountFraction = percentToFraction(discountPct);
  const discount = roundMoney(subtotalPrice.times(discountFraction));
  const shares =
    lines.length > 0 ? allocate(discount, prices, 2) : ([] as ReturnType<typeof allocate>);
  const taxableAmount = sumDecimals(
    lines.flatMap((line, index) => (line.taxable ? [prices[index]!.minus(shares[index]!)] : [])),
  );
  const tax = roundMoney(taxableAmount.times(percentToFraction(settings.salesTaxPct)));
  const afterDiscount = subtotalPrice.minus(discount);
  const minimum = toDecimal(settings.minimumJobPrice);
  const minimumJobCharge = afterDiscount.lessThan(minimum)
    ? minimum.minus(afterDiscount)
    : new PricingDecimal(0);
  const total = afterDiscount.plus(minimumJobCharge).plus(tax);
  const deposit = roundMoney(total.times(percentToFraction(settings.depositPct)));
  const revenue = total.minus(tax);
  const grossProfit = revenue.minus(subtotalCost);
  const margin = revenue.isZero() ? null : grossProfit.times(100).dividedBy(revenue);

  const reasons: PricedEstimate['approval']['reasons'] = [];
  const floor = toDecimal(book.policy.marginFloorPct);
  if (margin === null ? floor.greaterThan(0) : margin.lessThan(floor)) {
    reasons.push({
      code: 'margin-below-floor',
      message: `Gross margin ${margin === null ? 'is undefined (no price)' : `${formatPercent(margin)} %`} is below the floor of ${formatPercent(floor)} %.`,
    });
  }
  const ceiling = toDecimal(book.policy.discountCeilingPct);
  if (toDecimal(discountPct).greaterThan(ceiling)) {
    reasons.push({
      code: 'discount-above-ceiling',
      message: `A discount of ${formatPercent(toDecimal(discountPct))} % is above the ceiling of ${formatPercent(ceiling)} %.`,
    });
  }

  return {
    totals: {
      subtotalCost: formatMoney(subtotalCost),
      subtotalPrice: formatMoney(subtotalPrice),
      discountPct: formatPercent(toDecimal(discountPct)),
      discount: formatMoney(discount),
      minimumJobCharge: formatMoney(minimumJobCharge),
      taxableAmount: formatMoney(taxableAmount),
      salesTaxPct: formatPercent(toDecimal(settings.salesTaxPct)),
      tax: formatMoney(tax),
      total: formatMoney(total),
      depositPct: formatPercent(toDecimal(settings.depositPct)),
      deposit: formatMoney(deposit),
      grossProfit: formatMoney(grossProfit),
      grossMarginPct: margin === null ? null : formatPercent(margin),
    },
    adjustments: minimumJobCharge.isZero()
      ? []
      : [
          {
            id: 'minimum-job-charge',
            description: `Minimum job charge: brings the price before tax up to the minimum of ${formatMoney(minimum)}`,
            amount: formatMoney(minimumJobCharge),
          },
        ],
    approval: { needsApproval: reasons.length > 0, reasons },
  };
}
