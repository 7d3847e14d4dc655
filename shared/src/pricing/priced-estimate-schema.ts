import { z } from 'zod';
import { MATERIAL_KINDS, priceCategorySchema } from './price-book-schema';

/** Money in a priced estimate: exactly 2 decimals, e.g. "1234.50" (negative only for differences). */
export const moneyOutputSchema = z.string().regex(/^-?\d+\.\d{2}$/, 'Money with 2 decimals');
/** A unit cost: 2 to 4 decimals (fractions of a cent are kept, as in the price book). */
export const unitCostOutputSchema = z.string().regex(/^\d+\.\d{2,4}$/, 'A unit cost');
/** A percentage with exactly 2 decimals, e.g. "35.00". */
export const percentOutputSchema = z.string().regex(/^-?\d+\.\d{2}$/, 'A percentage');
/** A quantity as priced, rounded as `docs/pricing.md` states per source, e.g. "800", "1.97". */
export const quantityOutputSchema = z.string().regex(/^\d+(\.\d+)?$/, 'A quantity');

export const LINE_KINDS = ['base', 'add-on', 'alternate'] as const;
export const lineKindSchema = z.enum(LINE_KINDS);
export type LineKind = z.infer<typeof lineKindSchema>;

/**
 * One priced line: quantity × unit cost = extended cost (rounded to cents), × (1 + markup) = price
 * (rounded to cents). `source` says which takeoff figure it prices (e.g. `liner`, `pipe:pressure`,
 * `labor:excavation`); `code` is the price-book item it is priced with.
 */
export const pricedLineSchema = z.object({
  id: z.string(),
  category: priceCategorySchema,
  description: z.string(),
  code: z.string().nullable(),
  quantity: quantityOutputSchema,
  unit: z.string(),
  unitCost: unitCostOutputSchema,
  extendedCost: moneyOutputSchema,
  markupPct: percentOutputSchema,
  price: moneyOutputSchema,
  taxable: z.boolean(),
  kind: lineKindSchema,
  source: z.string(),
  /** The add-on or alternate the line belongs to; null on the base estimate. */
  optionId: z.string().nullable(),
});
export type PricedLine = z.infer<typeof pricedLineSchema>;

/** Something the takeoff needs that the price book cannot price; its line is left out. */
export const missingItemSchema = z.object({
  /** What to add to the book: a material kind, or a labor role, equipment or disposal. */
  kind: z.enum([...MATERIAL_KINDS, 'labor-role', 'equipment', 'disposal']),
  source: z.string(),
  /** A short description of the item wanted, e.g. "pipe pvc-sch40, 2 in". */
  need: z.string(),
  /** A sentence for the estimator, e.g. "Add a 2 in pvc-sch40 pipe to your price book." */
  message: z.string(),
  optionId: z.string().nullable(),
});
export type MissingItem = z.infer<typeof missingItemSchema>;

export const categoryTotalSchema = z.object({
  category: priceCategorySchema,
  cost: moneyOutputSchema,
  price: moneyOutputSchema,
});

/** An add-on or alternate offered beside the base estimate; never in the base totals. */
export const pricedOptionSchema = z.object({
  id: z.string(),
  label: z.string(),
  kind: z.enum(['add-on', 'alternate']),
  lines: z.array(pricedLineSchema),
  cost: moneyOutputSchema,
  price: moneyOutputSchema,
  /** Sales tax on the option's taxable lines if it is accepted (no discount applies to options). */
  tax: moneyOutputSchema,
});
export type PricedOption = z.infer<typeof pricedOptionSchema>;

export const adjustmentSchema = z.object({
  id: z.literal('minimum-job-charge'),
  description: z.string(),
  amount: moneyOutputSchema,
});

export const estimateTotalsSchema = z.object({
  /** Σ extended cost of the base lines. */
  subtotalCost: moneyOutputSchema,
  /** Σ price of the base lines. */
  subtotalPrice: moneyOutputSchema,
  discountPct: percentOutputSchema,
  /** discount % × subtotal price, rounded to cents. */
  discount: moneyOutputSchema,
  /** What lifts the price before tax to the minimum job price; "0.00" when not needed. */
  minimumJobCharge: moneyOutputSchema,
  /** Σ over taxable lines of (price − the line's share of the discount). */
  taxableAmount: moneyOutputSchema,
  salesTaxPct: percentOutputSchema,
  /** sales tax % × taxable amount, rounded to cents. */
  tax: moneyOutputSchema,
  /** subtotal price − discount + minimum job charge + tax. */
  total: moneyOutputSchema,
  depositPct: percentOutputSchema,
  /** deposit % × total, rounded to cents. */
  deposit: moneyOutputSchema,
  /** (total − tax) − subtotal cost. */
  grossProfit: moneyOutputSchema,
  /** gross profit ÷ (total − tax) × 100, 2 decimals; null when the price before tax is zero. */
  grossMarginPct: percentOutputSchema.nullable(),
});
export type EstimateTotals = z.infer<typeof estimateTotalsSchema>;

export const APPROVAL_REASONS = ['margin-below-floor', 'discount-above-ceiling'] as const;

export const approvalSchema = z.object({
  needsApproval: z.boolean(),
  reasons: z.array(z.object({ code: z.enum(APPROVAL_REASONS), message: z.string() })),
});

/** The price of a takeoff against a price-book version. Every money figure is a decimal string. */
export const pricedEstimateSchema = z.object({
  currency: z.string(),
  /** The base estimate's lines, grouped by category in `PRICE_CATEGORIES` order. */
  lines: z.array(pricedLineSchema),
  categories: z.array(categoryTotalSchema),
  adjustments: z.array(adjustmentSchema),
  totals: estimateTotalsSchema,
  options: z.array(pricedOptionSchema),
  /** What the book lacks; when not empty the estimate is incomplete (`complete` is false). */
  missing: z.array(missingItemSchema),
  complete: z.boolean(),
  approval: approvalSchema,
});
export type PricedEstimate = z.infer<typeof pricedEstimateSchema>;
