/**
 * CSV injection (OWASP): a spreadsheet runs a cell that starts with = + - @, a tab or a carriage return
 * as a formula. Such cells (after any apostrophes) are written with one more leading apostrophe, and
 * read back with one fewer; so "=A1", "'+x" and "-" survive a round trip unchanged.
 */
export const FORMULA_START = /^'*[=+\-@\t\r]/;
/** A cell written by `guardFormula`: one apostrophe too many before a formula sign. */
export const FORMULA_ESCAPED = /^'+[=+\-@\t\r]/;

/** The cell as a spreadsheet will show it without running it: `=1+2` → `'=1+2`; others unchanged. */
export function guardFormula(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}
