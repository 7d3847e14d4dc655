import type Decimal from 'decimal.js';
import { PricingDecimal, sumDecimals } from './money';

/**
 * Splits `total` into parts proportional to `weights`, each a multiple of 10^-`decimals` (cents by
 * default), that always add up to exactly `total`. Each part is first rounded down (toward zero); the
 * units left over go one each to the parts with the largest remainders, ties to the earlier part
 * (largest-remainder method). With every weight zero the total is split evenly the same way.
 *
 * @param total    the amount to split, already a multiple of 10^-decimals; may be negative.
 * @param weights  non-negative shares (prices, tons, …); at least one.
 * @param decimals scale of the parts: 2 for money, 2 for tons to 0.01.
 * @throws RangeError on an empty list, a negative weight or a total with more decimals than `decimals`.
 */
export function allocate(total: Decimal, weights: ReadonlyArray<Decimal>, decimals = 2): Decimal[] {
  if (weights.length === 0) throw new RangeError('allocate needs at least one weight');
  if (weights.some((weight) => weight.isNegative() && !weight.isZero())) {
    throw new RangeError('allocate takes non-negative weights');
  }
  const unit = new PricingDecimal(10).pow(-decimals);
  const units = new PricingDecimal(total).dividedBy(unit);
  if (!units.isInteger()) {
    throw new RangeError(`allocate: ${total.toString()} has more than ${decimals} decimals`);
  }
  const weightSum = sumDecimals(weights);
  const shares = weightSum.isZero()
    ? weights.map(() => new PricingDecimal(1).dividedBy(weights.length))
    : weights.map((weight) => weight.dividedBy(weightSum));
  const sign = units.isNegative() ? -1 : 1;
  const whole = units.abs();
  const exact = shares.map((share) => whole.times(share));
  const floors = exact.map((value) => value.floor());
  let left = whole.minus(sumDecimals(floors)).toNumber();
  const order = exact
    .map((value, index) => ({ index, remainder: value.minus(floors[index]!) }))
    .sort((a, b) => b.remainder.comparedTo(a.remainder) || a.index - b.index);
  for (const { index } of order) {
    if (left <= 0) break;
    floors[index] = floors[index]!.plus(1);
    left -= 1;
  }
  return floors.map((count) =>
    count.isZero() ? new PricingDecimal(0) : count.times(unit).times(sign),
  );
}
