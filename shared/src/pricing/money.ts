import Decimal from 'decimal.js';

/**
 * The decimal type every pricing figure is computed with: 40 significant digits (far beyond any
 * price book: 9 integer digits and 4 decimals) so that divisions (markup ↔ margin, shares of a
 * discount) lose nothing before the named rounding points. A private clone, so a `Decimal.set(…)`
 * elsewhere in an application cannot change how Pondwright prices.
 */
export const PricingDecimal = Decimal.clone({
  precision: 40,
  rounding: Decimal.ROUND_HALF_UP,
  toExpNeg: -30,
  toExpPos: 40,
});

/**
 * Money is rounded half up (0.005 → 0.01): the rule customers, tax tables and hand calculators use,
 * so every line can be checked with a pencil. Banker's rounding would be unbiased over many lines,
 * but Pondwright rounds once per line and totals are sums of rounded lines, so the bias never compounds.
 */
export const MONEY_ROUNDING = Decimal.ROUND_HALF_UP;

/** Unit costs may keep fractions of a cent (4 decimals), as the price book stores them. */
export const UNIT_COST_DECIMALS = 4;

/** Reads a decimal string (money, percentage or quantity) exactly. Throws on anything that is not a number. */
export function toDecimal(value: string | number | Decimal): Decimal {
  const text = typeof value === 'string' ? value.trim() : value;
  if (text === '') throw new RangeError('Expected a number, got an empty string');
  let decimal: Decimal;
  try {
    decimal = new PricingDecimal(text);
  } catch {
    throw new RangeError(`Expected a number, got "${String(value)}"`);
  }
  if (!decimal.isFinite()) throw new RangeError(`Expected a finite number, got ${String(value)}`);
  return decimal;
}

/** An amount rounded to cents, half up (see `MONEY_ROUNDING`). The one rounding point for money. */
export function roundMoney(amount: Decimal): Decimal {
  return new PricingDecimal(amount).toDecimalPlaces(2, MONEY_ROUNDING);
}

/** Money as a string with exactly 2 decimals, rounded half up: `12.5` → `"12.50"`. */
export function formatMoney(amount: Decimal): string {
  const rounded = roundMoney(amount);
  // Never "-0.00": a negative amount that rounds to zero is zero.
  return rounded.isZero() ? '0.00' : rounded.toFixed(2);
}

/**
 * A unit cost as a string with 2 to 4 decimals, rounded half up at the 4th: `28.6875`, `0.85`,
 * `1.1234`. Extended costs are computed from this shown figure, so each line can be checked by hand.
 */
export function roundUnitCost(amount: Decimal): Decimal {
  return new PricingDecimal(amount).toDecimalPlaces(UNIT_COST_DECIMALS, MONEY_ROUNDING);
}

/** `roundUnitCost` as a string with at least 2 and at most 4 decimals. */
export function formatUnitCost(amount: Decimal): string {
  const rounded = roundUnitCost(amount);
  return rounded.toFixed(Math.max(2, rounded.decimalPlaces()));
}

/** A percentage string ("35", "7.25") as a fraction (0.35, 0.0725), exactly. */
export function percentToFraction(percent: string | Decimal): Decimal {
  return toDecimal(percent).dividedBy(100);
}

/** A percentage as a string with exactly 2 decimals, rounded half up: `33.333…` → `"33.33"`. */
export function formatPercent(percent: Decimal): string {
  const rounded = new PricingDecimal(percent).toDecimalPlaces(2, MONEY_ROUNDING);
  return rounded.isZero() ? '0.00' : rounded.toFixed(2);
}

/** Sums amounts exactly (no rounding); 0 for an empty list. */
export function sumDecimals(amounts: ReadonlyArray<Decimal>): Decimal {
  return amounts.reduce<Decimal>((sum, amount) => sum.plus(amount), new PricingDecimal(0));
}
