import { todayIsoDate } from '@/lib/format';

export { todayIsoDate };

/** A YYYY-MM-DD day as a local date: `new Date('2026-03-04')` would be UTC midnight, the day before in the Americas. */
function localDay(iso: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  if (!match) return null;
  return new Date(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
}

export function addDays(iso: string, days: number): string {
  const day = localDay(iso);
  if (!day) return iso;
  day.setDate(day.getDate() + days);
  return todayIsoDate(day);
}

const dayFormat = new Intl.DateTimeFormat(undefined, {
  weekday: 'short',
  month: 'short',
  day: 'numeric',
});

/** "Wed, Mar 4" for a YYYY-MM-DD day; the text itself when it is not one. */
export function formatDay(iso: string | null): string {
  if (!iso) return '';
  const day = localDay(iso);
  return day ? dayFormat.format(day) : iso;
}

const timeFormat = new Intl.DateTimeFormat(undefined, {
  month: 'short',
  day: 'numeric',
  hour: 'numeric',
  minute: '2-digit',
});

export function formatTime(isoTimestamp: string): string {
  const time = new Date(isoTimestamp);
  return Number.isNaN(time.getTime()) ? '' : timeFormat.format(time);
}

export function isIsoDay(value: string | undefined): value is string {
  return value !== undefined && localDay(value) !== null;
}
