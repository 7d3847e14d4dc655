import { describe, expect, it } from 'vitest';
import { toDecimal } from './money';
import { priceLine } from './price-line';
import type { PricedLine } from './priced-estimate-schema';
import { reducePricedLines } from './reduce-lines';

const line = (id: string, quantity: string, unitCost: string, markupPct: string): PricedLine =>
  priceLine(
    {
      id,
      category: 'materials',
      description: `Item ${id}`,
      code: id.toUpperCase(),
      quantity: toDecimal(quantity),
      unit: 'ton',
      unitCost: toDecimal(unitCost),
      taxable: true,
      source: `material:${id}`,
      kind: 'base',
      optionId: null,
    },
    markupPct,
  );

describe('reducePricedLines', () => {
  it('prices a reduced line again at its own unit cost and markup', () => {
    // 6 t × 165.00 = 990.00 cost, × 1.35 = 1336.50. Keeping 3.5 t: 3.5 × 165.00 = 577.50, × 1.35 =
    // 779.625 → 779.63 (half up), so 556.87 comes off the price.
    const boulders = line('boulders', '6', '165.00', '35');
    expect(boulders.price).toBe('1336.50');
    const { lines, unknownLineIds } = reducePricedLines(
      [boulders],
      [{ lineId: 'boulders', newQuantity: '3.5' }],
    );
    expect(unknownLineIds).toEqual([]);
    expect(lines).toEqual([
      {
        ...boulders,
        quantity: '3.5',
        extendedCost: '577.50',
        price: '779.63',
      },
    ]);
  });

  it('leaves out a line that keeps nothing and passes the others through in order', () => {
    const a = line('a', '2', '10.00', '20');
    const b = line('b', '4', '12.50', '20');
    const c = line('c', '1', '99.99', '20');
    const { lines } = reducePricedLines([a, b, c], [{ lineId: 'b', newQuantity: '0' }]);
    expect(lines).toEqual([a, c]);
  });

  it('names the reductions that match no line', () => {
    const a = line('a', '2', '10.00', '20');
    expect(
      reducePricedLines([a], [{ lineId: 'gone', newQuantity: '0' }]).unknownLineIds,
    ).toEqual(['gone']);
  });

  it('refuses to add to a line, a negative quantity, or the same line twice', () => {
    const a = line('a', '2', '10.00', '20');
    expect(() => reducePricedLines([a], [{ lineId: 'a', newQuantity: '2.01' }])).toThrow(
      RangeError,
    );
    expect(() => reducePricedLines([a], [{ lineId: 'a', newQuantity: '-1' }])).toThrow(RangeError);
    expect(() =>
      reducePricedLines(
        [a],
        [
          { lineId: 'a', newQuantity: '1' },
          { lineId: 'a', newQuantity: '0' },
        ],
      ),
    ).toThrow(RangeError);
  });
});
