import { describe, expect, it } from 'vitest';
import { PricingDecimal, toDecimal } from './money';
import { priceLine, roundQuantity, type LineDraft } from './price-line';

const draft = (quantity: string, unitCost: string): LineDraft => ({
  id: 'x',
  category: 'materials',
  description: 'Test item',
  code: 'X',
  quantity: toDecimal(quantity),
  unit: 'each',
  unitCost: toDecimal(unitCost),
  taxable: true,
  source: 'test',
  kind: 'base',
  optionId: null,
});

describe('priceLine', () => {
  it('rounds once at the extended cost and once at the price', () => {
    // 1.97 t × 165.00 = 325.05; × 1.35 = 438.8175 → 438.82.
    const line = priceLine(draft('1.97', '165.00'), '35');
    expect(line).toMatchObject({
      quantity: '1.97',
      unitCost: '165.00',
      extendedCost: '325.05',
      markupPct: '35.00',
      price: '438.82',
    });
  });

  it('prices fractions of a cent from the shown 4-decimal unit cost', () => {
    // 13.8 h × 28.6875 = 395.8875 → 395.89; × 1.45 = 574.0405 → 574.04.
    const line = priceLine(draft('13.8', '28.6875'), '45');
    expect(line.unitCost).toBe('28.6875');
    expect(line.extendedCost).toBe('395.89');
    expect(line.price).toBe('574.04');
    // A unit cost with more decimals is first rounded to 4: 0.12345 → 0.1235; × 1000 = 123.50.
    expect(priceLine(draft('1000', '0.12345'), '0').extendedCost).toBe('123.50');
  });

  it('writes quantities plainly', () => {
    expect(priceLine(draft('800', '1'), '0').quantity).toBe('800');
    expect(roundQuantity(1.005, 2).toString()).toBe('1.01');
    expect(roundQuantity(new PricingDecimal('13.85'), 1).toString()).toBe('13.9');
  });
});
