/**
 * Money and dates for the homeowner's quote page. Display only: totals come from the server or from
 * `quoteSelectionTotals`, never from these strings.
 */
const moneyFormats = new Map<string, Intl.NumberFormat>();

function moneyFormat(currency: string): Intl.NumberFormat {
  let format = moneyFormats.get(currency);
  if (!format) {
    // The narrow symbol shows "$" for US, Canadian and Australian dollars alike, as homeowners write it.
    format = new Intl.NumberFormat('en-US', {
      style: 'currency',
      currency,
      currencyDisplay: 'narrowSymbol',
      minimumFractionDigits: 2,
      maximumFractionDigits: 2,
    });
    moneyFormats.set(currency, format);
  }
  return format;
}

/** A decimal-string amount, e.g. "12412.50" → "$12,412.50". */
export function formatMoney(amount: string, currency: string): string {
  const value = Number(amount);
  return Number.isFinite(value) ? moneyFormat(currency).format(value) : amount;
}

/** A price that adds to the total: "+$850.00"; a saving keeps its minus sign. */
export function formatAddedMoney(amount: string, currency: string): string {
  const value = Number(amount);
  return value > 0 ? `+${formatMoney(amount, currency)}` : formatMoney(amount, currency);
}

/** A quantity without needless zeros: "12.000" → "12", "1250.5" → "1,250.5". */
export function formatQuantity(quantity: string): string {
  const value = Number(quantity);
  return Number.isFinite(value)
    ? value.toLocaleString('en-US', { maximumFractionDigits: 3 })
    : quantity;
}

/** True for "0", "0.00" and the like. */
export function isZeroMoney(amount: string): boolean {
  return Number(amount) === 0;
}

const dayFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'long' });
const momentFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'long', timeStyle: 'short' });

function valid(iso: string | null | undefined): Date | null {
  if (!iso) return null;
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** A calendar day in the reader's locale, e.g. "March 4, 2027"; empty for a missing value. */
export function formatDay(iso: string | null | undefined): string {
  const date = valid(iso);
  return date ? dayFormat.format(date) : '';
}

/** A day and time in the reader's locale, e.g. "March 4, 2027 at 3:05 PM". */
export function formatMoment(iso: string | null | undefined): string {
  const date = valid(iso);
  return date ? momentFormat.format(date) : '';
}

/** A percentage string without trailing zeros: "30.00" → "30%", "12.50" → "12.5%". */
export function formatPercent(percent: string): string {
  const value = Number(percent);
  return Number.isFinite(value) ? `${value}%` : `${percent}%`;
}
