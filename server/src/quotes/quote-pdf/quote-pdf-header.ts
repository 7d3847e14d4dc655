import type { QuoteView } from '@pondwright/shared';
import { LEFT } from './pdf-layout';
import { COLORS, CONTENT_WIDTH, LINE_GAP, PAGE, TYPE } from './pdf-theme';
import { formatDate } from './pdf-format';
import type { QuoteTypesetter } from './quote-typesetter';

const LOGO_BOX = { width: 170, height: 56 };
const RIGHT_COLUMN = 200;

/** "Quote 1042 · version 3": how the quote is named on the page and in the footer. */
export function quoteReference(quote: QuoteView): string {
  return `Quote ${quote.estimate.number} · version ${quote.estimate.versionNumber}`;
}

/**
 * The first page's top: the company (logo, name, reply address) on the left and the quote's number on
 * the right, a rule, the title, then a band with who it is for, where, and its dates.
 */
export function drawQuoteHeader(t: QuoteTypesetter, quote: QuoteView, logo: Buffer | null): void {
  const { doc } = t;
  const top = PAGE.margins.top;
  let leftBottom: number = top;
  if (logo) {
    doc.image(logo, LEFT, top, { fit: [LOGO_BOX.width, LOGO_BOX.height] });
    leftBottom = top + LOGO_BOX.height + 8;
  }
  const companyWidth = CONTENT_WIDTH - RIGHT_COLUMN - 16;
  t.style({ size: logo ? TYPE.heading : TYPE.company, color: COLORS.text, weight: 600 });
  t.write(quote.company.name, LEFT, leftBottom, { width: companyWidth });
  if (quote.company.replyToEmail) {
    t.style({ size: TYPE.small, color: COLORS.muted });
    t.write(quote.company.replyToEmail, LEFT, doc.y + 2, { width: companyWidth });
  }
  leftBottom = doc.y;

  const rightX = LEFT + CONTENT_WIDTH - RIGHT_COLUMN;
  t.style({ size: TYPE.small, color: COLORS.muted, weight: 600 });
  t.write('QUOTE', rightX, top, { width: RIGHT_COLUMN, align: 'right', characterSpacing: 1.2 });
  t.style({ size: TYPE.body + 1, color: COLORS.accentDark, weight: 600 });
  t.write(quoteReference(quote), rightX, doc.y + 1, { width: RIGHT_COLUMN, align: 'right' });

  const ruleY = Math.max(leftBottom, doc.y) + 12;
  doc
    .moveTo(LEFT, ruleY)
    .lineTo(LEFT + CONTENT_WIDTH, ruleY)
    .lineWidth(2)
    .strokeColor(COLORS.accent)
    .stroke();

  t.style({ size: TYPE.title, color: COLORS.text, weight: 700 });
  t.write(quote.estimate.title, LEFT, ruleY + 16, { width: CONTENT_WIDTH, lineGap: 1 });
  doc.y += 10;
  drawFactsBand(t, quote);
}

/** Prepared for (name and site), issued and valid-until dates, on a soft band in three columns. */
function drawFactsBand(t: QuoteTypesetter, quote: QuoteView): void {
  const { doc } = t;
  const pad = 12;
  const dateColumn = 118;
  const columns = [
    {
      label: 'Prepared for',
      lines: [quote.estimate.customerName, quote.estimate.siteAddress ?? ''].filter(
        (l) => l !== '',
      ),
      width: CONTENT_WIDTH - 2 * dateColumn - 2 * pad,
    },
    { label: 'Issued', lines: [formatDate(quote.estimate.issuedAt)], width: dateColumn },
    { label: 'Valid until', lines: [formatDate(quote.estimate.expiresAt)], width: dateColumn },
  ];
  t.style({ size: TYPE.small, color: COLORS.muted, weight: 600 });
  const labelHeight = t.lineHeight() + 2;
  t.style({ size: TYPE.body, color: COLORS.text });
  const valueHeight = Math.max(
    ...columns.map((column) =>
      t.heightOf(column.lines.join('\n'), { width: column.width - pad, lineGap: LINE_GAP }),
    ),
  );
  const height = 2 * pad + labelHeight + valueHeight;
  const top = doc.y;
  doc.roundedRect(LEFT, top, CONTENT_WIDTH, height, 6).fillColor(COLORS.accentSoft).fill();
  let x = LEFT + pad;
  for (const column of columns) {
    t.style({ size: TYPE.small, color: COLORS.muted, weight: 600 });
    t.write(column.label, x, top + pad, { width: column.width - pad });
    column.lines.forEach((line, index) => {
      t.style({ size: TYPE.body, color: COLORS.text, weight: index === 0 ? 600 : 400 });
      t.write(line, x, index === 0 ? top + pad + labelHeight : undefined, {
        width: column.width - pad,
        lineGap: LINE_GAP,
      });
    });
    x += column.width;
  }
  doc.y = top + height;
}

/** A one-line notice under the facts for an accepted or declined quote; nothing for an open one. */
export function drawStatusNotice(t: QuoteTypesetter, quote: QuoteView): void {
  const { doc } = t;
  const text = quote.acceptance
    ? `Accepted by ${quote.acceptance.fullName} on ${formatDate(quote.acceptance.acceptedAt)}`
    : quote.declinedAt
      ? `Declined on ${formatDate(quote.declinedAt)}`
      : null;
  if (!text) return;
  const accepted = quote.acceptance !== null;
  const style = {
    size: TYPE.body,
    color: accepted ? COLORS.accentDark : COLORS.cautionEdge,
    weight: 600 as const,
  };
  const pad = 9;
  const bar = 3;
  const textWidth = CONTENT_WIDTH - 2 * pad - bar;
  doc.y += 10;
  t.style(style);
  const height = t.heightOf(text, { width: textWidth }) + 2 * pad;
  const top = doc.y;
  doc
    .rect(LEFT, top, CONTENT_WIDTH, height)
    .fillColor(accepted ? COLORS.accentSoft : COLORS.cautionFill)
    .fill();
  doc
    .rect(LEFT, top, bar, height)
    .fillColor(accepted ? COLORS.accent : COLORS.cautionEdge)
    .fill();
  t.style(style);
  t.write(text, LEFT + bar + pad, top + pad, { width: textWidth });
  doc.y = top + height;
}
