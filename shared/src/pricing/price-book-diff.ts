import { LABOR_TASKS } from '../engine/labor/labor-hours';
import { formatMoney, toDecimal } from './money';
import { PRICE_CATEGORIES, type PriceBook, type PumpCurvePoint } from './price-book-schema';
import type { EstimateTotals, PricedEstimate, PricedLine } from './priced-estimate-schema';

export type PriceBookSection =
  'book' | 'material' | 'labor' | 'equipment' | 'disposal' | 'rate' | 'setting' | 'policy';

/**
 * One difference between two price-book versions. For materials, labor roles, equipment and disposal
 * `code` is the item's code and `field` the attribute; an item added or removed has `field` "(item)"
 * with its name on the side where it exists and null on the other. For rates, settings and policy
 * `code` is "" and `field` the key as the CSV names it (`salesTaxPct`, `taskRole.excavation`,
 * `markupPct.labor`). Values are written as in the CSV (pump curves as `flow:head:watts|…`).
 */
export type PriceBookChange = {
  section: PriceBookSection;
  code: string;
  field: string;
  before: string | null;
  after: string | null;
};

/** Fields compared by value, so "12.5" and "12.50" are the same price. */
const DECIMAL_FIELDS = new Set([
  'unitCost',
  'wagePerHour',
  'burdenPct',
  'dailyRate',
  'deliveryFee',
  'mobilizationCost',
  'minimumJobPrice',
  'contingencyPct',
  'salesTaxPct',
  'depositPct',
  'marginFloorPct',
  'discountCeilingPct',
  ...PRICE_CATEGORIES.map((category) => `markupPct.${category}`),
]);

function text(value: unknown): string | null {
  if (value === undefined || value === null) return null;
  if (Array.isArray(value)) {
    return (value as PumpCurvePoint[])
      .map((point) => `${point.flowGph}:${point.headFt}:${point.inputWatts}`)
      .join('|');
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value);
}

function same(field: string, before: string | null, after: string | null): boolean {
  if (before === null || after === null) return before === after;
  if (DECIMAL_FIELDS.has(field)) return toDecimal(before).equals(toDecimal(after));
  return before === after;
}

function flatSettings(book: PriceBook): Array<[PriceBookSection, string, unknown]> {
  const { taskRoles, ...settings } = book.settings;
  return [
    ['book', 'currency', book.currency],
    ...Object.entries(book.productionRates).map(
      ([key, value]): [PriceBookSection, string, unknown] => ['rate', key, value],
    ),
    ...Object.entries(settings).map(([key, value]): [PriceBookSection, string, unknown] => [
      'setting',
      key,
      value,
    ]),
    ...LABOR_TASKS.map((task): [PriceBookSection, string, unknown] => [
      'setting',
      `taskRole.${task}`,
      taskRoles[task],
    ]),
    ...PRICE_CATEGORIES.map((category): [PriceBookSection, string, unknown] => [
      'policy',
      `markupPct.${category}`,
      book.policy.markupPct[category],
    ]),
    ['policy', 'marginFloorPct', book.policy.marginFloorPct],
    ['policy', 'discountCeilingPct', book.policy.discountCeilingPct],
  ];
}

/**
 * What changed from `before` to `after`, for "who changed what" and "what would re-pricing change":
 * items matched by code (case-insensitive, as the schema treats codes), then every field; rates,
 * settings and policy key by key. Money and percentages are compared by value. Order: the currency,
 * then materials, labor, equipment and disposal (in `after`'s order, removed items last), then rates,
 * settings and policy. Empty when the books price alike.
 */
export function diffPriceBooks(before: PriceBook, after: PriceBook): PriceBookChange[] {
  const changes: PriceBookChange[] = [];
  const lists: Array<
    [
      PriceBookSection,
      ReadonlyArray<Record<string, unknown>>,
      ReadonlyArray<Record<string, unknown>>,
    ]
  > = [
    ['material', before.materials, after.materials],
    ['labor', before.laborRoles, after.laborRoles],
    ['equipment', before.equipment, after.equipment],
    ['disposal', before.disposal, after.disposal],
  ];
  const [currency, ...keyedBefore] = flatSettings(before);
  const [currencyAfter, ...keyedAfter] = flatSettings(after);
  if (currency![2] !== currencyAfter![2]) {
    changes.push({
      section: 'book',
      code: '',
      field: 'currency',
      before: text(currency![2]),
      after: text(currencyAfter![2]),
    });
  }
  for (const [section, oldItems, newItems] of lists) {
    const key = (item: Record<string, unknown>) => String(item.code).toLowerCase();
    const oldByCode = new Map(oldItems.map((item) => [key(item), item]));
    const newCodes = new Set(newItems.map(key));
    for (const item of newItems) {
      const old = oldByCode.get(key(item));
      if (!old) {
        changes.push({
          section,
          code: String(item.code),
          field: '(item)',
          before: null,
          after: text(item.name),
        });
        continue;
      }
      const fields = [...new Set([...Object.keys(old), ...Object.keys(item)])];
      for (const field of fields) {
        const was = text(old[field]);
        const now = text(item[field]);
        if (!same(field, was, now))
          changes.push({ section, code: String(item.code), field, before: was, after: now });
      }
    }
    for (const old of oldItems) {
      if (!newCodes.has(key(old))) {
        changes.push({
          section,
          code: String(old.code),
          field: '(item)',
          before: text(old.name),
          after: null,
        });
      }
    }
  }
  keyedAfter.forEach(([section, field, value], index) => {
    const was = text(keyedBefore[index]![2]);
    const now = text(value);
    if (!same(field, was, now)) changes.push({ section, code: '', field, before: was, after: now });
  });
  return changes;
}

