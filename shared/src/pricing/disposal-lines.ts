import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import { toDecimal } from './money';
import type { PriceBook } from './price-book-schema';
import type { MissingItem } from './priced-estimate-schema';
import { roundQuantity, type LineDraft } from './price-line';

/**
 * Spoil disposal with the book's default disposal: per loose yd³ → the takeoff's hauled loose yd³
 * (0.01 yd³); per short ton → the takeoff's spoil weight × the share hauled (0.01 t). Not taxable. No
 * line when nothing is hauled.
 */
export function disposalLines(args: { input: TakeoffInput; takeoff: Takeoff; book: PriceBook }): {
  drafts: LineDraft[];
  missing: MissingItem[];
} {
  const { input, takeoff, book } = args;
  const dig = takeoff.excavation;
  const code = book.settings.defaultDisposalCode;
  const disposal = book.disposal.find((item) => item.code === code);
  const perYard = disposal?.basis !== 'per-short-ton';
  const quantity = perYard
    ? roundQuantity(dig.hauledLooseCuYd, 2)
    : roundQuantity(
        toDecimal(dig.massShortTons).times(input.site.spoilHauledPct).dividedBy(100),
        2,
      );
  if (quantity.isZero()) return { drafts: [], missing: [] };
  if (!disposal) {
    return {
      drafts: [],
      missing: [
        {
          kind: 'disposal',
          source: 'disposal',
          need: `the default disposal (${code})`,
          message: `Add the disposal ${code} to your price book, or choose another default disposal.`,
          optionId: null,
        },
      ],
    };
  }
  return {
    drafts: [
      {
        id: `disposal:${disposal.code}`,
        category: 'disposal',
        description: disposal.name,
        code: disposal.code,
        quantity,
        unit: perYard ? 'cu yd' : 'short ton',
        unitCost: toDecimal(disposal.unitCost),
        taxable: false,
        source: 'disposal',
        kind: 'base',
        optionId: null,
      },
    ],
    missing: [],
  };
}
