import type Decimal from 'decimal.js';
import { formatMoney, sumDecimals, toDecimal } from '../pricing/money';
import type { PricedEstimate, PricedLine } from '../pricing/priced-estimate-schema';
import type { BudgetLineReduction, ChangeOrderLine } from './job-schemas';

/** What a change order changes, between the version it stands on and the version it makes. */
export type ChangeOrderDifference = {
  /** The lines as the homeowner reads them: the added ones, then the work taken off. */
  lines: ChangeOrderLine[];
  /** The new lines, as the version prices them. */
  added: PricedLine[];
  /** The lines work is taken off, with their figures before and after. */
  reductions: BudgetLineReduction[];
  /** Before tax, tax and total; negative for a credit. */
  priceBeforeTax: string;
  tax: string;
  total: string;
  /** Σ extended cost of the added lines + Σ (extended cost after − before) of the reduced ones. */
  cost: string;
};

/**
 * The difference a change order makes, from two versions priced with the same book: `before` (the
 * version in force) and `after` (the change's version: the same content with lines added and work
 * taken off). Money, all exact sums of figures already rounded to cents:
 * - total = (after base total − before base total) + Σ over the options the homeowner chose of
 *   (after price + tax − before price + tax), an option that is gone counting 0 after;
 * - tax = the same differences of the tax alone; price before tax = total − tax.
 * So discount, minimum job charge and tax move as the estimate's own rules make them move, and a
 * credit is negative. A line work is taken off is `removed` when `after` no longer has it, else
 * `reduced`; its price change is after − before (negative).
 *
 * @param chosenOptionIds the options the homeowner accepted with the quote (their lines are the job's).
 * @param addedLineIds ids of the change's new lines in `after`.
 * @param reducedLineIds ids of the lines work is taken off, in `before`.
 * @throws RangeError when an added line is not in `after` or a reduced one is not in `before`.
 */
export function changeOrderDifference(args: {
  before: PricedEstimate;
  after: PricedEstimate;
  chosenOptionIds: ReadonlyArray<string>;
  addedLineIds: ReadonlyArray<string>;
  reducedLineIds: ReadonlyArray<string>;
}): ChangeOrderDifference {
  const { before, after, chosenOptionIds } = args;
  const linesOf = (priced: PricedEstimate) =>
    new Map(
      [
        ...priced.lines,
        ...priced.options
          .filter((option) => chosenOptionIds.includes(option.id))
          .flatMap((option) => option.lines),
      ].map((line) => [line.id, line]),
    );
  const beforeLines = linesOf(before);
  const afterLines = linesOf(after);

  const added = args.addedLineIds.map((id) => {
    const line = afterLines.get(id);
    if (!line) throw new RangeError(`The change's version has no line ${id}`);
    return line;
  });
  const reductions = args.reducedLineIds.map((id): BudgetLineReduction => {
    const previous = beforeLines.get(id);
    if (!previous) throw new RangeError(`The version in force has no line ${id}`);
    const next = afterLines.get(id);
    return {
      id,
      quantity: next?.quantity ?? '0',
      extendedCost: next?.extendedCost ?? '0.00',
      price: next?.price ?? '0.00',
      previous: {
        quantity: previous.quantity,
        extendedCost: previous.extendedCost,
        price: previous.price,
      },
    };
  });

  const lines: ChangeOrderLine[] = [
    ...added.map(
      (line): ChangeOrderLine => ({
        change: 'added',
        description: line.description,
        quantity: line.quantity,
        unit: line.unit,
        fromQuantity: null,
        toQuantity: null,
        price: line.price,
      }),
    ),
    ...reductions.map((reduction): ChangeOrderLine => {
      const previous = beforeLines.get(reduction.id)!;
      return {
        change: afterLines.has(reduction.id) ? 'reduced' : 'removed',
        description: previous.description,
        quantity: toDecimal(previous.quantity).minus(toDecimal(reduction.quantity)).toFixed(),
        unit: previous.unit,
        fromQuantity: previous.quantity,
        toQuantity: reduction.quantity,
        price: formatMoney(toDecimal(reduction.price).minus(toDecimal(previous.price))),
      };
    }),
  ];

  let total: Decimal = toDecimal(after.totals.total).minus(toDecimal(before.totals.total));
  let tax: Decimal = toDecimal(after.totals.tax).minus(toDecimal(before.totals.tax));
  for (const id of chosenOptionIds) {
    const was = before.options.find((option) => option.id === id);
    const is = after.options.find((option) => option.id === id);
    const price = (option: typeof was) => toDecimal(option?.price ?? '0');
    const optionTax = (option: typeof was) => toDecimal(option?.tax ?? '0');
    total = total.plus(price(is).plus(optionTax(is))).minus(price(was).plus(optionTax(was)));
    tax = tax.plus(optionTax(is)).minus(optionTax(was));
  }
  const cost = sumDecimals([
    ...added.map((line) => toDecimal(line.extendedCost)),
    ...reductions.map((r) => toDecimal(r.extendedCost).minus(toDecimal(r.previous.extendedCost))),
  ]);
  return {
    lines,
    added,
    reductions,
    priceBeforeTax: formatMoney(total.minus(tax)),
    tax: formatMoney(tax),
    total: formatMoney(total),
    cost: formatMoney(cost),
  };
}
