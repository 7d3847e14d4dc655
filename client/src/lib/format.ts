const dateFormat = new Intl.DateTimeFormat(undefined, {
  year: 'numeric',
  month: 'short',
  day: 'numeric',
});

/** A calendar date in the user's locale, e.g. "Mar 4, 2026"; empty for a missing or bad value. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : dateFormat.format(date);
}

const moneyFormats = new Map<string, Intl.NumberFormat>();

/**
 * A decimal-string amount for display, e.g. "$1,234.50"; a fraction of a cent keeps its
 * digits. Display only: sums are made by the pricing engine, never from these strings.
 */
export function formatMoney(amount: string | null | undefined, currency = 'USD'): string {
  if (amount === null || amount === undefined || amount.trim() === '') return '';
  const value = Number(amount);
  if (!Number.isFinite(value)) return amount;
  let format = moneyFormats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat('en-US', {
      style: 'currency',
      currency,
      minimumFractionDigits: 2,
      maximumFractionDigits: 4,
    });
    moneyFormats.set(currency, format);
  }
  return format.format(value);
}

/** A percentage string for display, e.g. "20 %". */
export function formatPercent(value: string | null | undefined): string {
  if (value === null || value === undefined || value === '') return '';
  return `${value} %`;
}

/** Today in the user's time zone as YYYY-MM-DD, the form a date input and the API use. */
export function todayIsoDate(now = new Date()): string {
  const pad = (part: number) => String(part).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
