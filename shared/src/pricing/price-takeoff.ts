import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import { disposalLines } from './disposal-lines';
import { equipmentLines } from './equipment-lines';
import { estimateTotals } from './estimate-totals';
import { laborLines } from './labor-lines';
import { materialLines } from './material-lines';
import {
  formatMoney,
  percentToFraction,
  PricingDecimal,
  roundMoney,
  sumDecimals,
  toDecimal,
} from './money';
import { PRICE_CATEGORIES, percentSchema, type PriceBook } from './price-book-schema';
import type {
  MissingItem,
  PricedEstimate,
  PricedLine,
  PricedOption,
} from './priced-estimate-schema';
import { priceLine, roundQuantity, type LineDraft } from './price-line';

/** An add-on or alternate priced beside the base estimate from the book's materials. */
export type EstimateOptionInput = {
  /** Unique within the estimate; prefixes the option's line ids. "lighting" is taken when lighting is an add-on. */
  id: string;
  label: string;
  kind: 'add-on' | 'alternate';
  items: ReadonlyArray<{
    materialCode: string;
    /** A decimal string, e.g. "6" plants or "1" auto-fill kit; rounded half up to 2 decimals. */
    quantity: string;
    description?: string;
  }>;
};

export type PriceTakeoffArgs = {
  /** The input the takeoff was computed from (fittings, fixtures, cable runs, access width). */
  input: TakeoffInput;
  takeoff: Takeoff;
  /** A validated price book; the takeoff should be computed with `engineParametersFromPriceBook(book)`. */
  book: PriceBook;
  /** Discount on the base estimate, % of the subtotal price (0–100, 2 decimals); none by default. */
  discountPct?: string;
  /** Priced beside the base estimate and never in its totals. */
  addOns?: ReadonlyArray<EstimateOptionInput>;
  /** 'add-on' moves the lighting materials and lighting labor into an add-on "lighting"; 'base' by default. */
  lighting?: 'base' | 'add-on';
};

export const LIGHTING_OPTION_ID = 'lighting';

function optionTax(lines: ReadonlyArray<PricedLine>, book: PriceBook) {
  const taxable = sumDecimals(
    lines.filter((line) => line.taxable).map((line) => toDecimal(line.price)),
  );
  return roundMoney(taxable.times(percentToFraction(book.settings.salesTaxPct)));
}

function sumMoney(lines: ReadonlyArray<PricedLine>, field: 'extendedCost' | 'price') {
  return formatMoney(sumDecimals(lines.map((line) => toDecimal(line[field]))));
}

/**
 * Prices a takeoff with a price book (see docs/pricing.md for every rule). Base lines by category:
 * materials (`materialLines`), labor (`laborLines`), equipment (`equipmentLines`), disposal
 * (`disposalLines`) and other: mobilization once, and a contingency of contingency % × direct cost
 * (Σ extended cost of the base materials, labor, equipment and disposal lines), rounded half up to
 * cents. Each line is priced with its category's markup and rounded to cents at the line
 * (`priceLine`); totals are sums of rounded lines (`estimateTotals`). Add-ons and alternates are
 * priced the same way but kept apart. What the book cannot price is listed in `missing` (its line is
 * left out and `complete` is false); nothing is thrown for a gap in the book.
 *
 * @throws RangeError when `discountPct` is not a percentage (0–100, at most 2 decimals), an add-on
 *         quantity is not a non-negative number, or two options share an id.
 */
