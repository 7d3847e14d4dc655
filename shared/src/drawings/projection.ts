import type { BoundsFt, PointFt } from './types';

/** Where a point in ft lands on a screen or page, in that medium's units (SVG units, pt). */
export type DrawingProjection = {
  /** Units per ft across and down. */
  perFtX: number;
  perFtY: number;
  at: (point: PointFt) => { x: number; y: number };
};

/**
 * Maps a drawing's bounds (ft) onto a medium: `perFt` units per ft across, heights stretched by
 * `verticalScale`, the bounds' top-left corner at (`originX`, `originY`). `yUp` flips y for
 * elevations (cross-sections, whose depths are negative); plans keep y down the page.
 */
export function projectDrawing(
  bounds: BoundsFt,
  options: {
    perFt: number;
    originX: number;
    originY: number;
    yUp: boolean;
    verticalScale?: number;
  },
): DrawingProjection {
  const perFtX = options.perFt;
  const perFtY = perFtX * (options.verticalScale ?? 1);
  return {
    perFtX,
    perFtY,
    at: (p) => ({
      x: options.originX + (p.xFt - bounds.minXFt) * perFtX,
      y: options.originY + (options.yUp ? bounds.maxYFt - p.yFt : p.yFt - bounds.minYFt) * perFtY,
    }),
  };
}

/** A drawing's extent in ft, never zero (a degenerate drawing still projects). */
export function spansOf(bounds: BoundsFt): { spanXFt: number; spanYFt: number } {
  return {
    spanXFt: Math.max(bounds.maxXFt - bounds.minXFt, 1e-6),
    spanYFt: Math.max(bounds.maxYFt - bounds.minYFt, 1e-6),
  };
}

/**
 * How much a cross-section's depths are stretched so a shallow basin still reads: enough to make the
 * drawing about half as tall as it is wide, at most 3×, in steps of ½. Screen and paper use the same.
 */
export function depthExaggeration(bounds: BoundsFt): number {
  const ratio = (0.5 * (bounds.maxXFt - bounds.minXFt)) / (bounds.maxYFt - bounds.minYFt);
  return Math.min(3, Math.max(1, Math.floor(ratio * 2) / 2));
}
