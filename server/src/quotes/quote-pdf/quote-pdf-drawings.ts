import type { QuoteView } from '@pondwright/shared';
import {
  crossSectionSummary,
  drawCrossSection,
  drawCrossSectionLegend,
} from './draw-cross-section';
import { drawPlan, planSummary } from './draw-plan';
import { depthExaggeration, fitDrawing, type DrawingFrame } from './drawing-frame';
import { ensureSpace, LEFT, sectionHeading } from './pdf-layout';
import { COLORS, CONTENT_WIDTH, TYPE } from './pdf-theme';
import type { QuoteTypesetter } from './quote-typesetter';

/** The largest each drawing is made, pt: together they fit one page with their titles and captions. */
const PLAN_MAX_HEIGHT = 300;
const SECTION_MAX_HEIGHT = 230;
/** The cross-section's key sits this far under it and is about this tall, pt. */
const LEGEND_GAP = 6;
const LEGEND_HEIGHT = 12;

/**
 * The plan and the first basin's cross-section, each titled, drawn as large as the page allows and
 * captioned in words. Nothing when the quote has no drawings.
 */
export function drawQuoteDrawings(t: QuoteTypesetter, drawings: QuoteView['drawings']): void {
  const { plan } = drawings;
  const section = drawings.sections[0];
  if (!plan && !section) return;
  sectionHeading(t, 'Drawings');

  if (plan) {
    drawFigure(t, {
      title: 'Plan view',
      caption: `${planSummary(plan)} Streams and waterfalls are placed schematically.`,
      fit: (top) =>
        fitDrawing(
          plan.boundsFt,
          { left: LEFT, top, maxWidth: CONTENT_WIDTH, maxHeight: PLAN_MAX_HEIGHT },
          false,
        ),
      draw: (frame) => drawPlan(t, plan, frame),
    });
  }
  if (section) {
    const stretch = depthExaggeration(section.boundsFt);
    drawFigure(t, {
      title: 'Cross-section',
      caption: crossSectionSummary(section, stretch),
      fit: (top) =>
        fitDrawing(
          section.boundsFt,
          { left: LEFT, top, maxWidth: CONTENT_WIDTH, maxHeight: SECTION_MAX_HEIGHT },
          true,
          stretch,
        ),
      draw: (frame) => {
        drawCrossSection(t, section, frame);
        drawCrossSectionLegend(t, LEFT + CONTENT_WIDTH / 2, frame.top + frame.height + LEGEND_GAP);
      },
      extraHeight: LEGEND_GAP + LEGEND_HEIGHT,
    });
  }
}

type Figure = {
  title: string;
  caption: string;
  fit: (top: number) => DrawingFrame;
  draw: (frame: DrawingFrame) => void;
  /** Height `draw` uses below the frame (a legend), pt. */
  extraHeight?: number;
};

/** A titled drawing with its caption, kept together on one page. */
function drawFigure(t: QuoteTypesetter, figure: Figure): void {
  const { doc } = t;
  t.style({ size: TYPE.small, color: COLORS.muted });
  const captionHeight = t.heightOf(figure.caption, { width: CONTENT_WIDTH, lineGap: 1 });
  t.style({ size: TYPE.body, color: COLORS.text, weight: 600 });
  const titleHeight = t.lineHeight() + 2;
  const drawingHeight = figure.fit(0).height;
  ensureSpace(doc, titleHeight + drawingHeight + (figure.extraHeight ?? 0) + captionHeight + 12);

  t.style({ size: TYPE.body, color: COLORS.text, weight: 600 });
  t.write(figure.title, LEFT, doc.y + 6, { width: CONTENT_WIDTH });
  const frame = figure.fit(doc.y + 2);
  figure.draw(frame);
  doc.y = frame.top + frame.height + (figure.extraHeight ?? 0);
  t.style({ size: TYPE.small, color: COLORS.muted });
  t.write(figure.caption, LEFT, doc.y + 4, { width: CONTENT_WIDTH, lineGap: 1 });
  doc.y += 6;
}