type LineFigures = Pick<
  PricedLine,
  'description' | 'quantity' | 'unitCost' | 'extendedCost' | 'price'
>;

/** A line of two priced estimates that differs; matched by line id (options' lines included). */
export type PricedLineChange = {
  id: string;
  change: 'added' | 'removed' | 'changed';
  before: LineFigures | null;
  after: LineFigures | null;
  /** after − before: extended cost and price, 2 decimals (a missing side counts as 0). */
  costDelta: string;
  priceDelta: string;
};

export type PricedTotalChange = {
  field: keyof EstimateTotals;
  before: string | null;
  after: string | null;
  /** after − before, 2 decimals; null when either side has no value (a margin with no price). */
  delta: string | null;
};

const figures = (line: PricedLine): LineFigures => ({
  description: line.description,
  quantity: line.quantity,
  unitCost: line.unitCost,
  extendedCost: line.extendedCost,
  price: line.price,
});

function allLines(estimate: PricedEstimate): PricedLine[] {
  return [...estimate.lines, ...estimate.options.flatMap((option) => option.lines)];
}

function delta(before: string | null, after: string | null): string | null {
  if (before === null || after === null) return null;
  return formatMoney(toDecimal(after).minus(toDecimal(before)));
}

/**
 * The differences between two priced estimates (e.g. before and after re-pricing with a new book
 * version): every line added, removed or changed (quantity, unit cost, extended cost, price or
 * description), matched by id, with cost and price deltas; and every total that changed, with its
 * delta (after − before, exact, 2 decimals). Lines keep `after`'s order; removed lines come last.
 */
export function diffPricedEstimates(
  before: PricedEstimate,
  after: PricedEstimate,
): { lines: PricedLineChange[]; totals: PricedTotalChange[] } {
  const oldLines = new Map(allLines(before).map((line) => [line.id, line]));
  const newIds = new Set(allLines(after).map((line) => line.id));
  const lines: PricedLineChange[] = [];
  const zero = '0.00';
  for (const line of allLines(after)) {
    const old = oldLines.get(line.id);
    if (!old) {
      lines.push({
        id: line.id,
        change: 'added',
        before: null,
        after: figures(line),
        costDelta: delta(zero, line.extendedCost)!,
        priceDelta: delta(zero, line.price)!,
      });
      continue;
    }
    const was = figures(old);
    const now = figures(line);
    const changed = (Object.keys(now) as Array<keyof LineFigures>).some((field) =>
      field === 'description'
        ? was[field] !== now[field]
        : !toDecimal(was[field]).equals(toDecimal(now[field])),
    );
    if (changed) {
      lines.push({
        id: line.id,
        change: 'changed',
        before: was,
        after: now,
        costDelta: delta(old.extendedCost, line.extendedCost)!,
        priceDelta: delta(old.price, line.price)!,
      });
    }
  }
  for (const old of allLines(before)) {
    if (newIds.has(old.id)) continue;
    lines.push({
      id: old.id,
      change: 'removed',
      before: figures(old),
      after: null,
      costDelta: delta(old.extendedCost, zero)!,
      priceDelta: delta(old.price, zero)!,
    });
  }
  const totals: PricedTotalChange[] = [];
  for (const field of Object.keys(after.totals) as Array<keyof EstimateTotals>) {
    const was = before.totals[field];
    const now = after.totals[field];
    if (was === now) continue;
    if (was !== null && now !== null && toDecimal(was).equals(toDecimal(now))) continue;
    totals.push({ field, before: was, after: now, delta: delta(was, now) });
  }
  return { lines, totals };
}