export function priceTakeoff(args: PriceTakeoffArgs): PricedEstimate {
  const { input, takeoff, book } = args;
  const discountPct = args.discountPct ?? '0';
  if (!percentSchema.safeParse(discountPct).success) {
    throw new RangeError(`Not a discount percentage: "${discountPct}"`);
  }
  const lightingOptionId = args.lighting === 'add-on' ? LIGHTING_OPTION_ID : null;
  const addOns = args.addOns ?? [];
  const optionIds = [...(lightingOptionId ? [lightingOptionId] : []), ...addOns.map((o) => o.id)];
  if (new Set(optionIds).size !== optionIds.length) {
    throw new RangeError(`Option ids must be unique: ${optionIds.join(', ')}`);
  }

  const parts = [
    materialLines({ input, takeoff, book, lightingOptionId }),
    laborLines({ takeoff, book, lightingOptionId }),
    equipmentLines({ input, takeoff, book }),
    disposalLines({ input, takeoff, book }),
  ];
  const drafts: LineDraft[] = parts.flatMap((part) => part.drafts);
  const missing: MissingItem[] = parts.flatMap((part) => part.missing);
  const markup = book.policy.markupPct;
  const price = (draft: LineDraft) => priceLine(draft, markup[draft.category]);

  const baseLines = drafts.filter((draft) => draft.optionId === null).map(price);
  const directCost = sumDecimals(baseLines.map((line) => toDecimal(line.extendedCost)));
  const other: LineDraft[] = [];
  const mobilization = toDecimal(book.settings.mobilizationCost);
  if (!mobilization.isZero()) {
    other.push({
      id: 'other:mobilization',
      category: 'other',
      description: 'Mobilization: travel, loading and set-up',
      code: null,
      quantity: new PricingDecimal(1),
      unit: 'each',
      unitCost: mobilization,
      taxable: false,
      source: 'mobilization',
      kind: 'base',
      optionId: null,
    });
  }
  const contingency = roundMoney(directCost.times(percentToFraction(book.settings.contingencyPct)));
  if (!contingency.isZero()) {
    other.push({
      id: 'other:contingency',
      category: 'other',
      description: `Contingency, ${book.settings.contingencyPct} % of direct cost ${formatMoney(directCost)}`,
      code: null,
      quantity: new PricingDecimal(1),
      unit: 'lump sum',
      unitCost: contingency,
      taxable: false,
      source: 'contingency',
      kind: 'base',
      optionId: null,
    });
  }
  const lines = [...baseLines, ...other.map(price)].sort(
    (a, b) => PRICE_CATEGORIES.indexOf(a.category) - PRICE_CATEGORIES.indexOf(b.category),
  );

  // Options: lighting (when asked) and the caller's add-ons and alternates.
  const options: PricedOption[] = [];
  const optionLines = (id: string) => drafts.filter((draft) => draft.optionId === id).map(price);
  if (lightingOptionId) {
    const lightingLines = optionLines(lightingOptionId);
    if (lightingLines.length > 0) {
      options.push({
        id: lightingOptionId,
        label: 'Underwater and landscape lighting',
        kind: 'add-on',
        lines: lightingLines,
        cost: sumMoney(lightingLines, 'extendedCost'),
        price: sumMoney(lightingLines, 'price'),
        tax: formatMoney(optionTax(lightingLines, book)),
      });
    }
  }
  for (const option of addOns) {
    const priced: PricedLine[] = [];
    option.items.forEach((item, index) => {
      const material = book.materials.find((candidate) => candidate.code === item.materialCode);
      const source = `option:${index}`;
      if (!material) {
        missing.push({
          kind: 'extra',
          source,
          need: `the material ${item.materialCode}`,
          message: `Add the material ${item.materialCode} to your price book or remove it from "${option.label}".`,
          optionId: option.id,
        });
        return;
      }
      const quantity = roundQuantity(toDecimal(item.quantity), 2);
      if (quantity.isNegative()) throw new RangeError(`Negative quantity in "${option.label}"`);
      priced.push(
        price({
          id: `${option.id}:${source}:${material.code}`,
          category: 'materials',
          description: item.description ?? material.name,
          code: material.code,
          quantity,
          unit: material.unit,
          unitCost: toDecimal(material.unitCost),
          taxable: material.taxable,
          source,
          kind: option.kind,
          optionId: option.id,
        }),
      );
    });
    options.push({
      id: option.id,
      label: option.label,
      kind: option.kind,
      lines: priced,
      cost: sumMoney(priced, 'extendedCost'),
      price: sumMoney(priced, 'price'),
      tax: formatMoney(optionTax(priced, book)),
    });
  }

  const categories = PRICE_CATEGORIES.map((category) => {
    const inCategory = lines.filter((line) => line.category === category);
    return {
      category,
      cost: sumMoney(inCategory, 'extendedCost'),
      price: sumMoney(inCategory, 'price'),
    };
  });
  return {
    currency: book.currency,
    lines,
    categories,
    ...estimateTotals({ lines, book, discountPct }),
    options,
    missing,
    complete: missing.length === 0,
  };
}
