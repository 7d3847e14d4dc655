import { describe, expect, it } from 'vitest';
import {
  formatMoney,
  formatPercent,
  formatUnitCost,
  percentToFraction,
  roundMoney,
  sumDecimals,
  toDecimal,
} from './money';

describe('money', () => {
  it('rounds to cents half up, exactly where floats go wrong', () => {
    // 2.675 is 2.67499999… as a float, so (2.675).toFixed(2) is "2.67"; as a decimal it is exact.
    expect((2.675).toFixed(2)).toBe('2.67');
    expect(formatMoney(toDecimal('2.675'))).toBe('2.68');
    expect(formatMoney(toDecimal('0.005'))).toBe('0.01');
    expect(formatMoney(toDecimal('1.0049999'))).toBe('1.00');
    // Half up rounds a tie away from zero on either side.
    expect(roundMoney(toDecimal('-1.005')).toFixed(2)).toBe('-1.01');
  });

  it('never writes minus zero', () => {
    expect(formatMoney(toDecimal('-0.001'))).toBe('0.00');
    expect(formatPercent(toDecimal('-0.001'))).toBe('0.00');
  });

  it('keeps 2 to 4 decimals on unit costs', () => {
    expect(formatUnitCost(toDecimal('5'))).toBe('5.00');
    expect(formatUnitCost(toDecimal('0.85'))).toBe('0.85');
    // 22.50 × 1.275 burden = 28.6875: kept, since hours × rate is rounded at the line.
    expect(formatUnitCost(toDecimal('28.6875'))).toBe('28.6875');
    expect(formatUnitCost(toDecimal('1.123456'))).toBe('1.1235');
  });

  it('reads percentages as exact fractions and sums exactly', () => {
    expect(percentToFraction('7.25').toString()).toBe('0.0725');
    // 0.1 + 0.2 is 0.30000000000000004 as floats.
    expect(sumDecimals([toDecimal('0.1'), toDecimal('0.2')]).toString()).toBe('0.3');
    expect(sumDecimals([]).toString()).toBe('0');
  });

  it('refuses text that is not a number', () => {
    expect(() => toDecimal('12,50')).toThrow(RangeError);
    expect(() => toDecimal('')).toThrow(RangeError);
    expect(() => toDecimal(Number.NaN)).toThrow(RangeError);
  });
});
