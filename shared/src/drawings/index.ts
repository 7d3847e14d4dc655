// Drawings of a water feature from its dimensions: pure geometry in ft (and gph for the pump chart),
// for the client's SVG components and, later, the PDF.
export {
  planDrawing,
  type PlanDrawing,
  type PlanBasin,
  type PlanShelf,
  type PlanStream,
  type PlanWeir,
} from './plan-drawing';
export {
  crossSection,
  UNDERLAYMENT_GAP_FT,
  type CrossSection,
  type CrossSectionOptions,
  type SectionRock,
} from './cross-section';
export {
  pumpChartData,
  niceStep,
  type PumpChartData,
  type PumpChartSeries,
  type FlowHeadPoint,
} from './pump-chart';
export { outlinePoints, OVAL_DRAWING_SEGMENTS } from './outline-points';
export { insetOutline, centroidOf } from './inset-outline';
export { insetConvexPoints } from '../engine/geometry/convex-inset';
export { offsetPolylineRight } from './polyline-offset';
export { lengthLabel } from './length-label';
export { boundsOf, type BoundsFt, type DimensionLine, type PointFt } from './types';
export { projectDrawing, spansOf, depthExaggeration, type DrawingProjection } from './projection';
