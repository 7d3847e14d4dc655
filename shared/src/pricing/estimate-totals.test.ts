import { describe, expect, it } from 'vitest';
import { estimateTotals } from './estimate-totals';
import { toDecimal } from './money';
import { priceLine } from './price-line';
import type { PriceCategory } from './price-book-schema';
import { roundPriceBook } from './testing/round-price-book';

const line = (category: PriceCategory, cost: string, markupPct: string, taxable: boolean) =>
  priceLine(
    {
      id: `${category}:${cost}`,
      category,
      description: category,
      code: null,
      quantity: toDecimal(1),
      unit: 'each',
      unitCost: toDecimal(cost),
      taxable,
      source: category,
      kind: 'base',
      optionId: null,
    },
    markupPct,
  );

// Round book: sales tax 10 %, deposit 50 %, minimum job 1000, margin floor 25 %, discount ceiling 10 %.
describe('estimateTotals', () => {
  const lines = [
    line('materials', '1000.00', '50', true), // price 1500.00, taxable
    line('labor', '800.00', '25', false), // price 1000.00
    line('other', '100.00', '0', false), // price 100.00
  ];

  it('works a 10 % discount through tax, deposit and margin', () => {
    const { totals, adjustments, approval } = estimateTotals({
      lines,
      book: roundPriceBook(),
      discountPct: '10',
    });
    // subtotal cost 1000 + 800 + 100 = 1900.00; subtotal price 1500 + 1000 + 100 = 2600.00
    // discount 10 % × 2600 = 260.00, shared by price: 150.00 / 100.00 / 10.00
    // taxable = 1500.00 − 150.00 = 1350.00 (labor and other are not taxable); tax 10 % = 135.00
    // total = 2600 − 260 + 135 = 2475.00; deposit 50 % = 1237.50
    // gross profit = (2475 − 135) − 1900 = 440.00; margin 440 / 2340 = 18.803…% → 18.80
    expect(totals).toEqual({
      subtotalCost: '1900.00',
      subtotalPrice: '2600.00',
      discountPct: '10.00',
      discount: '260.00',
      minimumJobCharge: '0.00',
      taxableAmount: '1350.00',
      salesTaxPct: '10.00',
      tax: '135.00',
      total: '2475.00',
      depositPct: '50.00',
      deposit: '1237.50',
      grossProfit: '440.00',
      grossMarginPct: '18.80',
    });
    expect(adjustments).toEqual([]);
    // 18.80 % is below the 25 % floor; a 10 % discount is at, not above, the 10 % ceiling.
    expect(approval.needsApproval).toBe(true);
    expect(approval.reasons.map((reason) => reason.code)).toEqual(['margin-below-floor']);
  });

  it('taxes only taxable lines', () => {
    const book = roundPriceBook();
    const noTaxable = lines.map((item) => ({ ...item, taxable: false }));
    expect(estimateTotals({ lines: noTaxable, book, discountPct: '0' }).totals.tax).toBe('0.00');
    // Only the 100.00 "other" line taxable: 10 % × 100.00 = 10.00.
    const onlyOther = lines.map((item) => ({ ...item, taxable: item.category === 'other' }));
    expect(estimateTotals({ lines: onlyOther, book, discountPct: '0' }).totals.tax).toBe('10.00');
  });

  it('raises a small job to the minimum with an explicit, untaxed charge', () => {
    const small = [line('materials', '200.00', '50', true), line('labor', '200.00', '50', false)];
    const { totals, adjustments } = estimateTotals({
      lines: small,
      book: roundPriceBook(),
      discountPct: '20',
    });
    // prices 300.00 + 300.00 = 600.00; discount 20 % = 120.00 → 480.00 before tax
    // minimum 1000.00 → charge 520.00; taxable (300.00 − 60.00) = 240.00 → tax 24.00
    // total = 600 − 120 + 520 + 24 = 1024.00; deposit 512.00
    // gross profit = 1000.00 − 400.00 = 600.00; margin 60.00 %
    expect(totals).toMatchObject({
      discount: '120.00',
      minimumJobCharge: '520.00',
      taxableAmount: '240.00',
      tax: '24.00',
      total: '1024.00',
      deposit: '512.00',
      grossProfit: '600.00',
      grossMarginPct: '60.00',
    });
    expect(adjustments).toEqual([
      expect.objectContaining({ id: 'minimum-job-charge', amount: '520.00' }),
    ]);
  });

  it('asks for approval when the discount is above the ceiling', () => {
    const { approval } = estimateTotals({ lines, book: roundPriceBook(), discountPct: '10.01' });
    expect(approval.reasons.map((reason) => reason.code)).toContain('discount-above-ceiling');
  });

  it('has no margin when there is no price', () => {
    const book = roundPriceBook();
    book.settings.minimumJobPrice = '0';
    const { totals, approval } = estimateTotals({ lines: [], book, discountPct: '0' });
    expect(totals.total).toBe('0.00');
    expect(totals.grossMarginPct).toBeNull();
    expect(approval.needsApproval).toBe(true);
  });
});
