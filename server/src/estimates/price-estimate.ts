import type { EstimateComputed, EstimateContent, ManualLine } from '@pondwright/shared';
import { computeTakeoff, takeoffInputSchema } from '@pondwright/shared/engine';
import { insetPolygon } from '@pondwright/shared/engine/polygon-inset';
import {
  engineParametersFromPriceBook,
  estimateTotals,
  formatMoney,
  percentToFraction,
  PRICE_CATEGORIES,
  priceLine,
  priceTakeoff,
  reducePricedLines,
  roundMoney,
  roundQuantity,
  sumDecimals,
  toDecimal,
  type PriceBook,
  type PricedLine,
  type PricedOption,
} from '@pondwright/shared/pricing';
import { fieldErrors } from './field-errors';

/** The draft content as validated by the request schema; the input is checked here by the engine. */
export type UncheckedContent = Omit<EstimateContent, 'input'> & { input: unknown };

const MANUAL_PREFIX = 'manual:';

/**
 * Computes an estimate from its content: the takeoff with the book's rates and pumps, priced with
 * `priceTakeoff`, then the estimator's manual lines priced with the policy's markup for their category
 * (`priceLine`). Manual base lines join the base lines and the totals are recomputed with
 * `estimateTotals` (so discount, tax, minimum job charge and the approval check cover them); manual
 * add-ons and alternates each become an option of their own. Manual lines get no contingency: it is a
 * share of the generated direct cost only. Work change orders took off (`lineReductions`) is taken
 * off the priced lines, generated or manual, before the totals (`reducePricedLines`); the contingency
 * stays as priced unless its own line is reduced, as new manual work adds none. Input problems answer
 * 400 with fields named `input.<path>`.
 */
export function priceEstimateContent(
  content: UncheckedContent,
  book: PriceBook,
): { content: EstimateContent; computed: EstimateComputed } {
  const result = computeTakeoff(content.input, engineParametersFromPriceBook(book), {
    insetPolygon,
  });
  if (!result.ok) {
    throw fieldErrors(
      result.errors.map((error) => ({
        field: error.field === 'input' ? 'input' : `input.${error.field}`,
        message: error.message,
      })),
    );
  }
  const input = takeoffInputSchema.parse(content.input);
  const generated = priceTakeoff({
    input,
    takeoff: result.takeoff,
    book,
    discountPct: content.discountPct,
  });

  const reduced = reducePricedLines(
    [...generated.lines, ...content.manualLines.map((line) => priceManualLine(line, book))],
    content.lineReductions ?? [],
  );
  if (reduced.unknownLineIds.length > 0) {
    throw fieldErrors([
      {
        field: 'lineReductions',
        message: `Work was taken off lines the estimate no longer has: ${reduced.unknownLineIds.join(', ')}`,
      },
    ]);
  }
  // The generated lines are all base lines: only manual add-ons and alternates carry an option.
  const lines = reduced.lines
    .filter((line) => line.optionId === null)
    .sort((a, b) => PRICE_CATEGORIES.indexOf(a.category) - PRICE_CATEGORIES.indexOf(b.category));
  const manualOptions = reduced.lines
    .filter((line) => line.optionId !== null)
    .map((line): PricedOption => {
      const tax = line.taxable
        ? roundMoney(toDecimal(line.price).times(percentToFraction(book.settings.salesTaxPct)))
        : toDecimal(0);
      return {
        id: line.optionId!,
        label: line.description,
        kind: line.kind === 'alternate' ? 'alternate' : 'add-on',
        lines: [line],
        cost: line.extendedCost,
        price: line.price,
        tax: formatMoney(tax),
      };
    });
  const categories = PRICE_CATEGORIES.map((category) => {
    const inCategory = lines.filter((line) => line.category === category);
    return {
      category,
      cost: formatMoney(sumDecimals(inCategory.map((line) => toDecimal(line.extendedCost)))),
      price: formatMoney(sumDecimals(inCategory.map((line) => toDecimal(line.price)))),
    };
  });
  return {
    content: { ...content, input },
    computed: {
      takeoff: result.takeoff,
      priced: {
        ...generated,
        lines,
        categories,
        ...estimateTotals({ lines, book, discountPct: content.discountPct }),
        options: [...generated.options, ...manualOptions],
      },
    },
  };
}

function priceManualLine(line: ManualLine, book: PriceBook): PricedLine {
  const id = `${MANUAL_PREFIX}${line.id}`;
  return priceLine(
    {
      id,
      category: line.category,
      description: line.description,
      code: null,
      quantity: roundQuantity(toDecimal(line.quantity), 2),
      unit: line.unit,
      unitCost: toDecimal(line.unitCost),
      taxable: line.taxable,
      source: 'manual',
      kind: line.kind,
      optionId: line.kind === 'base' ? null : id,
    },
    book.policy.markupPct[line.category],
  );
}
