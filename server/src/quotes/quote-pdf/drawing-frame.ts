import {
  depthExaggeration,
  projectDrawing,
  spansOf,
  type BoundsFt,
  type DimensionLine,
  type DrawingProjection,
  type PointFt,
} from '@pondwright/shared/drawings';
import { COLORS, DRAWING_COLORS, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/** Room left of and right of a drawing for labels beside vertical dimension lines, and above and below it, pt. */
const PAD_X = 38;
const PAD_Y = 10;

/** A drawing fitted on the page: its box and where a point in ft lands, pt. */
export type DrawingFrame = DrawingProjection & {
  left: number;
  top: number;
  width: number;
  height: number;
};

/**
 * Fits a drawing's bounds (ft) as large as it goes into `maxWidth` × `maxHeight` with its top at `top`,
 * centred across. `yUp` flips y for elevations (cross-sections); plans keep y down the page.
 * `verticalScale` stretches heights, as on screen.
 */
export function fitDrawing(
  bounds: BoundsFt,
  box: { left: number; top: number; maxWidth: number; maxHeight: number },
  yUp: boolean,
  verticalScale = 1,
): DrawingFrame {
  const { spanXFt, spanYFt } = spansOf(bounds);
  const perFt = Math.min(
    (box.maxWidth - 2 * PAD_X) / spanXFt,
    (box.maxHeight - 2 * PAD_Y) / (spanYFt * verticalScale),
  );
  const width = spanXFt * perFt + 2 * PAD_X;
  const left = box.left + (box.maxWidth - width) / 2;
  const projection = projectDrawing(bounds, {
    perFt,
    originX: left + PAD_X,
    originY: box.top + PAD_Y,
    yUp,
    verticalScale,
  });
  return {
    ...projection,
    left,
    top: box.top,
    width,
    height: spanYFt * projection.perFtY + 2 * PAD_Y,
  };
}

export { depthExaggeration };

/** Adds a path through the points to the document (closed when `closed`), ready to fill or stroke. */
export function tracePath(
  doc: PDFKit.PDFDocument,
  frame: DrawingFrame,
  points: readonly PointFt[],
  closed = false,
): PDFKit.PDFDocument {
  points.forEach((point, index) => {
    const { x, y } = frame.at(point);
    if (index === 0) doc.moveTo(x, y);
    else doc.lineTo(x, y);
  });
  if (closed && points.length > 0) doc.closePath();
  return doc;
}

/**
 * A drawing label centred vertically on y, on a faint white patch so it stays legible over lines and
 * fills (the screen uses a white text halo; a patch is simpler in PDF and extracts as plain text).
 */
export function drawLabel(
  t: QuoteTypesetter,
  text: string,
  x: number,
  y: number,
  anchor: 'start' | 'middle' | 'end' = 'middle',
): void {
  const { doc } = t;
  t.style({ size: TYPE.drawingLabel, color: DRAWING_COLORS.text });
  const width = t.widthOf(text);
  const height = t.lineHeight();
  const left = anchor === 'start' ? x : anchor === 'end' ? x - width : x - width / 2;
  doc.save();
  doc
    .rect(left - 2, y - height / 2, width + 4, height)
    .fillOpacity(0.85)
    .fillColor(COLORS.white)
    .fill();
  doc.restore();
  t.style({ size: TYPE.drawingLabel, color: DRAWING_COLORS.text });
  // A label is stamped, not flowed: the text position of the page is left where it was.
  const { x: flowX, y: flowY } = doc;
  t.write(text, left, y - height / 2 + 0.6, { lineBreak: false });
  doc.x = flowX;
  doc.y = flowY;
}

type PlacedDimension = {
  dimension: DimensionLine;
  a: { x: number; y: number };
  b: { x: number; y: number };
};

const isVertical = ({ a, b }: PlacedDimension) => Math.abs(a.x - b.x) < Math.abs(a.y - b.y);

/**
 * Dimension lines with end ticks and their labels: on a horizontal line, beside a vertical one. A
 * vertical line's label goes on its right unless the line is in the drawing's left third, or another
 * vertical line stands close enough on the right to run through the label (shelf depths side by side).
 */
export function drawDimensions(
  t: QuoteTypesetter,
  frame: DrawingFrame,
  dimensions: readonly DimensionLine[],
): void {
  const { doc } = t;
  const placed = dimensions.map((dimension) => ({
    dimension,
    a: frame.at(dimension.fromFt),
    b: frame.at(dimension.toFt),
  }));
  const verticals = placed.filter(isVertical);
  const tick = 3.5;
  for (const line of placed) {
    const { dimension, a, b } = line;
    const vertical = isVertical(line);
    doc.moveTo(a.x, a.y).lineTo(b.x, b.y);
    for (const p of [a, b]) {
      if (vertical) doc.moveTo(p.x - tick, p.y).lineTo(p.x + tick, p.y);
      else doc.moveTo(p.x, p.y - tick).lineTo(p.x, p.y + tick);
    }
    doc.lineWidth(0.7).strokeColor(DRAWING_COLORS.dimension).stroke();
    const midX = (a.x + b.x) / 2;
    const midY = (a.y + b.y) / 2;
    if (!vertical) {
      drawLabel(t, dimension.label, midX, midY);
      continue;
    }
    t.style({ size: TYPE.drawingLabel, color: DRAWING_COLORS.text });
    const reach = t.widthOf(dimension.label) + 10;
    const crowded = verticals.some(
      (other) =>
        other !== line &&
        other.a.x > a.x &&
        other.a.x - a.x < reach &&
        Math.min(other.a.y, other.b.y) < midY &&
        Math.max(other.a.y, other.b.y) > midY,
    );
    const onLeft = a.x < frame.left + frame.width / 3 || crowded;
    drawLabel(t, dimension.label, onLeft ? midX - 5 : midX + 5, midY, onLeft ? 'end' : 'start');
  }
}
