import { COLORS, CONTENT_WIDTH, LINE_GAP, PAGE, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/**
 * Building blocks of the quote's pages: headings, paragraphs, bullets and tables that move to a new
 * page rather than split a row or strand a heading at the foot of a page.
 */

export const LEFT = PAGE.margins.left;

/** The lowest y content may reach on the current page. */
export function pageBottom(doc: PDFKit.PDFDocument): number {
  return doc.page.height - doc.page.margins.bottom;
}

/** Starts a new page unless `height` pt still fit below the current position. */
export function ensureSpace(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y + height > pageBottom(doc)) doc.addPage();
}

/** Vertical space, skipped at the top of a page where it would only push content down. */
export function gap(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y > doc.page.margins.top + 1) doc.y += height;
}

/**
 * A section heading in the accent colour with a fine rule under it, kept on one page with the
 * `keepWithNext` pt that follow it (about three lines unless told).
 */
export function sectionHeading(t: QuoteTypesetter, text: string, keepWithNext = 40): void {
  const { doc } = t;
  gap(doc, 18);
  ensureSpace(doc, 30 + keepWithNext);
  t.style({ size: TYPE.heading, color: COLORS.accentDark, weight: 600 });
  t.write(text, LEFT, doc.y, { width: CONTENT_WIDTH });
  const ruleY = doc.y + 3;
  doc
    .moveTo(LEFT, ruleY)
    .lineTo(LEFT + CONTENT_WIDTH, ruleY)
    .lineWidth(0.75)
    .strokeColor(COLORS.accentLine)
    .stroke();
  doc.y = ruleY + 8;
}

/** Running text, one block per paragraph; long text flows onto new pages by itself. */
export function paragraphs(t: QuoteTypesetter, texts: readonly string[]): void {
  const { doc } = t;
  t.style({ size: TYPE.body, color: COLORS.text });
  for (const text of texts) {
    ensureSpace(doc, t.lineHeight(LINE_GAP) * 2);
    t.write(text, LEFT, doc.y, { width: CONTENT_WIDTH, lineGap: LINE_GAP });
    doc.y += 6;
  }
}

/** A bullet list; each bullet is a small dot in `dotColor` and the text hangs beside it. */
export function bulletList(
  t: QuoteTypesetter,
  items: readonly string[],
  options: { x?: number; width?: number; dotColor?: string } = {},
): void {
  const { doc } = t;
  const x = options.x ?? LEFT;
  const width = options.width ?? CONTENT_WIDTH;
  const indent = 14;
  t.style({ size: TYPE.body, color: COLORS.text });
  for (const item of items) {
    ensureSpace(doc, t.lineHeight(LINE_GAP));
    const top = doc.y;
    // The dot sits at the middle of the first line's lower-case letters, about 0.6 of the font size
    // below the line's top.
    doc
      .circle(x + 3.5, top + TYPE.body * 0.62, 1.8)
      .fillColor(options.dotColor ?? COLORS.accent)
      .fill();
    t.style({ size: TYPE.body, color: COLORS.text });
    t.write(item, x + indent, top, { width: width - indent, lineGap: LINE_GAP });
    doc.y += 3;
  }
}

export type TableColumn = { header: string; width: number; align?: 'left' | 'right' };
export type TableRow = { cells: string[]; shaded?: boolean; strong?: boolean };

const CELL_PAD_X = 6;
const CELL_PAD_Y = 5;

const cellOptions = (column: TableColumn) => ({
  width: column.width - 2 * CELL_PAD_X,
  align: column.align ?? 'left',
  lineGap: 1,
});

function headerHeight(t: QuoteTypesetter): number {
  t.style({ size: TYPE.small, color: COLORS.muted, weight: 600 });
  return t.lineHeight() + 2 * CELL_PAD_Y;
}

function rowHeight(t: QuoteTypesetter, columns: readonly TableColumn[], row: TableRow): number {
  t.style({ size: TYPE.body, color: COLORS.text, weight: row.strong ? 600 : 400 });
  const textHeight = Math.max(
    ...columns.map((column, i) => t.heightOf(row.cells[i] ?? '', cellOptions(column))),
  );
  return textHeight + 2 * CELL_PAD_Y;
}

