import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import { PricingDecimal, toDecimal } from './money';
import type { Equipment, PriceBook } from './price-book-schema';
import type { MissingItem } from './priced-estimate-schema';
import { roundQuantity, type LineDraft } from './price-line';

/** Days a machine is on site: max(minimum days, ⌈machine hours / crew hours per day⌉). */
export function equipmentDays(machineHours: number, hoursPerDay: number, minimumDays: number) {
  // 1e-9 keeps 16.000000001 h (floating noise) from becoming a third day at 8 h per day.
  return Math.max(minimumDays, Math.ceil(machineHours / hoursPerDay - 1e-9));
}

/**
 * Equipment for machine excavation: when the takeoff digs by machine, the excavation equipment whose
 * width fits the site's access (width ≤ access width) and costs least for this job, where cost = days ×
 * daily rate + delivery fee and days = max(minimum days, ⌈machine hours / crew hours per day⌉), machine
 * hours = bank yd³ ÷ the book's machine production rate. Two lines: the rental (days × daily rate) and
 * the delivery (once). Equipment is not taxable. Rock equipment is not added automatically.
 */
export function equipmentLines(args: { input: TakeoffInput; takeoff: Takeoff; book: PriceBook }): {
  drafts: LineDraft[];
  missing: MissingItem[];
} {
  const { input, takeoff, book } = args;
  const dig = takeoff.excavation;
  if (dig.method !== 'machine' || dig.bankCuYd <= 0) return { drafts: [], missing: [] };
  const machineHours = dig.bankCuYd / book.productionRates.machineBankCuYdPerHour;
  const fits = book.equipment.filter(
    (item) => item.use === 'excavation' && item.widthIn <= input.site.accessWidthIn,
  );
  let best: { item: Equipment; days: number; cost: ReturnType<typeof toDecimal> } | undefined;
  for (const item of fits) {
    const days = equipmentDays(machineHours, takeoff.labor.hoursPerDay, item.minimumDays);
    const cost = toDecimal(item.dailyRate).times(days).plus(toDecimal(item.deliveryFee));
    if (best === undefined || cost.lessThan(best.cost)) best = { item, days, cost };
  }
  if (!best) {
    return {
      drafts: [],
      missing: [
        {
          kind: 'equipment',
          source: 'equipment:excavation',
          need: `an excavation machine no wider than ${input.site.accessWidthIn} in`,
          message: `Add an excavation machine no wider than ${input.site.accessWidthIn} in to your price book, or dig by hand.`,
          optionId: null,
        },
      ],
    };
  }
  const { item, days } = best;
  const drafts: LineDraft[] = [
    {
      id: `equipment:excavation:${item.code}`,
      category: 'equipment',
      description: `${item.name}, ${days} day${days === 1 ? '' : 's'}`,
      code: item.code,
      quantity: roundQuantity(days, 0),
      unit: 'day',
      unitCost: toDecimal(item.dailyRate),
      taxable: false,
      source: 'equipment:excavation',
      kind: 'base',
      optionId: null,
    },
  ];
  if (!toDecimal(item.deliveryFee).isZero()) {
    drafts.push({
      id: `equipment:delivery:${item.code}`,
      category: 'equipment',
      description: `${item.name}, delivery and pick-up`,
      code: item.code,
      quantity: new PricingDecimal(1),
      unit: 'each',
      unitCost: toDecimal(item.deliveryFee),
      taxable: false,
      source: 'equipment:delivery',
      kind: 'base',
      optionId: null,
    });
  }
  return { drafts, missing: [] };
}
