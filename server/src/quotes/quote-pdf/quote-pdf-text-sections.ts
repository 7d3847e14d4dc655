import type { QuoteHighlight } from '@pondwright/shared';
import { bulletList, ensureSpace, LEFT, pageBottom, sectionHeading } from './pdf-layout';
import { COLORS, CONTENT_WIDTH, LINE_GAP, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

const HIGHLIGHTS_PER_ROW = 3;

/** The highlights as a grid of small cards: a muted label over the value, three to a row. */
export function drawHighlights(t: QuoteTypesetter, highlights: readonly QuoteHighlight[]): void {
  const { doc } = t;
  if (highlights.length === 0) return;
  sectionHeading(t, 'At a glance');
  const gutter = 12;
  const cellWidth = (CONTENT_WIDTH - gutter * (HIGHLIGHTS_PER_ROW - 1)) / HIGHLIGHTS_PER_ROW;
  for (let start = 0; start < highlights.length; start += HIGHLIGHTS_PER_ROW) {
    const row = highlights.slice(start, start + HIGHLIGHTS_PER_ROW);
    const heights = row.map((item) => {
      t.style({ size: TYPE.small, color: COLORS.muted });
      const label = t.heightOf(item.label, { width: cellWidth });
      t.style({ size: TYPE.body + 1, color: COLORS.text, weight: 600 });
      return label + 2 + t.heightOf(item.value, { width: cellWidth });
    });
    const height = Math.max(...heights) + 14;
    ensureSpace(doc, height);
    const top = doc.y;
    row.forEach((item, i) => {
      const x = LEFT + i * (cellWidth + gutter);
      doc
        .moveTo(x, top)
        .lineTo(x + cellWidth, top)
        .lineWidth(1.5)
        .strokeColor(COLORS.accentLine)
        .stroke();
      t.style({ size: TYPE.small, color: COLORS.muted });
      t.write(item.label, x, top + 6, { width: cellWidth });
      t.style({ size: TYPE.body + 1, color: COLORS.text, weight: 600 });
      t.write(item.value, x, doc.y + 2, { width: cellWidth });
    });
    doc.y = top + height;
  }
}

/** A heading and a bullet list; nothing when the list is empty. */
export function drawBulletSection(
  t: QuoteTypesetter,
  heading: string,
  items: readonly string[],
): void {
  if (items.length === 0) return;
  sectionHeading(t, heading);
  bulletList(t, items);
}

/**
 * The cautions in a clay-edged "Safety" box. The box is drawn behind its text, so its parts are
 * planned first: when the items do not fit on the page, the box closes there and continues on the next.
 */
export function drawSafetyBox(t: QuoteTypesetter, cautions: readonly string[]): void {
  const { doc } = t;
  if (cautions.length === 0) return;
  const pad = 12;
  const innerWidth = CONTENT_WIDTH - 2 * pad;
  t.style({ size: TYPE.body, color: COLORS.text });
  const itemHeights = cautions.map(
    (caution) => t.heightOf(caution, { width: innerWidth - 14, lineGap: LINE_GAP }) + 3,
  );
  t.style({ size: TYPE.heading, color: COLORS.cautionEdge, weight: 600 });
  const titleHeight = t.lineHeight() + 6;

  doc.y += 18;
  let next = 0;
  let first = true;
  while (next < cautions.length) {
    const heading = first ? titleHeight : 0;
    ensureSpace(doc, 2 * pad + heading + itemHeights[next]!);
    const room = pageBottom(doc) - doc.y;
    let height = 2 * pad + heading;
    let end = next;
    while (end < cautions.length && height + itemHeights[end]! <= room) {
      height += itemHeights[end]!;
      end += 1;
    }
    // A single caution taller than a page: let it flow on by itself.
    if (end === next) {
      height += itemHeights[end]!;
      end += 1;
    }
    const top = doc.y;
    doc
      .roundedRect(LEFT, top, CONTENT_WIDTH, height, 6)
      .lineWidth(1)
      .fillAndStroke(COLORS.cautionFill, COLORS.cautionEdge);
    doc.y = top + pad;
    if (first) {
      t.style({ size: TYPE.heading, color: COLORS.cautionEdge, weight: 600 });
      t.write('Safety', LEFT + pad, doc.y, { width: innerWidth });
      doc.y = top + pad + titleHeight;
    }
    bulletList(t, cautions.slice(next, end), {
      x: LEFT + pad,
      width: innerWidth,
      dotColor: COLORS.cautionEdge,
    });
    doc.y = top + height;
    next = end;
    first = false;
  }
}
