import type { BudgetLine, EstimateComputed, JobBudget } from '@pondwright/shared';
import { LABOR_TASKS, type LaborTask } from '@pondwright/shared/engine';
import { formatMoney, PricingDecimal, toDecimal } from '@pondwright/shared/pricing';

/**
 * The job's budget from the accepted version: its base lines and the lines of the options the homeowner
 * chose, with their costs; the price is what the homeowner accepted (tax apart). Hours are the labor
 * lines' quantities; crew days the takeoff's.
 */
export function budgetFromAcceptance(args: {
  versionNumber: number;
  contentSha256: string;
  computed: EstimateComputed;
  optionIds: ReadonlyArray<string>;
  acceptedTotal: string;
}): JobBudget {
  const priced = args.computed.priced;
  const chosen = priced.options.filter((option) => args.optionIds.includes(option.id));
  const lines: BudgetLine[] = [...priced.lines, ...chosen.flatMap((option) => option.lines)].map(
    (line) => ({
      id: line.id,
      category: line.category,
      description: line.description,
      code: line.code,
      source: line.source,
      task: taskOf(line.source),
      quantity: line.quantity,
      unit: line.unit,
      unitCost: line.unitCost,
      extendedCost: line.extendedCost,
      price: line.price,
    }),
  );
  const sum = (values: string[]) =>
    values.reduce((total, value) => total.plus(toDecimal(value)), new PricingDecimal(0));
  const tax = toDecimal(priced.totals.tax).plus(sum(chosen.map((option) => option.tax)));
  const total = toDecimal(args.acceptedTotal);
  return {
    versionNumber: args.versionNumber,
    contentSha256: args.contentSha256,
    currency: priced.currency,
    lines,
    cost: formatMoney(sum(lines.map((line) => line.extendedCost))),
    priceBeforeTax: formatMoney(total.minus(tax)),
    tax: formatMoney(tax),
    total: formatMoney(total),
    laborHours: sum(lines.filter((l) => l.category === 'labor').map((l) => l.quantity)).toFixed(2),
    crewDays: new PricingDecimal(args.computed.takeoff.labor.crewDays)
      .toDecimalPlaces(1)
      .toFixed(1),
  };
}

function taskOf(source: string): LaborTask | null {
  const task = source.startsWith('labor:') ? source.slice('labor:'.length) : null;
  return task && (LABOR_TASKS as readonly string[]).includes(task) ? (task as LaborTask) : null;
}
