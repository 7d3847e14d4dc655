import type { PlanDrawing } from '@pondwright/shared/drawings';
import { drawDimensions, drawLabel, tracePath, type DrawingFrame } from './drawing-frame';
import { DRAWING_COLORS } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/**
 * The plan (top) view in vector paths, as the app's plan view draws it: streams, basin outlines with
 * their shelf lips (dashed; dotted where a lip is approximate) and floor, weirs, and the dimensions.
 */
export function drawPlan(t: QuoteTypesetter, plan: PlanDrawing, frame: DrawingFrame): void {
  const { doc } = t;
  doc.save().lineJoin('round');
  for (const stream of plan.streams) {
    tracePath(doc, frame, stream.bandFt, true)
      .lineWidth(1)
      .fillAndStroke(DRAWING_COLORS.stream, DRAWING_COLORS.waterLine);
  }
  for (const basin of plan.basins) {
    tracePath(doc, frame, basin.outlineFt, true)
      .lineWidth(1.75)
      .fillAndStroke(DRAWING_COLORS.water, DRAWING_COLORS.outline);
    for (const shelf of basin.shelves) {
      if (shelf.edgeFt.length === 0) continue;
      tracePath(doc, frame, shelf.edgeFt, true)
        .lineWidth(1)
        .dash(shelf.exact ? 4 : 1.2, { space: shelf.exact ? 3 : 2.5 })
        .stroke(DRAWING_COLORS.shelf);
      doc.undash();
    }
    if (basin.floor && basin.floor.outlineFt.length > 0) {
      tracePath(doc, frame, basin.floor.outlineFt, true)
        .lineWidth(0.75)
        .stroke(DRAWING_COLORS.shelf);
    }
  }
  for (const weir of plan.weirs) {
    const a = frame.at(weir.fromFt);
    const b = frame.at(weir.toFt);
    doc
      .moveTo(a.x, a.y)
      .lineTo(b.x, b.y)
      .lineWidth(3.5)
      .lineCap('round')
      .stroke(DRAWING_COLORS.weir);
  }
  doc.restore();
  for (const stream of plan.streams) {
    const corner = frame.at(stream.bandFt[3]!);
    drawLabel(t, `stream ${stream.label}`, corner.x + 3, corner.y + 8, 'start');
  }
  drawDimensions(t, frame, plan.dimensions);
}

/** The plan in words, as the app's plan view describes it, printed as the drawing's caption. */
export function planSummary(plan: PlanDrawing): string {
  const basins = plan.basins.map((basin) => {
    const shelves = basin.shelves.length === 1 ? 'one shelf' : `${basin.shelves.length} shelves`;
    return `Basin ${basin.index + 1}: ${basin.lengthLabel} long, ${basin.widthLabel} wide, ${shelves}.`;
  });
  const streams = plan.streams.map((stream) => `Stream ${stream.index + 1}: ${stream.label}.`);
  const weirs = plan.weirs.map((weir) => `Waterfall ${weir.index + 1}: ${weir.label}.`);
  const approximate = plan.basins.some((basin) => basin.shelves.some((shelf) => !shelf.exact))
    ? ['Shelf lines of outlines that bend inward are approximate.']
    : [];
  return [...basins, ...streams, ...weirs, ...approximate].join(' ');
}
