import { describe, expect, it } from 'vitest';
import { quoteSelectionTotals } from './quote-totals';

const options = [
  { id: 'lights', price: '850.00', tax: '61.63' },
  { id: 'aerator', price: '325.00', tax: '23.56' },
];

describe('quoteSelectionTotals', () => {
  it('adds the chosen options and their tax, and takes the deposit to the cent', () => {
    // Worked by hand: 12,412.50 + 850.00 + 61.63 = 13,324.13; 30 % of it = 3,997.239 → 3,997.24
    // (half up, as estimateTotals rounds the base deposit); balance 13,324.13 − 3,997.24 = 9,326.89.
    expect(
      quoteSelectionTotals({
        baseTotal: '12412.50',
        depositPct: '30',
        options,
        chosenIds: ['lights'],
      }),
    ).toEqual({
      optionIds: ['lights'],
      optionsPrice: '850.00',
      optionsTax: '61.63',
      total: '13324.13',
      deposit: '3997.24',
      balance: '9326.89',
    });
  });

  it('ignores unknown ids, keeps the quote’s order, and takes no deposit at 0 %', () => {
    // 1,000.00 + 850.00 + 61.63 + 325.00 + 23.56 = 2,260.19.
    const totals = quoteSelectionTotals({
      baseTotal: '1000.00',
      depositPct: '0',
      options,
      chosenIds: ['aerator', 'no-such', 'lights'],
    });
    expect(totals).toMatchObject({
      optionIds: ['lights', 'aerator'],
      total: '2260.19',
      deposit: '0.00',
    });
    expect(totals.balance).toBe('2260.19');
  });
});
