import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeTakeoff, examplePondInput } from '../engine';
import { allocate } from './allocate';
import { demoPriceBook } from './demo-price-book';
import { engineParametersFromPriceBook } from './engine-parameters';
import { percentToFraction, roundMoney, sumDecimals, toDecimal } from './money';
import { priceBookSchema, type PriceBook } from './price-book-schema';
import { priceTakeoff } from './price-takeoff';
import { pricedEstimateSchema, type PricedEstimate } from './priced-estimate-schema';

const cents = (max: number) =>
  fc
    .integer({ min: 0, max })
    .map((c) => `${Math.floor(c / 100)}.${String(c % 100).padStart(2, '0')}`);
const percent = (max: number) =>
  fc
    .integer({ min: 0, max: max * 100 })
    .map((h) => `${Math.floor(h / 100)}.${String(h % 100).padStart(2, '0')}`);

/** The demo book with generated costs, markups, taxes and settings. */
const bookArbitrary = fc
  .record({
    costFactors: fc.array(fc.integer({ min: 0, max: 400 }), { minLength: 200, maxLength: 200 }),
    taxable: fc.array(fc.boolean(), { minLength: 200, maxLength: 200 }),
    markups: fc.tuple(percent(200), percent(200), percent(200), percent(200), percent(200)),
    wage: cents(6000),
    burden: percent(60),
    mobilization: cents(100000),
    minimumJob: cents(2_000_000),
    contingency: percent(20),
    salesTax: percent(12),
    deposit: percent(100),
    floor: percent(60),
    ceiling: percent(30),
  })
  .map((g): PriceBook => {
    const book = demoPriceBook();
    const [materials, labor, equipment, disposal, other] = g.markups;
    return priceBookSchema.parse({
      ...book,
      materials: book.materials.map((material, index) => ({
        ...material,
        // Scale each cost by 0–4× and round to 4 decimals (fractions of a cent included).
        unitCost: toDecimal(material.unitCost)
          .times(g.costFactors[index]!)
          .dividedBy(100)
          .toDecimalPlaces(4)
          .toFixed(),
        taxable: g.taxable[index]!,
      })),
      laborRoles: book.laborRoles.map((role) => ({
        ...role,
        wagePerHour: g.wage,
        burdenPct: g.burden,
      })),
      settings: {
        ...book.settings,
        mobilizationCost: g.mobilization,
        minimumJobPrice: g.minimumJob,
        contingencyPct: g.contingency,
        salesTaxPct: g.salesTax,
        depositPct: g.deposit,
      },
      policy: {
        markupPct: { materials, labor, equipment, disposal, other },
        marginFloorPct: g.floor,
        discountCeilingPct: g.ceiling,
      },
    });
  });

const inputArbitrary = fc
  .record({
    lengthFt: fc.integer({ min: 6, max: 40 }),
    widthFt: fc.integer({ min: 5, max: 25 }),
    depthFt: fc.constantFrom(1.5, 2, 2.5, 3),
    method: fc.constantFrom('auto', 'hand', 'machine') as fc.Arbitrary<'auto' | 'hand' | 'machine'>,
    lighting: fc.boolean(),
    hauledPct: fc.integer({ min: 0, max: 100 }),
  })
  .map((g) => {
    const base = examplePondInput();
    return examplePondInput({
      basins: [
        {
          ...base.basins[0]!,
          outline: {
            shape: 'rectangle',
            lengthFt: g.lengthFt,
            widthFt: Math.min(g.widthFt, g.lengthFt),
          },
          maxDepthFt: g.depthFt,
        },
      ],
      lighting: g.lighting ? base.lighting : [],
      site: { ...base.site, excavationMethod: g.method, spoilHauledPct: g.hauledPct },
    });
  });

const sum = (values: string[]) => sumDecimals(values.map((value) => toDecimal(value)));

function estimateFor(
  book: PriceBook,
  input: ReturnType<typeof examplePondInput>,
  discountPct: string,
): PricedEstimate | null {
  const result = computeTakeoff(input, engineParametersFromPriceBook(book));
  if (!result.ok) return null;
  return priceTakeoff({ input, takeoff: result.takeoff, book, discountPct, lighting: 'base' });
}

