import { z } from 'zod';
import { roundTo } from '../units/rounding';
import {
  QUANTITY_KIND_NAMES,
  toDisplay,
  type QuantityKind,
  type UnitSystem,
} from '../units/display';

export const explanationSourceSchema = z.object({
  /** The constant or rule, e.g. "US gal per ft³". */
  name: z.string(),
  value: z.string(),
  /** Where it comes from, e.g. "NIST Handbook 44, App. C" or "common practice, no source". */
  source: z.string(),
});

/** "How it was computed" for one figure: formula, the numbers put in, rounding and sources. */
export const explanationSchema = z.object({
  /** Dotted path of the figure in the takeoff, e.g. "water.volumeGallons". */
  figure: z.string(),
  label: z.string(),
  /** The figure in the engine's unit (see `kind`), rounded as stated in `rounding`. */
  value: z.number(),
  kind: z.enum(QUANTITY_KIND_NAMES),
  /** The figure in the estimate's unit system. */
  display: z.object({ value: z.number(), unit: z.string() }),
  formula: z.string(),
  /** The formula with the numbers put in (engine units: ft, gal, gpm, lb, short tons). */
  workings: z.string(),
  rounding: z.string(),
  sources: z.array(explanationSourceSchema),
  /** A comparison worth showing beside the figure, e.g. a common trade rule. */
  note: z.string().nullable(),
});
export type Explanation = z.infer<typeof explanationSchema>;
export type ExplanationSource = z.infer<typeof explanationSourceSchema>;

export type ExplanationDraft = {
  figure: string;
  label: string;
  /** Full precision; rounded to `decimals` (when given) for `value`, converted unrounded for display. */
  value: number;
  decimals?: number;
  kind: QuantityKind;
  formula: string;
  workings: string;
  rounding: string;
  sources?: ExplanationSource[];
  note?: string;
};

/** Collects explanations in the order the figures are computed. */
export class Explainer {
  readonly items: Explanation[] = [];

  constructor(private readonly system: UnitSystem) {}

  add(draft: ExplanationDraft): void {
    this.items.push({
      figure: draft.figure,
      label: draft.label,
      value: draft.decimals === undefined ? draft.value : roundTo(draft.value, draft.decimals),
      kind: draft.kind,
      display: toDisplay(draft.value, draft.kind, this.system),
      formula: draft.formula,
      workings: draft.workings,
      rounding: draft.rounding,
      sources: draft.sources ?? [],
      note: draft.note ?? null,
    });
  }
}

/**
 * Formats a number for workings and messages: rounded to at most `decimals` places, no trailing
 * zeros, thousands separated by commas ("1,325.7"). Plain string work: Intl formatting costs ~25 µs a
 * call, which would dominate a takeoff.
 */
export function fmt(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) return String(value);
  const rounded = roundTo(value, decimals);
  let text = Math.abs(rounded).toFixed(decimals);
  if (decimals > 0) text = text.replace(/\.?0+$/, '');
  const [whole = '0', fraction] = text.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const sign = rounded < 0 ? '−' : '';
  return sign + grouped + (fraction ? `.${fraction}` : '');
}
