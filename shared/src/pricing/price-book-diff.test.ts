import { describe, expect, it } from 'vitest';
import { computeTakeoff, examplePondInput } from '../engine';
import { demoPriceBook } from './demo-price-book';
import { engineParametersFromPriceBook } from './engine-parameters';
import { diffPriceBooks, diffPricedEstimates } from './price-book-diff';
import type { PriceBook } from './price-book-schema';
import { priceTakeoff } from './price-takeoff';
import { roundPriceBook } from './testing/round-price-book';

function estimate(book: PriceBook) {
  const input = examplePondInput();
  const result = computeTakeoff(input, engineParametersFromPriceBook(book));
  if (!result.ok) throw new Error('takeoff');
  return priceTakeoff({ input, takeoff: result.takeoff, book });
}

describe('diffPriceBooks', () => {
  it('finds nothing between equal books, nor between 12.5 and 12.50', () => {
    const before = demoPriceBook();
    const after = demoPriceBook();
    after.materials[0] = { ...after.materials[0]!, unitCost: '0.8900' };
    after.settings.salesTaxPct = '7.250';
    expect(diffPriceBooks(before, after)).toEqual([]);
  });

  it('lists each changed field, added and removed item, setting and policy value', () => {
    const before = demoPriceBook();
    const after = demoPriceBook();
    after.materials = after.materials
      .filter((material) => material.code !== 'PLANT-LILY')
      .map((material) =>
        material.code === 'LINER-EPDM-45'
          ? { ...material, unitCost: '0.95', taxable: false }
          : material.code === 'demo-low-2000'
            ? { ...material, pumpCurve: material.pumpCurve!.slice(1) }
            : material,
      );
    after.materials.push({
      code: 'PLANT-IRIS',
      name: 'Water iris',
      kind: 'plant',
      unit: 'each',
      unitCost: '16.00',
      taxable: true,
    });
    after.laborRoles[1] = { ...after.laborRoles[1]!, wagePerHour: '24.50' };
    after.settings.taskRoles.cleanUp = 'LEAD';
    after.settings.salesTaxPct = '8';
    after.policy.markupPct.labor = '60';
    after.productionRates.pumpSetLaborHours = 5;
    expect(diffPriceBooks(before, after)).toEqual([
      {
        section: 'material',
        code: 'LINER-EPDM-45',
        field: 'unitCost',
        before: '0.89',
        after: '0.95',
      },
      { section: 'material', code: 'LINER-EPDM-45', field: 'taxable', before: 'yes', after: 'no' },
      {
        section: 'material',
        code: 'demo-low-2000',
        field: 'pumpCurve',
        before: '0:14:165|500:12:165|1200:8:160|1650:4:155|2000:0:150',
        after: '500:12:165|1200:8:160|1650:4:155|2000:0:150',
      },
      {
        section: 'material',
        code: 'PLANT-IRIS',
        field: '(item)',
        before: null,
        after: 'Water iris',
      },
      {
        section: 'material',
        code: 'PLANT-LILY',
        field: '(item)',
        before: 'Hardy water lily',
        after: null,
      },
      {
        section: 'labor',
        code: 'INSTALLER',
        field: 'wagePerHour',
        before: '23.50',
        after: '24.50',
      },
      { section: 'rate', code: '', field: 'pumpSetLaborHours', before: '4', after: '5' },
      { section: 'setting', code: '', field: 'salesTaxPct', before: '7.25', after: '8' },
      {
        section: 'setting',
        code: '',
        field: 'taskRole.cleanUp',
        before: 'INSTALLER',
        after: 'LEAD',
      },
      { section: 'policy', code: '', field: 'markupPct.labor', before: '55', after: '60' },
    ]);
  });
});

describe('diffPricedEstimates', () => {
  it('shows what re-pricing with a new book changes, line by line and in the totals', () => {
    const book = roundPriceBook();
    const after = roundPriceBook();
    // The liner goes from 1.00 to 1.10 per ft²: 800 ft² → cost 800.00 → 880.00, price 1200.00 → 1320.00.
    after.materials = after.materials.map((material) =>
      material.code === 'LINER-EPDM-45' ? { ...material, unitCost: '1.10' } : material,
    );
    const diff = diffPricedEstimates(estimate(book), estimate(after));
    expect(diff.lines).toEqual([
      expect.objectContaining({
        id: 'liner:LINER-EPDM-45',
        change: 'changed',
        costDelta: '80.00',
        priceDelta: '120.00',
      }),
      // Contingency 10 % of direct cost: 5995.80 → 6075.80, so 599.58 → 607.58.
      expect.objectContaining({
        id: 'other:contingency',
        change: 'changed',
        costDelta: '8.00',
        priceDelta: '8.00',
      }),
    ]);
    const totals = Object.fromEntries(diff.totals.map((total) => [total.field, total.delta]));
    // Price +128.00; tax +12.00 (10 % of the liner's +120.00); total +140.00.
    expect(totals).toMatchObject({
      subtotalCost: '88.00',
      subtotalPrice: '128.00',
      tax: '12.00',
      total: '140.00',
    });
  });

  it('reports added and removed lines', () => {
    const book = roundPriceBook();
    const without = roundPriceBook();
    without.settings.mobilizationCost = '0';
    const diff = diffPricedEstimates(estimate(book), estimate(without));
    expect(diff.lines).toEqual([
      expect.objectContaining({
        id: 'other:mobilization',
        change: 'removed',
        after: null,
        priceDelta: '-200.00',
      }),
    ]);
    const back = diffPricedEstimates(estimate(without), estimate(book));
    expect(back.lines).toEqual([
      expect.objectContaining({
        id: 'other:mobilization',
        change: 'added',
        before: null,
        priceDelta: '200.00',
      }),
    ]);
    expect(diffPricedEstimates(estimate(book), estimate(book))).toEqual({ lines: [], totals: [] });
  });
});
