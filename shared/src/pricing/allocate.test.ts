import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { allocate } from './allocate';
import { sumDecimals, toDecimal } from './money';

const d = (values: string[]) => values.map((value) => toDecimal(value));
const strings = (values: ReturnType<typeof allocate>) => values.map((value) => value.toFixed(2));

describe('allocate', () => {
  it('gives the leftover cent to the earliest of equal remainders', () => {
    // 100.00 / 3 = 33.333…: 3333 cents each, 1 cent left → the first part.
    expect(strings(allocate(toDecimal('100.00'), d(['1', '1', '1'])))).toEqual([
      '33.34',
      '33.33',
      '33.33',
    ]);
  });

  it('shares 4 tons of boulders over a 1.97 / 2.30 / 1.38 mix', () => {
    // Exact: 400 × 1.97/5.65 = 139.469…, 400 × 2.30/5.65 = 162.831…, 400 × 1.38/5.65 = 97.699…
    // hundredths; floors 139 + 162 + 97 = 398, the 2 left go to the largest remainders (.831, .699).
    expect(strings(allocate(toDecimal('4.00'), d(['1.97', '2.30', '1.38'])))).toEqual([
      '1.39',
      '1.63',
      '0.98',
    ]);
  });

  it('splits evenly when every weight is zero, and handles a negative total', () => {
    expect(strings(allocate(toDecimal('0.05'), d(['0', '0'])))).toEqual(['0.03', '0.02']);
    expect(strings(allocate(toDecimal('-10.00'), d(['1', '3'])))).toEqual(['-2.50', '-7.50']);
  });

  it('refuses what it cannot split exactly', () => {
    expect(() => allocate(toDecimal('1.005'), d(['1']))).toThrow(RangeError);
    expect(() => allocate(toDecimal('1.00'), [])).toThrow(RangeError);
    expect(() => allocate(toDecimal('1.00'), d(['-1', '2']))).toThrow(RangeError);
  });

  it('parts always add up to the total and each is within a cent of its exact share', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -10_000_000, max: 10_000_000 }),
        fc.array(fc.integer({ min: 0, max: 1_000_000 }), { minLength: 1, maxLength: 30 }),
        (cents, weights) => {
          const total = toDecimal(cents).dividedBy(100);
          const parts = allocate(
            total,
            weights.map((weight) => toDecimal(weight)),
          );
          expect(sumDecimals(parts).equals(total)).toBe(true);
          const weightSum = weights.reduce((a, b) => a + b, 0);
          parts.forEach((part, index) => {
            const exact =
              weightSum === 0
                ? total.dividedBy(weights.length)
                : total.times(weights[index]!).dividedBy(weightSum);
            expect(part.minus(exact).abs().lessThan(0.01)).toBe(true);
          });
        },
      ),
    );
  });
});
