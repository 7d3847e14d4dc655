import { diffPriceBooks, type PriceBook } from '@pondwright/shared/pricing';

const DECIMAL = /^\s*-?\d+(\.\d+)?\s*$/;

/**
 * The draft with every amount that does not read as a number yet ("", "1.2.3") put back to
 * its saved value, and how many were: the pricing module compares amounts by value and
 * cannot read those.
 */
function readable(before: unknown, after: unknown, count: { unreadable: number }): unknown {
  if (typeof after === 'string' && typeof before === 'string') {
    if (DECIMAL.test(before) && !DECIMAL.test(after)) {
      count.unreadable += 1;
      return before;
    }
    return after;
  }
  if (Array.isArray(after)) {
    return after.map((item, index) =>
      readable(Array.isArray(before) ? before[index] : undefined, item, count),
    );
  }
  if (after !== null && typeof after === 'object') {
    const was = (before ?? {}) as Record<string, unknown>;
    return Object.fromEntries(
      Object.entries(after).map(([key, value]) => [key, readable(was[key], value, count)]),
    );
  }
  return after;
}

/** How many fields of the book differ from the saved version, as the history will list them. */
export function countBookChanges(saved: PriceBook, draft: PriceBook): number {
  const count = { unreadable: 0 };
  const comparable = readable(saved, draft, count) as PriceBook;
  try {
    return diffPriceBooks(saved, comparable).length + count.unreadable;
  } catch {
    return Math.max(count.unreadable, 1);
  }
}
