import { formatDate } from '@/lib/format';

/**
 * Calendar arithmetic on `YYYY-MM-DD` strings, the form the API uses. Dates are read as UTC midnight
 * so that adding days never trips over a daylight-saving change in the user's time zone.
 */

const DAY_MS = 24 * 60 * 60 * 1000;

function toUtc(iso: string): number {
  return Date.parse(`${iso}T00:00:00Z`);
}

function fromUtc(time: number): string {
  return new Date(time).toISOString().slice(0, 10);
}

export function addDays(iso: string, days: number): string {
  return fromUtc(toUtc(iso) + days * DAY_MS);
}

/** The Monday of the week `iso` falls in; Saturday and Sunday belong to the week before them. */
export function mondayOf(iso: string): string {
  const weekday = new Date(toUtc(iso)).getUTCDay(); // 0 Sunday … 6 Saturday
  return addDays(iso, -((weekday + 6) % 7));
}

/** Days from `from` to `to`, negative when `to` comes first. */
export function daysBetween(from: string, to: string): number {
  return Math.round((toUtc(to) - toUtc(from)) / DAY_MS);
}

/** Monday to Friday of the week starting `monday`. */
export function workWeek(monday: string): string[] {
  return [0, 1, 2, 3, 4].map((offset) => addDays(monday, offset));
}

export function isIsoDate(value: string | null | undefined): value is string {
  return (
    typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value) && !Number.isNaN(toUtc(value))
  );
}

const weekdayFormat = new Intl.DateTimeFormat(undefined, {
  weekday: 'short',
  month: 'short',
  day: 'numeric',
  timeZone: 'UTC',
});
const shortFormat = new Intl.DateTimeFormat(undefined, {
  month: 'short',
  day: 'numeric',
  timeZone: 'UTC',
});
const longFormat = new Intl.DateTimeFormat(undefined, {
  month: 'short',
  day: 'numeric',
  year: 'numeric',
  timeZone: 'UTC',
});

/** "Mon, Mar 2". Formatted in UTC, the zone the date was read in, so the day never shifts. */
export function formatWeekday(iso: string): string {
  return weekdayFormat.format(new Date(toUtc(iso)));
}

/** "Mar 2, 2026" for a calendar date; a timestamp is shown as the user's local date; empty when missing. */
export function formatDay(iso: string | null | undefined): string {
  return isIsoDate(iso) ? longFormat.format(new Date(toUtc(iso))) : formatDate(iso);
}

/** "Mar 2 – Mar 6, 2026", or one day when both ends are the same. */
export function formatDayRange(from: string, to: string | null): string {
  if (!to || to === from) return formatDay(from);
  const sameYear = from.slice(0, 4) === to.slice(0, 4);
  const start = sameYear ? shortFormat.format(new Date(toUtc(from))) : formatDay(from);
  return `${start} – ${formatDay(to)}`;
}