describe('priceTakeoff properties', () => {
  it('totals are the sums of their rounded lines, and tax falls only on taxable lines', () => {
    fc.assert(
      fc.property(bookArbitrary, inputArbitrary, percent(100), (book, input, discountPct) => {
        const estimate = estimateFor(book, input, discountPct);
        if (estimate === null) return;
        pricedEstimateSchema.parse(estimate);
        const t = estimate.totals;
        expect(sum(estimate.lines.map((line) => line.extendedCost)).toFixed(2)).toBe(
          t.subtotalCost,
        );
        expect(sum(estimate.lines.map((line) => line.price)).toFixed(2)).toBe(t.subtotalPrice);
        expect(sum(estimate.categories.map((c) => c.price)).toFixed(2)).toBe(t.subtotalPrice);
        expect(
          toDecimal(t.subtotalPrice)
            .minus(t.discount)
            .plus(t.minimumJobCharge)
            .plus(t.tax)
            .toFixed(2),
        ).toBe(t.total);
        // Tax: recomputed from the taxable lines alone, after their share of the discount.
        const prices = estimate.lines.map((line) => toDecimal(line.price));
        const shares = prices.length > 0 ? allocate(toDecimal(t.discount), prices) : [];
        const taxable = sumDecimals(
          estimate.lines.flatMap((line, i) => (line.taxable ? [prices[i]!.minus(shares[i]!)] : [])),
        );
        expect(taxable.toFixed(2)).toBe(t.taxableAmount);
        expect(
          roundMoney(taxable.times(percentToFraction(book.settings.salesTaxPct))).toFixed(2),
        ).toBe(t.tax);
        if (!estimate.lines.some((line) => line.taxable)) expect(t.tax).toBe('0.00');
        // Deposit never exceeds the total; the price before tax never falls below the minimum.
        expect(toDecimal(t.deposit).lessThanOrEqualTo(t.total)).toBe(true);
        expect(
          toDecimal(t.total).minus(t.tax).greaterThanOrEqualTo(book.settings.minimumJobPrice),
        ).toBe(true);
        expect(
          toDecimal(t.grossProfit).equals(toDecimal(t.total).minus(t.tax).minus(t.subtotalCost)),
        ).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it('with no discount, no line and no total sells below cost', () => {
    fc.assert(
      fc.property(bookArbitrary, inputArbitrary, (book, input) => {
        const estimate = estimateFor(book, input, '0');
        if (estimate === null) return;
        for (const line of estimate.lines) {
          expect(toDecimal(line.price).greaterThanOrEqualTo(line.extendedCost)).toBe(true);
        }
        const t = estimate.totals;
        expect(toDecimal(t.total).minus(t.tax).greaterThanOrEqualTo(t.subtotalCost)).toBe(true);
        expect(toDecimal(t.grossProfit).isNegative()).toBe(false);
      }),
      { numRuns: 100 },
    );
  });

  it('needs approval exactly when the margin is below the floor or the discount above the ceiling', () => {
    fc.assert(
      fc.property(bookArbitrary, inputArbitrary, percent(40), (book, input, discountPct) => {
        const estimate = estimateFor(book, input, discountPct);
        if (estimate === null) return;
        const margin = estimate.totals.grossMarginPct;
        // The margin shown is rounded; compare with the exact one, which decides on the boundary.
        const exactBelow =
          margin === null
            ? toDecimal(book.policy.marginFloorPct).greaterThan(0)
            : toDecimal(estimate.totals.grossProfit)
                .times(100)
                .dividedBy(toDecimal(estimate.totals.total).minus(estimate.totals.tax))
                .lessThan(book.policy.marginFloorPct);
        const above = toDecimal(discountPct).greaterThan(book.policy.discountCeilingPct);
        expect(estimate.approval.needsApproval).toBe(exactBelow || above);
      }),
      { numRuns: 100 },
    );
  });
});
