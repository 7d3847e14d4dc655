import { insetConvexPoints, isConvex } from '../engine/geometry/convex-inset';
import { signedAreaSqFt } from '../engine/geometry/polygon';
import type { PointFt } from './types';

/** The area centroid of a simple polygon, ft. */
export function centroidOf(points: readonly PointFt[]): PointFt {
  const area = signedAreaSqFt(points);
  if (Math.abs(area) < 1e-12) {
    const n = points.length || 1;
    return {
      xFt: points.reduce((s, p) => s + p.xFt, 0) / n,
      yFt: points.reduce((s, p) => s + p.yFt, 0) / n,
    };
  }
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    const cross = a.xFt * b.yFt - b.xFt * a.yFt;
    cx += (a.xFt + b.xFt) * cross;
    cy += (a.yFt + b.yFt) * cross;
  }
  return { xFt: cx / (6 * area), yFt: cy / (6 * area) };
}

/**
 * An outline inset by `insetFt` for drawing. Convex outlines use the exact inset. An outline that
 * bends inward is APPROXIMATED by scaling it toward its centroid so its narrower bounding dimension
 * shrinks by 2 × inset: close enough to show where a shelf lies, not a measurement (the engine's
 * quantities use a true polygon offset). `exact` says which was used.
 */
export function insetOutline(
  points: readonly PointFt[],
  insetFt: number,
): { pointsFt: PointFt[]; exact: boolean } {
  if (insetFt <= 0) return { pointsFt: points.map((p) => ({ ...p })), exact: true };
  if (isConvex(points)) return { pointsFt: insetConvexPoints(points, insetFt), exact: true };
  const c = centroidOf(points);
  const xs = points.map((p) => p.xFt);
  const ys = points.map((p) => p.yFt);
  const narrowFt = Math.min(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
  const scale = 1 - (2 * insetFt) / narrowFt;
  if (scale <= 0) return { pointsFt: [], exact: false };
  return {
    pointsFt: points.map((p) => ({
      xFt: c.xFt + (p.xFt - c.xFt) * scale,
      yFt: c.yFt + (p.yFt - c.yFt) * scale,
    })),
    exact: false,
  };
}
