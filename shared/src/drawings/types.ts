import type { PointFt } from '../engine/geometry/polygon';

export type { PointFt };

/** A measured distance drawn as a line between two points with its label (in the estimate's units). */
export type DimensionLine = {
  kind: string;
  fromFt: PointFt;
  toFt: PointFt;
  label: string;
};

/** The smallest rectangle around a drawing, ft. */
export type BoundsFt = { minXFt: number; minYFt: number; maxXFt: number; maxYFt: number };

/** The bounds of a set of points, ft; an empty set gives a zero box at the origin. */
export function boundsOf(points: readonly PointFt[]): BoundsFt {
  if (points.length === 0) return { minXFt: 0, minYFt: 0, maxXFt: 0, maxYFt: 0 };
  return {
    minXFt: Math.min(...points.map((p) => p.xFt)),
    minYFt: Math.min(...points.map((p) => p.yFt)),
    maxXFt: Math.max(...points.map((p) => p.xFt)),
    maxYFt: Math.max(...points.map((p) => p.yFt)),
  };
}
