import type { EstimateComputed, EstimateContent, ManualLine } from '@pondwright/shared';
import { examplePondInput } from '@pondwright/shared/engine';
import type { PriceBook } from '@pondwright/shared/pricing';
import { priceEstimateContent } from '../estimates/price-estimate';

/** Every seeded estimate has this many priced lines, as the issue asks ("30 line items each"). */
export const LINES_PER_ESTIMATE = 30;

/**
 * The typical pond prices to 26 generated lines with the starter book; these manual base lines (the kind
 * an estimator adds by hand) bring it to 30. Base lines, so they count among the quote's lines.
 */
const MANUAL_LINES: ManualLine[] = [
  line('edging', 'materials', 'Flagstone edging, 2 in', '48', 'ft', '9.50'),
  line('marginals', 'materials', 'Marginal plants, 1 gal', '24', 'ea', '8.75'),
  line('compactor', 'equipment', 'Plate compactor, 1 day', '1', 'day', '85.00'),
  line('permit', 'other', 'Site permit and inspection fee', '1', 'ea', '150.00'),
];

/**
 * The content and server-computed figures every bench estimate starts from: the real estimate shape,
 * priced by the same function a save uses, so the stored drafts and versions are exactly what the
 * server would have stored. Title and customer are swapped in per estimate when seeding.
 */
export function benchEstimate(book: PriceBook): {
  content: EstimateContent;
  computed: EstimateComputed;
} {
  const priced = priceEstimateContent(
    {
      title: 'Bench pond',
      customerId: '00000000-0000-4000-8000-000000000000',
      siteId: null,
      input: examplePondInput(),
      discountPct: '0',
      manualLines: MANUAL_LINES,
      scope: 'A lined pond with a waterfall and a short stream; spoil hauled away.',
      notes: '',
    },
    book,
  );
  const lines = priced.computed.priced.lines.length;
  if (lines !== LINES_PER_ESTIMATE) {
    throw new Error(`The bench estimate prices to ${lines} lines, not ${LINES_PER_ESTIMATE}`);
  }
  return priced;
}

/**
 * The JSON body of `PUT /api/estimates/:id/draft` for one estimate, as a function of the revision it is
 * saved from: the content is serialised once, so the load generator spends its CPU on requests.
 */
export function draftBodyFor(
  content: EstimateContent,
  estimate: { title: string; customerId: string },
): (revision: number) => string {
  const prefix = JSON.stringify({ ...content, ...estimate }).slice(0, -1);
  return (revision) => `${prefix},"revision":${revision}}`;
}

function line(
  id: string,
  category: ManualLine['category'],
  description: string,
  quantity: string,
  unit: string,
  unitCost: string,
): ManualLine {
  return { id, category, description, quantity, unit, unitCost, taxable: true, kind: 'base' };
}
