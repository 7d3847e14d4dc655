import { isConvex } from '../engine/geometry/convex-inset';
import { signedAreaSqFt } from '../engine/geometry/polygon';
import type { PointFt } from './types';

/**
 * The points of a convex polygon inset by `insetFt` ≥ 0: the intersection of its edges' half-planes
 * moved inward, clipped edge by edge. This is the engine's exact convex inset (`insetConvexPolygon`,
 * which reports only area and perimeter) returning the polygon itself. ft; not rounded. Empty when the
 * inset passes the polygon's inradius.
 */
export function insetConvexPoints(points: readonly PointFt[], insetFt: number): PointFt[] {
  const ring = signedAreaSqFt(points) < 0 ? [...points].reverse() : [...points];
  let clipped: PointFt[] = ring;
  for (let i = 0; i < ring.length && clipped.length > 0; i++) {
    const a = ring[i]!;
    const b = ring[(i + 1) % ring.length]!;
    const length = Math.hypot(b.xFt - a.xFt, b.yFt - a.yFt);
    if (length === 0) continue;
    const nx = -(b.yFt - a.yFt) / length;
    const ny = (b.xFt - a.xFt) / length;
    const limit = nx * a.xFt + ny * a.yFt + insetFt;
    const side = (p: PointFt) => nx * p.xFt + ny * p.yFt - limit;
    const next: PointFt[] = [];
    for (let j = 0; j < clipped.length; j++) {
      const p = clipped[j]!;
      const q = clipped[(j + 1) % clipped.length]!;
      const sp = side(p);
      const sq = side(q);
      if (sp >= 0) next.push(p);
      if (sp >= 0 !== sq >= 0) {
        const t = sp / (sp - sq);
        next.push({ xFt: p.xFt + t * (q.xFt - p.xFt), yFt: p.yFt + t * (q.yFt - p.yFt) });
      }
    }
    clipped = next;
  }
  return clipped.length >= 3 && Math.abs(signedAreaSqFt(clipped)) > 1e-9 ? clipped : [];
}

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