/** The height `table` takes when it fits on one page, pt. */
export function tableHeight(
  t: QuoteTypesetter,
  columns: readonly TableColumn[],
  rows: readonly TableRow[],
): number {
  return rows.reduce((sum, row) => sum + rowHeight(t, columns, row), headerHeight(t));
}

/** A table with a header row (repeated on each new page), fine rules and optional shaded rows. */
export function table(
  t: QuoteTypesetter,
  columns: readonly TableColumn[],
  rows: readonly TableRow[],
): void {
  const { doc } = t;
  const width = columns.reduce((sum, column) => sum + column.width, 0);

  const drawHeader = () => {
    t.style({ size: TYPE.small, color: COLORS.muted, weight: 600 });
    const top = doc.y;
    let x = LEFT;
    for (const column of columns) {
      t.write(column.header, x + CELL_PAD_X, top + CELL_PAD_Y, cellOptions(column));
      x += column.width;
    }
    const bottom = top + headerHeight(t);
    doc
      .moveTo(LEFT, bottom)
      .lineTo(LEFT + width, bottom)
      .lineWidth(0.75)
      .strokeColor(COLORS.accentLine)
      .stroke();
    doc.y = bottom;
  };

  ensureSpace(doc, 60);
  drawHeader();
  for (const row of rows) {
    const height = rowHeight(t, columns, row);
    if (doc.y + height > pageBottom(doc)) {
      doc.addPage();
      drawHeader();
    }
    const top = doc.y;
    if (row.shaded) doc.rect(LEFT, top, width, height).fillColor(COLORS.accentSoft).fill();
    let x = LEFT;
    columns.forEach((column, i) => {
      t.style({ size: TYPE.body, color: COLORS.text, weight: row.strong ? 600 : 400 });
      t.write(row.cells[i] ?? '', x + CELL_PAD_X, top + CELL_PAD_Y, cellOptions(column));
      x += column.width;
    });
    doc
      .moveTo(LEFT, top + height)
      .lineTo(LEFT + width, top + height)
      .lineWidth(0.5)
      .strokeColor(COLORS.rule)
      .stroke();
    doc.y = top + height;
  }
}

export type AmountRow = { label: string; value: string; kind?: 'normal' | 'note' | 'total' };

/**
 * Label–amount rows in a column of `width` starting at `x`: amounts right-aligned, a total set off by
 * a rule above it in the accent colour, a note in small muted type.
 */
export function amountRows(
  t: QuoteTypesetter,
  rows: readonly AmountRow[],
  x: number,
  width: number,
): void {
  const { doc } = t;
  const valueWidth = 120;
  const labelWidth = width - valueWidth;
  ensureSpace(doc, amountRowsHeight(rows));
  for (const row of rows) {
    const kind = row.kind ?? 'normal';
    if (kind === 'total') {
      doc.y += 3;
      doc
        .moveTo(x, doc.y)
        .lineTo(x + width, doc.y)
        .lineWidth(1)
        .strokeColor(COLORS.accent)
        .stroke();
      doc.y += 5;
    }
    const style =
      kind === 'total'
        ? { size: TYPE.body + 2, color: COLORS.accentDark, weight: 700 as const }
        : kind === 'note'
          ? { size: TYPE.small, color: COLORS.muted }
          : { size: TYPE.body, color: COLORS.text };
    t.style(style);
    const top = doc.y;
    t.write(row.label, x, top, { width: labelWidth - 8, lineGap: 1 });
    const labelBottom = doc.y;
    t.style(style);
    t.write(row.value, x + labelWidth, top, { width: valueWidth, align: 'right' });
    doc.y = Math.max(labelBottom, doc.y) + (kind === 'note' ? 3 : 5);
  }
}

/** About the height `amountRows` takes (labels on one line), pt: to keep a heading with its amounts. */
export function amountRowsHeight(rows: readonly AmountRow[]): number {
  return rows.reduce(
    (sum, row) => sum + (row.kind === 'total' ? 30 : row.kind === 'note' ? 14 : 18),
    4,
  );
}
