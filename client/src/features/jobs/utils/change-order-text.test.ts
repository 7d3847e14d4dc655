import type { ChangeOrderLine } from '@pondwright/shared';
import { describe, expect, it } from 'vitest';
import { isCredit, lineQuantityText, lineSummaryText } from './change-order-text';

const line = (overrides: Partial<ChangeOrderLine>): ChangeOrderLine => ({
  change: 'added',
  description: 'Boulders',
  quantity: '2',
  unit: 'ton',
  fromQuantity: null,
  toQuantity: null,
  price: '255.00',
  ...overrides,
});

describe('change order text', () => {
  it('reads a negative total as a credit', () => {
    expect(isCredit({ total: '-799.65' })).toBe(true);
    expect(isCredit({ total: '255.00' })).toBe(false);
    expect(isCredit({ total: '0.00' })).toBe(false);
  });

  it('says what each line does to the job', () => {
    const reduced = line({
      change: 'reduced',
      quantity: '6',
      fromQuantity: '16',
      toQuantity: '10',
    });
    const removed = line({ change: 'removed', fromQuantity: '2', toQuantity: '0' });
    expect(lineQuantityText(line({}))).toBe('2 ton');
    expect(lineQuantityText(reduced)).toBe('16 → 10 ton');
    expect(lineSummaryText(line({}))).toBe('Boulders (2 ton)');
    expect(lineSummaryText(reduced)).toBe('Boulders (16 → 10 ton)');
    expect(lineSummaryText(removed)).toBe('Boulders (removed)');
  });
});
