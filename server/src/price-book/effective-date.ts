import { z } from 'zod';

/**
 * Today's date (YYYY-MM-DD) in the server's time zone: the one clock that decides which price-book version
 * is in effect, what a new version defaults to, and that no version is back-dated.
 */
export function todayIsoDate(now: Date = new Date()): string {
  const pad = (value: number) => String(value).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A version takes effect today or later: back-dating would rewrite what earlier work was priced with. */
export const effectiveDateSchema = z.iso
  .date({ error: 'Enter a date as YYYY-MM-DD' })
  .refine((date) => date >= todayIsoDate(), 'Choose today or a later date');

export const versionNoteSchema = z
  .string({ error: 'Enter a note' })
  .trim()
  .max(500, 'Use at most 500 characters');
