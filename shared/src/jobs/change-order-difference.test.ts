import { describe, expect, it } from 'vitest';
import { estimateTotals } from '../pricing/estimate-totals';
import { toDecimal } from '../pricing/money';
import { priceLine } from '../pricing/price-line';
import type { PriceCategory } from '../pricing/price-book-schema';
import type { PricedEstimate, PricedLine, PricedOption } from '../pricing/priced-estimate-schema';
import { reducePricedLines } from '../pricing/reduce-lines';
import { roundPriceBook } from '../pricing/testing/round-price-book';
import { changeOrderDifference } from './change-order-difference';

// The round book: markups materials and labor 50 %, sales tax 10 % (taxable lines only), minimum
// job 1000.00 before tax.
const book = roundPriceBook();

const priced = (
  id: string,
  category: PriceCategory,
  quantity: string,
  unitCost: string,
  taxable: boolean,
  optionId: string | null = null,
): PricedLine =>
  priceLine(
    {
      id,
      category,
      description: `Line ${id}`,
      code: null,
      quantity: toDecimal(quantity),
      unit: category === 'labor' ? 'h' : 't',
      unitCost: toDecimal(unitCost),
      taxable,
      source: id,
      kind: optionId ? 'add-on' : 'base',
      optionId,
    },
    book.policy.markupPct[category],
  );

function estimate(lines: PricedLine[], options: PricedOption[] = []): PricedEstimate {
  return {
    currency: 'USD',
    lines,
    categories: [],
    ...estimateTotals({ lines, book, discountPct: '0' }),
    options,
    missing: [],
    complete: true,
  };
}

function option(line: PricedLine): PricedOption {
  // Option tax: 10 % of its taxable price.
  const tax = line.taxable ? toDecimal(line.price).times('0.1').toFixed(2) : '0.00';
  return {
    id: line.optionId!,
    label: line.description,
    kind: 'add-on',
    lines: [line],
    cost: line.extendedCost,
    price: line.price,
    tax,
  };
}

// Before: boulders 20 t × 100.00 = 2000.00 cost, price 3000.00 (taxable); rock placing 30 h × 40.00
// = 1200.00, price 1800.00. Subtotal 4800.00; tax 10 % × 3000.00 = 300.00; total 5100.00.
const boulders = priced('boulders', 'materials', '20', '100.00', true);
const placing = priced('placing', 'labor', '30', '40.00', false);
const step = priced('manual:co1-1', 'materials', '1', '80.00', true);

describe('changeOrderDifference', () => {
  it('prices a credit: work taken off at its sold rates, new work added, a negative total', () => {
    const before = estimate([boulders, placing]);
    expect(before.totals.total).toBe('5100.00');
    // After: boulders kept at 12 t (1200.00 cost, 1800.00 price), rock placing taken off, a step
    // added (80.00 cost, 120.00 price). Subtotal 1920.00; tax 10 % × 1920.00 = 192.00; total 2112.00.
    const reduced = reducePricedLines(
      [boulders, placing],
      [
        { lineId: 'boulders', newQuantity: '12' },
        { lineId: 'placing', newQuantity: '0' },
      ],
    ).lines;
    const after = estimate([...reduced, step]);
    expect(after.totals.total).toBe('2112.00');

    const difference = changeOrderDifference({
      before,
      after,
      chosenOptionIds: [],
      addedLineIds: ['manual:co1-1'],
      reducedLineIds: ['boulders', 'placing'],
    });
    // 2112.00 − 5100.00; tax 192.00 − 300.00; before tax −1200.00 − 1800.00 + 120.00.
    expect(difference).toMatchObject({
      total: '-2988.00',
      tax: '-108.00',
      priceBeforeTax: '-2880.00',
      // 80.00 + (1200.00 − 2000.00) + (0 − 1200.00).
      cost: '-1920.00',
    });
    expect(difference.lines).toEqual([
      {
        change: 'added',
        description: 'Line manual:co1-1',
        quantity: '1',
        unit: 't',
        fromQuantity: null,
        toQuantity: null,
        price: '120.00',
      },
      {
        change: 'reduced',
        description: 'Line boulders',
        quantity: '8',
        unit: 't',
        fromQuantity: '20',
        toQuantity: '12',
        price: '-1200.00',
      },
      {
        change: 'removed',
        description: 'Line placing',
        quantity: '30',
        unit: 'h',
        fromQuantity: '30',
        toQuantity: '0',
        price: '-1800.00',
      },
    ]);
    expect(difference.added).toEqual([step]);
    expect(difference.reductions).toEqual([
      {
        id: 'boulders',
        quantity: '12',
        extendedCost: '1200.00',
        price: '1800.00',
        previous: { quantity: '20', extendedCost: '2000.00', price: '3000.00' },
      },
      {
        id: 'placing',
        quantity: '0',
        extendedCost: '0.00',
        price: '0.00',
        previous: { quantity: '30', extendedCost: '1200.00', price: '1800.00' },
      },
    ]);
  });

  it('follows the minimum job charge and counts a chosen option taken off', () => {
    // Before: boulders 10 t (1500.00 price) and a chosen bench add-on (600.00, tax 60.00) beside a
    // refused fountain. Base total 1500.00 + 10 % tax = 1650.00.
    const small = priced('boulders', 'materials', '10', '100.00', true);
    const bench = priced('bench', 'materials', '4', '100.00', true, 'bench');
    const fountain = priced('fountain', 'materials', '1', '300.00', true, 'fountain');
    const before = estimate([small], [option(bench), option(fountain)]);
    // After: boulders kept at 4 t (600.00), the bench gone. 600.00 is below the 1000.00 minimum, so
    // a 400.00 charge lifts it; tax 10 % × 600.00 = 60.00 (the charge is not taxed): total 1060.00.
    const after = estimate(
      reducePricedLines([small], [{ lineId: 'boulders', newQuantity: '4' }]).lines,
      [option(fountain)],
    );
    expect(after.totals.total).toBe('1060.00');

    const difference = changeOrderDifference({
      before,
      after,
      chosenOptionIds: ['bench'],
      addedLineIds: [],
      reducedLineIds: ['boulders', 'bench'],
    });
    // Base 1060.00 − 1650.00 = −590.00; the bench −(600.00 + 60.00): −1250.00 in all.
    // Tax (60.00 − 150.00) − 60.00 = −150.00; before tax −1100.00 (lines −900.00 − 600.00, + 400.00
    // of minimum charge).
    expect(difference).toMatchObject({
      total: '-1250.00',
      tax: '-150.00',
      priceBeforeTax: '-1100.00',
    });
    expect(difference.lines.map((line) => [line.change, line.price])).toEqual([
      ['reduced', '-900.00'],
      ['removed', '-600.00'],
    ]);
  });

  it('refuses to take off a line the version in force lacks, like a refused option’s', () => {
    const fountain = priced('fountain', 'materials', '1', '300.00', true, 'fountain');
    const before = estimate([boulders], [option(fountain)]);
    expect(() =>
      changeOrderDifference({
        before,
        after: before,
        chosenOptionIds: [],
        addedLineIds: [],
        reducedLineIds: ['fountain'],
      }),
    ).toThrow(RangeError);
  });
});
