import { formatMoney, sumDecimals, toDecimal } from '../pricing/money';
import type { BudgetLine, BudgetLineReduction, JobBudget } from './job-schemas';

/** An accepted change order as the budget takes it. */
export type AcceptedChange = {
  versionNumber: number;
  contentSha256: string;
  /** New lines, added at the end. */
  added: ReadonlyArray<BudgetLine>;
  /** Lines work is taken off (quantity "0": the line leaves the budget). */
  reductions: ReadonlyArray<BudgetLineReduction>;
  /** What the change adds before tax, its tax and total: negative for a credit. */
  priceBeforeTax: string;
  tax: string;
  total: string;
};

/**
 * The job's budget once the homeowner accepts a change order. Each line work is taken off gets its
 * new quantity, extended cost and price (or leaves the budget when it keeps 0), the new lines come
 * after the others; cost (Σ extended cost) and labor hours (Σ quantity of the labor lines, 2 decimals)
 * are summed again from the lines, so they shrink with a credit as they grow with new work. The price
 * before tax, tax and total move by the change's figures, exactly. Crew days are the schedule's and
 * stay as planned.
 *
 * @throws RangeError when a reduction names a line the budget lacks or one whose figures are not
 *         those the change was priced on (another change reached it first).
 */
export function budgetAfterChangeOrder(budget: JobBudget, change: AcceptedChange): JobBudget {
  const reductions = new Map(change.reductions.map((reduction) => [reduction.id, reduction]));
  const lines: BudgetLine[] = [];
  for (const line of budget.lines) {
    const reduction = reductions.get(line.id);
    if (!reduction) {
      lines.push(line);
      continue;
    }
    reductions.delete(line.id);
    const { previous } = reduction;
    if (
      !toDecimal(previous.quantity).equals(toDecimal(line.quantity)) ||
      previous.extendedCost !== line.extendedCost ||
      previous.price !== line.price
    ) {
      throw new RangeError(`The budget's line ${line.id} is not the one the change was priced on`);
    }
    if (toDecimal(reduction.quantity).isZero()) continue;
    lines.push({
      ...line,
      quantity: reduction.quantity,
      extendedCost: reduction.extendedCost,
      price: reduction.price,
    });
  }
  if (reductions.size > 0) {
    throw new RangeError(`The budget has no line ${[...reductions.keys()].join(', ')}`);
  }
  lines.push(...change.added);
  const sum = (values: string[]) => sumDecimals(values.map((value) => toDecimal(value)));
  return {
    ...budget,
    versionNumber: change.versionNumber,
    contentSha256: change.contentSha256,
    lines,
    cost: formatMoney(sum(lines.map((line) => line.extendedCost))),
    priceBeforeTax: formatMoney(
      toDecimal(budget.priceBeforeTax).plus(toDecimal(change.priceBeforeTax)),
    ),
    tax: formatMoney(toDecimal(budget.tax).plus(toDecimal(change.tax))),
    total: formatMoney(toDecimal(budget.total).plus(toDecimal(change.total))),
    laborHours: sum(
      lines.filter((line) => line.category === 'labor').map((line) => line.quantity),
    ).toFixed(2),
  };
}
