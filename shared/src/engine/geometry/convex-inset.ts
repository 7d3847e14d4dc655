import { perimeterFt, signedAreaSqFt, type PointFt } from './polygon';

/**
 * True when the polygon turns the same way at every vertex (collinear vertices allowed). Points in ft,
 * in either orientation.
 */
export function isConvex(points: readonly PointFt[]): boolean {
  let sign = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % n]!;
    const c = points[(i + 2) % n]!;
    const cross = (b.xFt - a.xFt) * (c.yFt - b.yFt) - (b.yFt - a.yFt) * (c.xFt - b.xFt);
    if (Math.abs(cross) < 1e-12) continue;
    const turn = Math.sign(cross);
    if (sign === 0) sign = turn;
    else if (turn !== sign) return false;
  }
  return true;
}

/**
 * The points of a convex polygon inset (eroded) by `insetFt` ≥ 0: the points at least `insetFt` inside
 * every edge. For a convex polygon this erosion by a disk is exactly the intersection of its edges'
 * half-planes, each moved inward by `insetFt` (Minkowski difference of convex sets), so no rounding of
 * corners is involved and the result is exact. Clipped edge by edge (Sutherland–Hodgman), returned
 * counter-clockwise in ft, not rounded; empty once the inset passes the polygon's inradius.
 */
export function insetConvexPoints(points: readonly PointFt[], insetFt: number): PointFt[] {
  // Work counter-clockwise so "inside" is to the left of every edge.
  const ring = signedAreaSqFt(points) < 0 ? [...points].reverse() : [...points];
  let clipped: PointFt[] = ring;
  for (let i = 0; i < ring.length && clipped.length > 0; i++) {
    const a = ring[i]!;
    const b = ring[(i + 1) % ring.length]!;
    const length = Math.hypot(b.xFt - a.xFt, b.yFt - a.yFt);
    if (length === 0) continue;
    // Inward unit normal of a counter-clockwise edge, and the moved edge's line: n·p ≥ n·a + inset.
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
  return clipped.length >= 3 && Math.abs(signedAreaSqFt(clipped)) > 1e-12 ? clipped : [];
}

/**
 * Area (ft²) and perimeter (ft) of a convex polygon inset by `insetFt` ≥ 0 (see `insetConvexPoints`);
 * not rounded. An inset past the polygon's inradius leaves nothing (0, 0).
 */
export function insetConvexPolygon(
  points: readonly PointFt[],
  insetFt: number,
): { areaSqFt: number; perimeterFt: number; pieces: number } {
  const inset = insetConvexPoints(points, insetFt);
  if (inset.length === 0) return { areaSqFt: 0, perimeterFt: 0, pieces: 0 };
  return { areaSqFt: Math.abs(signedAreaSqFt(inset)), perimeterFt: perimeterFt(inset), pieces: 1 };
}
