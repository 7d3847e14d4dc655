import { toDecimal } from '@pondwright/shared/pricing';

/**
 * Money as the provider's API wants it: an integer count of the currency's minor unit (cents). Exact
 * with decimal.js; only two-decimal currencies are supported (ISO 4217 exponent 2, like USD and EUR).
 */
export function moneyToMinorUnits(amount: string): number {
  const minor = toDecimal(amount).times(100);
  if (!minor.isInteger()) throw new RangeError(`${amount} has more than 2 decimals`);
  return minor.toNumber();
}
