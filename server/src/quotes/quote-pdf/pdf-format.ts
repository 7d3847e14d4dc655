/**
 * How the quote PDF writes money, dates and percentages. Display only: every sum comes from the
 * pricing code (`quoteSelectionTotals`), never from these strings.
 */

const moneyFormats = new Map<string, Intl.NumberFormat>();

/** "$12,345.60" for USD; the currency's own symbol otherwise, in US number style like the app. */
export function formatMoney(amount: string, currency: string): string {
  const value = Number(amount);
  if (!Number.isFinite(value)) return amount;
  let format = moneyFormats.get(currency);
  if (!format) {
    try {
      format = new Intl.NumberFormat('en-US', {
        style: 'currency',
        currency,
        minimumFractionDigits: 2,
        maximumFractionDigits: 2,
      });
    } catch {
      // An unknown currency code must not stop a homeowner's PDF: show the code before the amount.
      return `${currency} ${value.toFixed(2)}`;
    }
    moneyFormats.set(currency, format);
  }
  return format.format(value);
}

/** True for a money string that is not zero ("0", "0.00" and "-0.00" are zero). */
export function isNonZeroMoney(amount: string): boolean {
  const value = Number(amount);
  return Number.isFinite(value) && value !== 0;
}

const dateFormats = new Map<string, Intl.DateTimeFormat>();

/**
 * A calendar date such as "Mar 4, 2026". The quote carries no time zone of its own, so dates are
 * read in `timeZone` (UTC unless the caller knows the company's zone).
 */
export function formatDate(iso: string, timeZone = 'UTC'): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  let format = dateFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      year: 'numeric',
      month: 'short',
      day: 'numeric',
      timeZone,
    });
    dateFormats.set(timeZone, format);
  }
  return format.format(date);
}

/** A percentage string without trailing zeros: "30.00" → "30 %", "12.50" → "12.5 %". */
export function formatPercent(percent: string): string {
  const value = Number(percent);
  return `${Number.isFinite(value) ? String(value) : percent} %`;
}

/** The first 12 hex digits of the version's SHA-256: enough to match a printout to its version. */
export function shortSha256(sha256: string): string {
  return sha256.slice(0, 12);
}

/** The scope's paragraphs: split on blank lines, trimmed, empty ones dropped. */
export function scopeParagraphs(scope: string): string[] {
  return scope
    .split(/\r?\n[ \t]*\r?\n/)
    .map((paragraph) => paragraph.trim())
    .filter((paragraph) => paragraph.length > 0);
}
