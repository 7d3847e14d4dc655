import type { CrossSection } from '@pondwright/shared/drawings';
import { drawDimensions, tracePath, type DrawingFrame } from './drawing-frame';
import { DRAWING_COLORS, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/**
 * A basin's cross-section in vector paths, in the app's layering: soil, water, gravel, rocks, then the
 * underlayment (dashed) and the liner on top, then the dimensions.
 */
export function drawCrossSection(
  t: QuoteTypesetter,
  section: CrossSection,
  frame: DrawingFrame,
): void {
  const { doc } = t;
  doc.save().lineJoin('round');
  tracePath(doc, frame, section.soilFt, true).fill(DRAWING_COLORS.soil);
  tracePath(doc, frame, section.profileFt, true).fill(DRAWING_COLORS.water);
  const left = frame.at({ xFt: 0, yFt: 0 });
  const right = frame.at({ xFt: section.lengthFt, yFt: 0 });
  doc.moveTo(left.x, left.y).lineTo(right.x, right.y).lineWidth(1).stroke(DRAWING_COLORS.waterLine);
  for (const band of section.gravelFt) {
    tracePath(doc, frame, band, true)
      .lineWidth(0.4)
      .dash(0.8, { space: 1.6 })
      .fillAndStroke(DRAWING_COLORS.gravel, DRAWING_COLORS.underlayment);
    doc.undash();
  }
  for (const rock of section.rocks) {
    const center = frame.at(rock.centerFt);
    doc
      .ellipse(center.x, center.y, rock.radiusFt * frame.perFtX, rock.radiusFt * frame.perFtY)
      .lineWidth(0.7)
      .fillAndStroke(DRAWING_COLORS.rock, DRAWING_COLORS.rockEdge);
  }
  tracePath(doc, frame, section.underlaymentFt)
    .lineWidth(1.1)
    .dash(3, { space: 2 })
    .stroke(DRAWING_COLORS.underlayment);
  doc.undash();
  tracePath(doc, frame, section.linerFt).lineWidth(1.8).stroke(DRAWING_COLORS.liner);
  doc.restore();
  drawDimensions(t, frame, section.dimensions);
}

/** The section in words, as the app describes it, printed as the drawing's caption. */
export function crossSectionSummary(section: CrossSection, depthStretch: number): string {
  const label = (kind: string) =>
    section.dimensions
      .filter((dimension) => dimension.kind === kind)
      .map((dimension) => dimension.label)
      .join(', ');
  const shelves = label('shelf-depth');
  return [
    `Cross-section of basin ${section.basinIndex + 1} along its ${label('length')} length:`,
    shelves ? `shelves at ${shelves},` : '',
    `${label('max-depth')} deep, liner with ${label('overlap')} at each edge over underlayment, rock on the walls and shelves, gravel on the floor.`,
    depthStretch > 1 ? `Depths drawn ${depthStretch} times their scale.` : '',
  ]
    .filter((part) => part !== '')
    .join(' ');
}

const LEGEND: ReadonlyArray<{ label: string; fill: string; edge?: string; line?: boolean }> = [
  { label: 'Water', fill: DRAWING_COLORS.water, edge: DRAWING_COLORS.waterLine },
  { label: 'Liner', fill: DRAWING_COLORS.liner, line: true },
  { label: 'Underlayment', fill: DRAWING_COLORS.underlayment, line: true },
  { label: 'Gravel', fill: DRAWING_COLORS.gravel, edge: DRAWING_COLORS.underlayment },
  { label: 'Rock', fill: DRAWING_COLORS.rock, edge: DRAWING_COLORS.rockEdge },
  { label: 'Soil', fill: DRAWING_COLORS.soil },
];

/** A one-line key to the section's materials, centred on `centerX` with its top at `top`. */
export function drawCrossSectionLegend(t: QuoteTypesetter, centerX: number, top: number): void {
  const { doc } = t;
  t.style({ size: TYPE.small, color: DRAWING_COLORS.text });
  const swatch = 10;
  const itemGap = 14;
  const widths = LEGEND.map((item) => swatch + 4 + t.widthOf(item.label));
  const total = widths.reduce((sum, w) => sum + w, 0) + itemGap * (LEGEND.length - 1);
  let x = centerX - total / 2;
  const height = t.lineHeight();
  LEGEND.forEach((item, i) => {
    const middle = top + height / 2;
    doc.save();
    if (item.line) {
      doc
        .moveTo(x, middle)
        .lineTo(x + swatch, middle)
        .lineWidth(item.label === 'Liner' ? 1.8 : 1.1);
      if (item.label === 'Underlayment') doc.dash(3, { space: 2 });
      doc.stroke(item.fill);
    } else {
      doc.rect(x, middle - swatch / 2, swatch, swatch).lineWidth(0.6);
      if (item.edge) doc.fillAndStroke(item.fill, item.edge);
      else doc.fill(item.fill);
    }
    doc.restore();
    t.style({ size: TYPE.small, color: DRAWING_COLORS.text });
    t.write(item.label, x + swatch + 4, top, { lineBreak: false });
    x += widths[i]! + itemGap;
  });
}
